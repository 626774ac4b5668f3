// Indexes here are in range by construction (compiled-netlist and per-net arrays), so `!` marks them (no run-time cost).
import { sequencePass, sweepPass, type SolveObserver } from '../analysis/pass.ts';
import { checkSweepLimit } from '../analysis/vectors.ts';
import { compile, type CompiledNetlist } from '../compile/compile.ts';
import type { InputVector } from '../model/design.ts';
import type { Netlist } from '../model/netlist.ts';
import type { Technology } from '../model/technology.ts';
import { Simulator, type SolveResult } from '../solver/simulator.ts';
import { problems } from './explain.ts';
import { DcSolver, sourcesFor } from './operatingPoint.ts';
import { storedVolts } from './start.ts';

/**
 * Where the level-1 answer and the switch-level estimate are said to disagree: an output voltage
 * apart by more than this fraction of VDD, or supply currents apart by more than this ratio (when
 * either is above 1 nA). Reporting thresholds of our own choosing (common practice, no source).
 */
export const DISAGREE_FRACTION_OF_VDD = 0.05;
export const DISAGREE_CURRENT_RATIO = 1.25;
const CURRENT_FLOOR = 1e-9;

/** The level-1 DC answer for one vector, JSON-ready (the `dc` object of a vector in the report). */
export interface VectorDc {
  /** Volts for the outputs (every net when asked); null where no voltage could be decided. */
  readonly voltages: Readonly<Record<string, number | null>>;
  /** Amperes drawn from the supply rails; null when some path to a supply has no solution. */
  readonly supplyCurrent: number | null;
  /** Outputs, and `supplyCurrent`, where this answer and the switch-level estimate disagree. */
  readonly differs: readonly string[];
  /**
   * Which of the reported nets have no voltage and why (floating, did not converge, unstable latch…),
   * and which floating nets were held at their stored charge.
   */
  readonly notes: readonly string[];
}

export interface DcOptions {
  /** Report every net's voltage, not just the outputs'. */
  readonly allNets?: boolean;
}

/**
 * Level-1 operating points beside switch-level results: an observer of a sweep or sequence pass
 * (docs/semantics.md §5), so the DC rides on the check's own solves; `rows` collects one VectorDc
 * per vector in order. Starts from the switch-level voltages and keeps the charge they leave on
 * floating nets.
 */
export class VectorDcRunner implements SolveObserver {
  readonly rows: VectorDc[] = [];
  private readonly solver: DcSolver;

  constructor(
    readonly compiled: CompiledNetlist,
    private readonly options: DcOptions = {},
  ) {
    this.solver = new DcSolver(compiled);
  }

  add(result: SolveResult): void {
    this.rows.push(this.vector(result));
  }

  vector(result: SolveResult): VectorDc {
    const c = this.compiled;
    const point = this.solver.solve(sourcesFor(c, result.inputs), {
      start: result.volts,
      stored: storedVolts(result),
    });
    const names = this.options.allNets ? c.netNames : c.netlist.outputs;
    const value = (v: number): number | null => (Number.isNaN(v) ? null : v);
    const voltages = Object.fromEntries(
      names.map((n) => [n, value(point.volts[c.netIndex.get(n) as number]!)]),
    );
    const supplyCurrent = value(point.supplyCurrent);
    return {
      voltages,
      supplyCurrent,
      differs: this.differences(result, point.volts, supplyCurrent),
      notes: problems(point)
        .filter((p) => p.nets.some((n) => n in voltages || (p.kind === 'held' && this.gates(n))))
        .map((p) => p.message),
    };
  }

  /**
   * Notes are only about the nets reported, and about held nets that gate a device (the answer rests
   * on their stored charge): a stack node between two off devices floats in every static gate.
   */
  private gates(net: string): boolean {
    const { netGates, netIndex } = this.compiled;
    const n = netIndex.get(net) as number;
    return netGates.start[n + 1]! > netGates.start[n]!;
  }

  private differences(result: SolveResult, volts: Float64Array, current: number | null): string[] {
    const c = this.compiled;
    const out = c.netlist.outputs.filter((name) => {
      const n = c.netIndex.get(name) as number;
      const a = volts[n]!;
      const b = result.volts[n]!;
      return (
        Number.isFinite(a) && Number.isFinite(b) && Math.abs(a - b) > DISAGREE_FRACTION_OF_VDD * c.tech.vdd
      );
    });
    const big = Math.max(Math.abs(current ?? 0), Math.abs(result.supplyCurrent));
    const small = Math.min(Math.abs(current ?? 0), Math.abs(result.supplyCurrent));
    if (current !== null && big > CURRENT_FLOOR && big > DISAGREE_CURRENT_RATIO * small)
      out.push('supplyCurrent');
    return out;
  }
}

/** Level-1 DC for every vector of the sweep, in the order `checkSweep` reports them. */
export function dcSweep(
  netlist: Netlist,
  tech: Technology,
  options: DcOptions & { readonly undrivenInputs?: boolean; readonly maxInputs?: number } = {},
): VectorDc[] {
  checkSweepLimit(netlist.inputs, options.maxInputs);
  const runner = new VectorDcRunner(compile(netlist, tech), options);
  sweepPass(new Simulator(runner.compiled), [runner], options);
  return runner.rows;
}

/** Level-1 DC for every step of a sequence, in the order `checkSequence` reports them. */
export function dcSequence(
  netlist: Netlist,
  tech: Technology,
  steps: readonly InputVector[],
  options: DcOptions = {},
): VectorDc[] {
  const runner = new VectorDcRunner(compile(netlist, tech), options);
  sequencePass(new Simulator(runner.compiled), steps, [runner]);
  return runner.rows;
}
