import { capacitanceBreakdown } from '../compile/capacitance.ts';
import { compile, type CompiledNetlist } from '../compile/compile.ts';
import type { Netlist } from '../model/netlist.ts';
import type { Technology } from '../model/technology.ts';
import { Simulator, type SolveResult } from '../solver/simulator.ts';
import { ACTIVITY_CONVENTION, ActivityCounter, type ActivityFigures } from './activity.ts';
import { switchingEnergy } from './dynamic.ts';
import { LEAKAGE_MODEL, LeakageEstimator } from './leakage.ts';
import {
  PowerOptionsError,
  type NetPower,
  type PowerOptions,
  type PowerReport,
  type VectorPower,
} from './types.ts';
import { DEFAULT_MAX_INPUTS, sweepVectors } from '../analysis/vectors.ts';

export { PowerOptionsError } from './types.ts';

/** Inputs beyond which the sweep behind random activity is refused: the checker's own limit. */
export { DEFAULT_MAX_INPUTS };

/**
 * What the cell burns: static power per vector (DC paths from the solver plus leakage of the off
 * transistors) and switching power from each net's capacitance and 0→1 activity.
 */
export function powerReport(netlist: Netlist, tech: Technology, options: PowerOptions): PowerReport {
  validate(netlist, options);
  const load = options.load ?? 0;
  const compiled = compile(netlist, tech);
  const run = solveAll(new Simulator(compiled), netlist, options);
  const figures = options.activity === 'random' ? run.counter.random() : run.counter.sequence();
  const { vectors } = run;
  const nets = netPowers(compiled, figures, load, options.freq);
  const averageStaticWatts = vectors.reduce((s, v) => s + v.staticWatts, 0) / Math.max(1, vectors.length);
  const dynamicWatts = sum(nets.filter((n) => !n.isInput).map((n) => n.watts));
  return {
    convention: ACTIVITY_CONVENTION,
    leakageModel: LEAKAGE_MODEL,
    activitySource: options.activity,
    frequency: options.freq,
    vdd: tech.vdd,
    load,
    vectors,
    staticWatts: vectors.map((v) => v.staticWatts),
    leakageWatts: vectors.map((v) => v.leakageWatts),
    averageStaticWatts,
    dynamicWatts,
    inputPinWatts: sum(nets.filter((n) => n.isInput).map((n) => n.watts)),
    totalWatts: averageStaticWatts + dynamicWatts,
    activity: Object.fromEntries(nets.map((n) => [n.net, n.activity])),
    capacitance: Object.fromEntries(nets.map((n) => [n.net, n.capacitance.total])),
    nets,
    notes: notesFor(compiled, run, figures, options),
  };
}

function validate(netlist: Netlist, options: PowerOptions): void {
  if (!Number.isFinite(options.freq) || options.freq < 0) {
    throw new PowerOptionsError(
      'freq',
      `frequency must be a non-negative number of hertz, got ${options.freq}`,
    );
  }
  if (options.load !== undefined && (!Number.isFinite(options.load) || options.load < 0)) {
    throw new PowerOptionsError('load', `load must be a non-negative number of farads, got ${options.load}`);
  }
  if (options.activity === 'sequence' && (options.sequence?.length ?? 0) === 0) {
    throw new PowerOptionsError('sequence', 'sequence activity needs a sequence with at least one step');
  }
  const max = options.maxInputs ?? DEFAULT_MAX_INPUTS;
  if (options.activity === 'random' && netlist.inputs.length > max) {
    throw new PowerOptionsError(
      'maxInputs',
      `random activity sweeps every vector: ${netlist.inputs.length} inputs exceed the limit of ${max}`,
    );
  }
}

interface Run {
  readonly vectors: VectorPower[];
  readonly counter: ActivityCounter;
  readonly unsettled: number;
}

/** Solves each vector (sweep) or step (sequence), keeping only its figures, never all results. */
function solveAll(sim: Simulator, netlist: Netlist, options: PowerOptions): Run {
  const run: Run = { vectors: [], counter: new ActivityCounter(sim.compiled.netCount), unsettled: 0 };
  const leakage = new LeakageEstimator(sim.compiled);
  let unsettled = 0;
  let previous: SolveResult | null = null;
  const steps = options.activity === 'random' ? sweepVectors(netlist.inputs) : (options.sequence ?? []);
  for (const step of steps) {
    // A sweep starts every vector from an unknown state and, since each result is read once and
    // dropped, lets the solver reuse its arrays; a sequence carries stored charge onward.
    const result: SolveResult =
      options.activity === 'random'
        ? sim.solveFresh(step, { recycle: true })
        : previous === null
          ? sim.solveFresh(step)
          : sim.solveNext(step, previous);
    run.counter.add(result);
    run.vectors.push(vectorPower(result, leakage));
    if (!result.settled) unsettled++;
    previous = result;
  }
  return { ...run, unsettled };
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

function netPowers(c: CompiledNetlist, figures: ActivityFigures, load: number, freq: number): NetPower[] {
  const breakdown = capacitanceBreakdown(c.netlist, c.tech, c.netIndex);
  const rails = new Set(c.netlist.rails.map((r) => r.net));
  const outputs = new Set(c.netlist.outputs);
  const inputs = new Set(c.netlist.inputs);
  return c.netNames.flatMap((net, n): NetPower[] => {
    if (rails.has(net)) return [];
    const b = breakdown[n];
    const netLoad = outputs.has(net) ? load : 0;
    const total = b.gate + b.diffusion + b.explicit + netLoad;
    const energy = switchingEnergy(total, c.tech.vdd, figures.swing[n]);
    return [
      {
        net,
        activity: figures.activity[n],
        capacitance: { ...b, load: netLoad, total },
        swing: figures.swing[n],
        energyPerTransition: energy,
        watts: figures.activity[n] * energy * freq,
        isInput: inputs.has(net),
      },
    ];
  });
}

/** Shown with every report: what the estimate leaves out. */
export const POWER_OMISSIONS =
  'Not counted: short-circuit current while inputs switch, glitches, gate and junction leakage.';

function notesFor(c: CompiledNetlist, run: Run, figures: ActivityFigures, options: PowerOptions): string[] {
  const notes = [POWER_OMISSIONS];
  if (run.unsettled > 0)
    notes.push(`${run.unsettled} vector(s) never settled; their nets count as neither 0 nor 1.`);
  // Outputs and nets feeding gates only: an internal stack node left floating is expected.
  const outputs = new Set(c.outputNets);
  const unclear = figures.indefinite
    .filter((n) => outputs.has(n) || c.netGates.start[n + 1] > c.netGates.start[n])
    .map((n) => c.netNames[n]);
  if (unclear.length > 0) {
    const shown = unclear.slice(0, 8).join(', ') + (unclear.length > 8 ? ', …' : '');
    notes.push(
      `Some nets are X or hold unknown charge in some ${options.activity === 'random' ? 'vectors' : 'steps'} ` +
        `(${shown}); only definite levels count toward their activity.` +
        (options.activity === 'random'
          ? ' For a cell with stored state, a sequence gives truer activity.'
          : ''),
    );
  }
  if (options.activity === 'sequence' && run.vectors.length < 2) {
    notes.push('A one-step sequence has no transitions: activity is zero.');
  }
  return notes;
}

function sum(values: readonly number[]): number {
  return values.reduce((s, v) => s + v, 0);
}
