// Indexes here are in range by construction (compiled-netlist and per-net arrays), so `!` marks them (no run-time cost).
import { compile, type CompiledNetlist } from '../compile/compile.ts';
import type { InputValue, InputVector } from '../model/design.ts';
import type { Netlist } from '../model/netlist.ts';
import type { Technology } from '../model/technology.ts';
import { Simulator } from '../solver/simulator.ts';
import { TransferError } from './errors.ts';
import { whyUnknown } from './explain.ts';
import {
  curveFigures,
  NO_FIGURES,
  type CurveFigures,
  type CurvePoint,
  type MarginConvention,
} from './figures.ts';
import { chooseHold } from './holdVector.ts';
import { DcSolver, slopeAt, sourcesFor, type OperatingPoint, type Sources } from './operatingPoint.ts';
import { storedVolts } from './start.ts';

export { TransferError };

export const DEFAULT_TRANSFER_POINTS = 201;
export const MAX_TRANSFER_POINTS = 100_001;

export interface TransferOptions {
  /** The input swept from 0 to VDD. */
  readonly input: string;
  /** Values (0 or 1) of other inputs; inputs left out are chosen so an output follows the swept one. */
  readonly hold?: InputVector;
  /** Where VOL and VOH are read (default `unity-gain`, see figures.ts). */
  readonly convention?: MarginConvention;
  /** Evenly spaced input voltages from 0 to VDD inclusive (default 201). */
  readonly points?: number;
  /** Called after each point; return false to stop (the figures are then left out). */
  readonly onProgress?: (done: number, total: number) => boolean | void;
}

export interface TransferCurve extends CurveFigures {
  /** [Vin, Vout] pairs, volts; Vout null where the output has no DC voltage. */
  readonly points: readonly (readonly [number, number | null])[];
  /** True when the output falls as the input rises; null when it has no voltage at an end. */
  readonly inverting: boolean | null;
  readonly notes: readonly string[];
}

/** JSON-ready: what `railwise check --transfer` prints and the app's curve view will draw. */
export interface TransferReport {
  readonly input: string;
  /** Every other input's held value. */
  readonly hold: Readonly<Record<string, 0 | 1>>;
  /** Inputs whose held value Railwise chose. */
  readonly holdChosen: readonly string[];
  readonly convention: MarginConvention;
  readonly model: string;
  readonly curves: Readonly<Record<string, TransferCurve>>;
  readonly notes: readonly string[];
}

export const LEVEL1_MODEL = 'level 1 (Shichman–Hodges): no short-channel effects, no subthreshold current';

/** The DC transfer curve of every output as one input sweeps from 0 to VDD (docs/semantics.md §2). */
export function transferCurves(netlist: Netlist, tech: Technology, options: TransferOptions): TransferReport {
  const points = options.points ?? DEFAULT_TRANSFER_POINTS;
  checkOptions(netlist, options, points);
  const c = compile(netlist, tech);
  const choice = chooseHold(c, options.input, options.hold ?? {});
  const convention = options.convention ?? 'unity-gain';
  const sweep = sweepInput(c, options.input, choice.hold, points, options.onProgress);
  const curves = Object.fromEntries(
    netlist.outputs.map((output) => [output, outputCurve(c, sweep, output, convention)]),
  );
  return {
    input: options.input,
    hold: Object.fromEntries(Object.entries(choice.hold).map(([k, v]) => [k, v === '1' ? 1 : 0])),
    holdChosen: choice.chosen,
    convention,
    model: LEVEL1_MODEL,
    curves,
    notes: [
      ...choice.notes,
      ...(sweep.stopped ? [`stopped after ${sweep.vin.length} of ${points} points`] : []),
    ],
  };
}

