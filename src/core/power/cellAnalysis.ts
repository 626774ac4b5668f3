/**
 * The one-pass analysis of a cell, the call the command line and the page's worker both make: the
 * check (a sweep, or a sequence of steps) with its power counts, every vector solved once and read
 * by the check, the power tally and any further observers (docs/semantics.md §5). Power over other
 * vectors than the check's (random activity beside a sequence check, or the other way round) takes
 * a pass of its own on the same compiled netlist.
 */
import {
  checkSequence,
  checkSweep,
  DEFAULT_MAX_INPUTS,
  refusalBeforeCheck,
  type CheckOptions,
} from '../analysis/check.ts';
import { sequencePass, sweepPass } from '../analysis/pass.ts';
import type { CheckReport } from '../analysis/report.ts';
import { compile } from '../compile/compile.ts';
import type { InputVector } from '../model/design.ts';
import type { Netlist } from '../model/netlist.ts';
import { DEFAULT_TECHNOLOGY } from '../model/technology.ts';
import { Simulator } from '../solver/simulator.ts';
import { checkPowerPass } from './powerReport.ts';
import { PowerTally, type PowerCounts } from './tally.ts';
import type { ActivitySource } from './types.ts';

/** Inputs of a random-activity power pass at most: 2^20 vectors, each listed in the power report. */
export const MAX_POWER_INPUTS = 20;

export interface PowerRequest {
  readonly activity: ActivitySource;
  /** Steps for sequence activity; the check's own steps when left out. */
  readonly sequence?: readonly InputVector[];
}

export interface CellAnalysisOptions extends CheckOptions {
  /** Steps applied in order (a sequence check); without them every vector is swept. */
  readonly steps?: readonly InputVector[];
  /** Count power too; finish the counts with powerFromCounts for a clock and a load. */
  readonly power?: PowerRequest;
}

export interface CellAnalysis {
  readonly report: CheckReport;
  readonly power: PowerCounts | null;
}

export function analyseCell(netlist: Netlist, options: CellAnalysisOptions = {}): CellAnalysis {
  return prepareAnalysis(netlist, options).run();
}

/**
 * Everything that can refuse the analysis (the power settings, the expected functions, the input
 * limit) is checked here, before a vector is solved, so a caller that writes rows as they come
 * (`onBlock`) never has to abandon a report it has begun.
 */
export function prepareAnalysis(
  netlist: Netlist,
  options: CellAnalysisOptions = {},
): { readonly run: () => CellAnalysis } {
  const { steps, power } = options;
  const shared = power !== undefined && sharesPass(power, steps);
  // The power report lists every vector's static and leakage power, so a random-activity pass takes
  // at most MAX_POWER_INPUTS whatever the check's own limit (--max-inputs). A shared sweep past the
  // check's limit is refused by the check, in its own words.
  const checkLimit = options.maxInputs ?? DEFAULT_MAX_INPUTS;
  const withinCheck = netlist.inputs.length <= checkLimit;
  if (power !== undefined)
    checkPowerPass(netlist, power.activity, {
      sequence: power.sequence ?? steps ?? [],
      maxInputs: shared && !withinCheck ? Infinity : Math.min(checkLimit, MAX_POWER_INPUTS),
    });
  refusalBeforeCheck(netlist, options, steps === undefined);
  const run = (): CellAnalysis => {
    const simulator =
      options.simulator ?? new Simulator(compile(netlist, options.technology ?? DEFAULT_TECHNOLOGY));
    const tally = power === undefined ? null : new PowerTally(simulator.compiled, power.activity);
    const checkOptions: CheckOptions = {
      ...options,
      simulator,
      observers: [...(options.observers ?? []), ...(shared && tally !== null ? [tally] : [])],
    };
    const report =
      steps === undefined ? checkSweep(netlist, checkOptions) : checkSequence(netlist, steps, checkOptions);
    if (tally !== null && !shared) {
      if (tally.activitySource === 'random') sweepPass(simulator, [tally]);
      else sequencePass(simulator, power?.sequence ?? [], [tally]);
    }
    return { report, power: tally?.counts() ?? null };
  };
  return { run };
}

/** Whether the power counts can ride on the check's own pass: the same vectors in the same order. */
function sharesPass(power: PowerRequest, steps: readonly InputVector[] | undefined): boolean {
  if (power.activity === 'random') return steps === undefined;
  return steps !== undefined && (power.sequence === undefined || power.sequence === steps);
}
