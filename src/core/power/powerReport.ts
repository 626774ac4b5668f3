import { capacitanceBreakdown } from '../compile/capacitance.ts';
import { compile, type CompiledNetlist } from '../compile/compile.ts';
import type { Netlist } from '../model/netlist.ts';
import type { Technology } from '../model/technology.ts';
import { Simulator, type SolveResult } from '../solver/simulator.ts';
import { ACTIVITY_CONVENTION, randomActivity, sequenceActivity, type ActivityFigures } from './activity.ts';
import { switchingEnergy } from './dynamic.ts';
import { LEAKAGE_MODEL, leakageOf } from './leakage.ts';
import {
  PowerOptionsError,
  type NetPower,
  type PowerOptions,
  type PowerReport,
  type VectorPower,
} from './types.ts';
import { sweepVectors } from './vectors.ts';

export { PowerOptionsError } from './types.ts';

/** Inputs beyond which the sweep behind random activity is refused (2^16 = 65,536 vectors). */
export const DEFAULT_MAX_INPUTS = 16;

/**
 * What the cell burns: static power per vector (DC paths from the solver plus leakage of the off
 * transistors) and switching power from each net's capacitance and 0→1 activity.
 */
export function powerReport(netlist: Netlist, tech: Technology, options: PowerOptions): PowerReport {
  validate(netlist, options);
  const load = options.load ?? 0;
  const compiled = compile(netlist, tech);
  const results = solveAll(new Simulator(compiled), netlist, options);
  const figures = options.activity === 'random' ? randomActivity(results) : sequenceActivity(results);
  const vectors = results.map(vectorPower);
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
    notes: notesFor(results, options),
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

function solveAll(sim: Simulator, netlist: Netlist, options: PowerOptions): SolveResult[] {
  if (options.activity === 'random') return sweepVectors(netlist.inputs).map((v) => sim.solveFresh(v));
  const results: SolveResult[] = [];
  for (const step of options.sequence ?? []) {
    const previous = results[results.length - 1];
    results.push(previous === undefined ? sim.solveFresh(step) : sim.solveNext(step, previous));
  }
  return results;
}

function vectorPower(result: SolveResult): VectorPower {
  const leak = leakageOf(result);
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

function notesFor(results: readonly SolveResult[], options: PowerOptions): string[] {
  const notes: string[] = [];
  const unsettled = results.filter((r) => !r.settled).length;
  if (unsettled > 0) notes.push(`${unsettled} vector(s) never settled; their nets count as neither 0 nor 1.`);
  if (options.activity === 'sequence' && results.length < 2) {
    notes.push('A one-step sequence has no transitions: activity is zero.');
  }
  return notes;
}

function sum(values: readonly number[]): number {
  return values.reduce((s, v) => s + v, 0);
}