function checkOptions(netlist: Netlist, options: TransferOptions, points: number): void {
  const { input, hold = {} } = options;
  if (!netlist.inputs.includes(input))
    throw new TransferError(`'${input}' is not an input (inputs: ${netlist.inputs.join(', ') || 'none'})`);
  for (const [name, value] of Object.entries(hold)) {
    if (name === input) throw new TransferError(`'${name}' is the swept input; it cannot be held too`);
    if (!netlist.inputs.includes(name)) throw new TransferError(`held '${name}' is not an input`);
    if (value !== '0' && value !== '1')
      throw new TransferError(`held ${name}=${value}: hold inputs at 0 or 1`);
  }
  if (!Number.isInteger(points) || points < 3 || points > MAX_TRANSFER_POINTS)
    throw new TransferError(`points must be a whole number from 3 to ${MAX_TRANSFER_POINTS} (got ${points})`);
}

/** The solved sweep: per sample the input voltage and the operating point. */
interface Sweep {
  readonly inNet: number;
  readonly vin: number[];
  readonly samples: OperatingPoint[];
  readonly slopes: Float64Array[];
  readonly stopped: boolean;
  readonly solveAt: (vin: number, near: number) => OperatingPoint;
}

function sweepInput(
  c: CompiledNetlist,
  input: string,
  hold: InputVector,
  points: number,
  onProgress: TransferOptions['onProgress'],
): Sweep {
  const inNet = c.netIndex.get(input) as number;
  const vector: InputVector = { ...hold, [input]: '0' as InputValue };
  const sources = sourcesFor(c, vector);
  const switchLevel = new Simulator(c).solveFresh(vector);
  const stored = storedVolts(switchLevel);
  const dc = new DcSolver(c);
  const vin: number[] = [];
  const samples: OperatingPoint[] = [];
  const slopes: Float64Array[] = [];
  const at = (v: number, start: ArrayLike<number>): OperatingPoint =>
    dc.solve(withInput(sources, inNet, v), { start, stored });
  let stopped = false;
  for (let k = 0; k < points; k++) {
    const v = (c.tech.vdd * k) / (points - 1);
    const point = at(v, samples[k - 1]?.raw ?? switchLevel.volts);
    vin.push(v);
    samples.push(point);
    slopes.push(slopeAt(point, inNet));
    if (onProgress?.(k + 1, points) === false && k + 1 < points) {
      stopped = true;
      break;
    }
  }
  return {
    inNet,
    vin,
    samples,
    slopes,
    stopped,
    solveAt: (v, near) => at(v, (samples[near] as OperatingPoint).raw),
  };
}

function withInput(sources: Sources, inNet: number, volts: number): Sources {
  const v = sources.volts.slice();
  v[inNet] = volts;
  return { volts: v, undriven: sources.undriven };
}

function outputCurve(
  c: CompiledNetlist,
  sweep: Sweep,
  output: string,
  convention: MarginConvention,
): TransferCurve {
  const net = c.netIndex.get(output) as number;
  const vout = sweep.samples.map((p) => p.volts[net] as number);
  const points = sweep.vin.map((v, k) => [v, Number.isNaN(vout[k]) ? null : vout[k]!] as const);
  const notes: string[] = [];
  const missing = vout.findIndex(Number.isNaN);
  const last = vout.length - 1;
  const inverting = Number.isNaN(vout[0]) || Number.isNaN(vout[last]) ? null : vout[0]! > vout[last]!;
  if (missing >= 0 || sweep.stopped) {
    if (missing >= 0) {
      const count = vout.filter(Number.isNaN).length;
      const where = `at ${count} of ${vout.length} points, from Vin = ${sweep.vin[missing]?.toFixed(3)} V`;
      notes.push(`no DC voltage ${where}: ${whyUnknown(sweep.samples[missing] as OperatingPoint, output)}`);
    }
    return { points, inverting, notes, ...NO_FIGURES };
  }
  const at = (v: number, near: number): CurvePoint | null => {
    const p = sweep.solveAt(v, near);
    const slope = slopeAt(p, sweep.inNet)[net] as number;
    return Number.isNaN(p.volts[net]) || Number.isNaN(slope) ? null : { vout: p.volts[net] as number, slope };
  };
  const slope = sweep.slopes.map((s) => s[net] as number);
  const figures = curveFigures({ vin: sweep.vin, vout, slope, at }, convention, notes);
  return { points, inverting, notes, ...figures };
}
