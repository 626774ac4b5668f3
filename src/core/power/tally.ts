// Indexes here are in range by construction (compiled-netlist and per-net arrays), so `!` marks them (no run-time cost).
/**
 * Power counters fed by the solve pass of a check: per vector the static figures (DC paths from the
 * solver plus leakage of the off transistors), per net the 0→1 activity and the swing. The counts
 * are plain data (they cross from the worker to the page) and do not depend on the clock or the
 * load, so changing either finishes the report again without solving anything (powerReport.ts).
 */
import { capacitanceBreakdown, type CapacitanceBreakdown } from '../compile/capacitance.ts';
import type { CompiledNetlist } from '../compile/compile.ts';
import type { SolveObserver } from '../analysis/pass.ts';
import type { InputVector } from '../model/design.ts';
import type { SolveResult } from '../solver/simulator.ts';
import { ActivityCounter } from './activity.ts';
import { LeakageEstimator } from './leakage.ts';
import type { ActivitySource, VectorPower } from './types.ts';

/** A net's counted figures, before the load and the clock are applied. */
export interface NetCounts {
  readonly net: string;
  readonly activity: number;
  readonly swing: number;
  readonly capacitance: CapacitanceBreakdown;
  readonly isInput: boolean;
  readonly isOutput: boolean;
}

export interface PowerCounts {
  readonly activitySource: ActivitySource;
  readonly vdd: number;
  readonly vectors: readonly VectorPower[];
  /** Every net but the rails, in the compiled order. */
  readonly nets: readonly NetCounts[];
  /** Vectors (or steps) in which some feedback loop never settled. */
  readonly unsettled: number;
  /** Outputs and nets feeding gates that were neither 0 nor 1 in some vector. */
  readonly unclear: readonly string[];
}

/** Random activity assumes every input driven to 0 or 1; a sweep that also tries Z skips those. */
function drivesEveryInput(inputs: InputVector): boolean {
  for (const name in inputs) if (inputs[name] !== '0' && inputs[name] !== '1') return false;
  return true;
}

export class PowerTally implements SolveObserver {
  private readonly counter: ActivityCounter;
  private readonly leakage: LeakageEstimator;
  private readonly vectors: VectorPower[] = [];
  private unsettled = 0;

  constructor(
    private readonly compiled: CompiledNetlist,
    readonly activitySource: ActivitySource,
  ) {
    this.counter = new ActivityCounter(compiled.netCount);
    this.leakage = new LeakageEstimator(compiled);
  }

  add(result: SolveResult): void {
    if (this.activitySource === 'random' && !drivesEveryInput(result.inputs)) return;
    this.counter.add(result);
    this.vectors.push(vectorPower(result, this.leakage));
    if (!result.settled) this.unsettled++;
  }

  counts(): PowerCounts {
    const c = this.compiled;
    const figures = this.activitySource === 'random' ? this.counter.random() : this.counter.sequence();
    const breakdown = capacitanceBreakdown(c.netlist, c.tech, c.netIndex);
    const rails = new Set(c.netlist.rails.map((r) => r.net));
    const inputs = new Set(c.netlist.inputs);
    const outputs = new Set(c.netlist.outputs);
    const nets = c.netNames.flatMap((net, n): NetCounts[] =>
      rails.has(net)
        ? []
        : [
            {
              net,
              activity: figures.activity[n]!,
              swing: figures.swing[n]!,
              capacitance: breakdown[n]!,
              isInput: inputs.has(net),
              isOutput: outputs.has(net),
            },
          ],
    );
    // Outputs and nets feeding gates only: an internal stack node left floating is expected.
    const unclear = figures.indefinite
      .filter((n) => outputs.has(c.netNames[n]!) || c.netGates.start[n + 1]! > c.netGates.start[n]!)
      .map((n) => c.netNames[n]!);
    return {
      activitySource: this.activitySource,
      vdd: c.tech.vdd,
      vectors: this.vectors,
      nets,
      unsettled: this.unsettled,
      unclear,
    };
  }
}

function vectorPower(result: SolveResult, leakage: LeakageEstimator): VectorPower {
  const leak = leakage.of(result);
  const dcWatts = Number.isFinite(result.staticPower) ? result.staticPower : 0;
  return {
    inputs: result.inputs,
    dcWatts,
    leakageWatts: leak.watts,
    staticWatts: dcWatts + leak.watts,
    supplyCurrent: Number.isFinite(result.supplyCurrent) ? result.supplyCurrent : 0,
    leakageCurrent: leak.current,
  };
}
