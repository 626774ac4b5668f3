// Indexes read here are in range by construction, so `!` marks them (no run-time cost).
import type { CapacitanceBreakdown } from '../compile/capacitance.ts';
import type { Netlist } from '../model/netlist.ts';
import type { Technology } from '../model/technology.ts';
import {
  edgeEfforts,
  equivalentInverter,
  inputCapacitance,
  logicalEffort,
  parasiticDelay,
  referenceLength,
} from './logicalEffort.ts';
import { delayCapacitances, totalCapacitance } from './nodeCapacitance.ts';
import { extractStage, type Stage } from './stage.ts';
import type { OutputSizing, SizingOptions, SizingReport } from './types.ts';
import { alwaysOnOhms, ControlLimitError, worstCase, type WorstCase } from './worstCase.ts';

export { proposeWidths } from './proposeWidths.ts';

export class SizingOptionsError extends Error {
  override readonly name = 'SizingOptionsError';
  constructor(
    /** The option at fault: 'load'. */
    readonly field: string,
    message: string,
  ) {
    super(message);
  }
}

export const SIZING_CONVENTION =
  "Worst case over every assignment of each output stage's gate signals (independent, except that a " +
  "local inverter's output is the complement of its input); " +
  'transistors as their on-resistance R_unit·L/W; g = Cin/Cinv with Cinv the inverter of equal worst-case ' +
  'drive; parasitic delay in units of p_inv; rise and fall as Elmore time constants (Σ R·C, no 0.69 factor) ' +
  'with the opposing network open and input pins as ideal sources.';

/**
 * Sizing from the drawn topology alone (no simulation): for each output, the worst pull-up and
 * pull-down resistance, the inverter of equal drive, logical effort per input, parasitic delay, and
 * Elmore estimates of the worst rise and fall into the given load.
 */
export function sizingReport(netlist: Netlist, tech: Technology, options: SizingOptions = {}): SizingReport {
  const load = options.load ?? 0;
  if (!Number.isFinite(load) || load < 0) {
    throw new SizingOptionsError('load', `load must be a non-negative number of farads, got ${load}`);
  }
  const caps = delayCapacitances(netlist, tech, options.sharedDiffusion ?? true);
  const outputs = netlist.outputs.map((o) => sizeOutput(netlist, tech, o, caps, load));
  const first = outputs[0];
  return {
    convention: SIZING_CONVENTION,
    load,
    outputs,
    logicalEffort: first?.logicalEffort ?? {},
    parasiticDelay: first?.parasiticDelay ?? null,
    rise: first?.rise ?? null,
    fall: first?.fall ?? null,
    notes:
      outputs.length > 1 ? ['Top-level figures are those of the first output; see outputs for each.'] : [],
  };
}

function stageCaps(
  stage: Stage,
  caps: ReadonlyMap<string, CapacitanceBreakdown>,
  load: number,
): Float64Array {
  const c = Float64Array.from(stage.nets, (n) => {
    const b = caps.get(n);
    return b === undefined ? 0 : totalCapacitance(b);
  });
  c[stage.output]! += load;
  return c;
}

function sizeOutput(
  netlist: Netlist,
  tech: Technology,
  output: string,
  caps: ReadonlyMap<string, CapacitanceBreakdown>,
  load: number,
): OutputSizing {
  const notes: string[] = [];
  const stage = extractStage(netlist, tech, output);
  const c = stageCaps(stage, caps, load);
  const [up, down] = searchBoth(stage, c, notes);
  if (stage.roles.includes('both')) {
    notes.push(
      `${output} is reached through pass transistors from an input pin; the pin's own driver is not included.`,
    );
  }
  return {
    output,
    pullUp: up?.drive ?? null,
    pullDown: down?.drive ?? null,
    ...efforts(netlist, tech, {
      stage,
      caps: c,
      up,
      down,
      notes,
      outputDiffusion: caps.get(output)?.diffusion ?? 0,
    }),
    outputCapacitance: c[stage.output]!,
    rise: up?.delay ?? null,
    fall: down?.delay ?? null,
    notes,
  };
}

interface SearchedStage {
  readonly stage: Stage;
  readonly caps: Float64Array;
  readonly up: WorstCase | null;
  readonly down: WorstCase | null;
  readonly notes: string[];
  /** Diffusion capacitance on the output, farads: the numerator of the parasitic delay. */
  readonly outputDiffusion: number;
}

/** The equivalent inverter and every effort figure; nulls when the output lacks a network. */
function efforts(netlist: Netlist, tech: Technology, s: SearchedStage) {
  const cin = inputCapacitance(netlist, tech);
  const l = referenceLength(netlist);
  const output = s.stage.nets[s.stage.output];
  if (s.up === null || s.down === null || l === null) {
    s.notes.push(`${output} lacks a pull-up or a pull-down: no equivalent inverter.`);
    const none = nullPerInput(cin);
    return {
      equivalentInverter: null,
      inputCapacitance: cin,
      logicalEffort: none,
      logicalEffortRise: none,
      logicalEffortFall: none,
      parasiticDelay: null,
    };
  }
  const inverter = equivalentInverter(tech, l, s.up.drive.ohms, s.down.drive.ohms);
  const loads = ratioedLoads(s.stage, s.caps, s.notes);
  const edges = edgeEfforts(cin, tech, l, { up: s.up.drive.ohms, down: s.down.drive.ohms, ...loads });
  return {
    equivalentInverter: inverter,
    inputCapacitance: cin,
    logicalEffort: logicalEffort(cin, inverter),
    logicalEffortRise: edges.rise,
    logicalEffortFall: edges.fall,
    parasiticDelay: parasiticDelay(s.outputDiffusion, inverter),
  };
}

/** Always-on loads of each direction (ratioed stages), noted when present. */
function ratioedLoads(stage: Stage, caps: Float64Array, notes: string[]) {
  const fightUp = alwaysOnOhms(stage, 'up', caps);
  const fightDown = alwaysOnOhms(stage, 'down', caps);
  if (fightUp !== null || fightDown !== null) {
    notes.push(
      `${stage.nets[stage.output]} is ratioed: an always-on load fights the opposite network. Its rising and ` +
        'falling efforts count only the current left over; the Elmore estimates ignore the fight.',
    );
  }
  return { fightUp, fightDown };
}

function searchBoth(stage: Stage, caps: Float64Array, notes: string[]): [WorstCase | null, WorstCase | null] {
  try {
    return [worstCase(stage, 'up', caps), worstCase(stage, 'down', caps)];
  } catch (error) {
    if (!(error instanceof ControlLimitError)) throw error;
    notes.push(error.message);
    return [null, null];
  }
}

function nullPerInput(cin: Readonly<Record<string, number>>): Record<string, null> {
  return Object.fromEntries(Object.keys(cin).map((k) => [k, null]));
}
