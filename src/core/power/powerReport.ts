/**
 * What the cell burns: static power per vector (DC paths from the solver plus leakage of the off
 * transistors) and switching power from each net's capacitance and 0→1 activity. The counting is
 * done by a PowerTally riding on a check's solve pass (tally.ts); this file turns counts into the
 * report for a clock and a load, and offers the one-call form for callers without a check.
 */
import { compile } from '../compile/compile.ts';
import { sequencePass, sweepPass } from '../analysis/pass.ts';
import { DEFAULT_MAX_INPUTS } from '../analysis/vectors.ts';
import type { InputVector } from '../model/design.ts';
import type { Netlist } from '../model/netlist.ts';
import type { Technology } from '../model/technology.ts';
import { Simulator } from '../solver/simulator.ts';
import { ACTIVITY_CONVENTION } from './activity.ts';
import { switchingEnergy } from './dynamic.ts';
import { LEAKAGE_MODEL } from './leakage.ts';
import { checkPowerSettings, PowerOptionsError, type PowerSettings } from './settings.ts';
import { PowerTally, type NetCounts, type PowerCounts } from './tally.ts';
import type { NetPower, PowerReport } from './types.ts';

export { PowerOptionsError } from './settings.ts';

/** What the pass behind the figures needs besides the settings. */
export interface PowerPass {
  /** Steps to count transitions over; required when activity is 'sequence'. */
  readonly sequence?: readonly InputVector[];
  /** Largest input count for the exhaustive sweep behind 'random' (default 16). */
  readonly maxInputs?: number;
}

/** Refuses a pass that cannot give the activity asked for; the error names the option. */
export function checkPowerPass(netlist: Netlist, activity: PowerSettings['activity'], pass: PowerPass): void {
  if (activity === 'sequence' && (pass.sequence?.length ?? 0) === 0) {
    throw new PowerOptionsError('sequence', 'sequence activity needs a sequence with at least one step');
  }
  const max = pass.maxInputs ?? DEFAULT_MAX_INPUTS;
  if (activity === 'random' && netlist.inputs.length > max) {
    throw new PowerOptionsError(
      'maxInputs',
      `random activity sweeps every vector: ${netlist.inputs.length} inputs exceed the limit of ${max}`,
    );
  }
}

/** Power of a cell on its own: one solve pass of its own (a check with power shares its pass). */
export function powerReport(
  netlist: Netlist,
  tech: Technology,
  settings: PowerSettings,
  pass: PowerPass = {},
): PowerReport {
  checkPowerSettings(settings);
  checkPowerPass(netlist, settings.activity, pass);
  const simulator = new Simulator(compile(netlist, tech));
  const tally = new PowerTally(simulator.compiled, settings.activity);
  if (settings.activity === 'random') sweepPass(simulator, [tally]);
  else sequencePass(simulator, pass.sequence ?? [], [tally]);
  return powerFromCounts(tally.counts(), settings);
}

/** The report for a clock and a load from counts already made; solves nothing. */
export function powerFromCounts(counts: PowerCounts, settings: PowerSettings): PowerReport {
  checkPowerSettings(settings);
  const { vectors } = counts;
  const nets = counts.nets.map((n) => netPower(n, counts.vdd, settings));
  const averageStaticWatts = sum(vectors.map((v) => v.staticWatts)) / Math.max(1, vectors.length);
  const dynamicWatts = sum(nets.filter((n) => !n.isInput).map((n) => n.watts));
  return {
    convention: ACTIVITY_CONVENTION,
    leakageModel: LEAKAGE_MODEL,
    activitySource: counts.activitySource,
    frequency: settings.frequency,
    vdd: counts.vdd,
    load: settings.load,
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
    notes: notesFor(counts),
  };
}

function netPower(n: NetCounts, vdd: number, settings: PowerSettings): NetPower {
  const load = n.isOutput ? settings.load : 0;
  const { gate, diffusion, explicit } = n.capacitance;
  const total = gate + diffusion + explicit + load;
  const energy = switchingEnergy(total, vdd, n.swing);
  return {
    net: n.net,
    activity: n.activity,
    capacitance: { gate, diffusion, explicit, load, total },
    swing: n.swing,
    energyPerTransition: energy,
    watts: n.activity * energy * settings.frequency,
    isInput: n.isInput,
  };
}

/** Shown with every report: what the estimate leaves out. */
export const POWER_OMISSIONS =
  'Not counted: short-circuit current while inputs switch, glitches, gate and junction leakage.';

function notesFor(counts: PowerCounts): string[] {
  const notes = [POWER_OMISSIONS];
  const random = counts.activitySource === 'random';
  if (counts.unsettled > 0)
    notes.push(`${counts.unsettled} vector(s) never settled; their nets count as neither 0 nor 1.`);
  const unclear = counts.unclear;
  if (unclear.length > 0) {
    const shown = unclear.slice(0, 8).join(', ') + (unclear.length > 8 ? ', …' : '');
    notes.push(
      `Some nets are X or hold unknown charge in some ${random ? 'vectors' : 'steps'} ` +
        `(${shown}); only definite levels count toward their activity.` +
        (random ? ' For a cell with stored state, a sequence gives truer activity.' : ''),
    );
  }
  if (!random && counts.vectors.length < 2) {
    notes.push('A one-step sequence has no transitions: activity is zero.');
  }
  return notes;
}

function sum(values: readonly number[]): number {
  return values.reduce((s, v) => s + v, 0);
}
