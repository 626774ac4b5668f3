/**
 * Command-line arguments, read with Node's `util.parseArgs` and checked here, so that everything
 * after this point works on typed values. Every problem is a UsageError naming the flag.
 */
import { parseArgs, type ParseArgsConfig } from 'node:util';
import { MARGIN_CONVENTIONS, type MarginConvention } from '../core/dc/figures.ts';
import { DEFAULT_TRANSFER_POINTS, MAX_TRANSFER_POINTS } from '../core/dc/transfer.ts';
import { nameRecord } from '../core/model/records.ts';
import { MAX_SWEEP_INPUTS } from '../core/analysis/vectors.ts';
import { spiceValue } from '../core/units/spiceNumber.ts';
import { parseStandIns, type StandIn } from '../core/netlist-io/deviceNames.ts';
import { rangeProblem } from '../core/netlist-io/valueRanges.ts';
import type { PowerSettings } from '../core/power/settings.ts';
import { UsageError } from './usage.ts';

/** What picks and shapes one cell; shared by check and export. */
export interface CellChoice {
  readonly cell?: string;
  readonly inputs?: readonly string[];
  readonly outputs?: readonly string[];
  readonly expect: Readonly<Record<string, string>>;
  readonly sequence?: string;
  readonly vdd?: number;
  readonly supply: readonly string[];
  readonly ground: readonly string[];
  /** Metres per unit of W and L as written in netlists (`--scale`). */
  readonly scale?: number;
  /** What undefined subcircuits stand for (`--treat-as NAME=nmos`), by lower-case name. */
  readonly treatAs: ReadonlyMap<string, StandIn>;
  /** In a library, check only the subcircuits nothing instantiates. */
  readonly topOnly: boolean;
  /** A Liberty file whose published functions the cells are checked against. */
  readonly functionsFrom?: string;
}

/** `--transfer IN [--hold "B=1 C=0"] [--convention unity-gain|rails] [--points N]`. */
export interface TransferChoice {
  readonly input: string;
  /** The --hold text, read against the cell's inputs when it runs. */
  readonly hold?: string;
  readonly convention: MarginConvention;
  readonly points: number;
}

export interface CheckArgs extends CellChoice {
  readonly files: readonly string[];
  readonly json: boolean;
  readonly allNets: boolean;
  readonly undriven: boolean;
  /** The power settings given on the command line; the rest take the core's defaults. */
  readonly power?: Partial<PowerSettings>;
  readonly sizing: boolean;
  /** Print the function each cell computes (`--found`). */
  readonly found: boolean;
  readonly transfer?: TransferChoice;
  /** Level-1 DC operating point beside each vector. */
  readonly dc: boolean;
  /** Prove every property for all vectors (docs/semantics.md §10). */
  readonly prove: boolean;
  /** Output load in farads for --power and --sizing, when given (else the core's default). */
  readonly load?: number;
  readonly jobs?: number;
  /** Inputs a sweep may take (`--max-inputs`, at most MAX_SWEEP_INPUTS); the core's default when left out. */
  readonly maxInputs?: number;
  readonly help: boolean;
}

export type ExportFormat = 'spice' | 'verilog' | 'csv';

export interface ExportArgs extends CellChoice {
  readonly file: string;
  readonly to: ExportFormat;
  readonly help: boolean;
}

/** How a file is read into cells: its rails, supply voltage, size scale and kit devices. */
export const READING_OPTIONS = {
  vdd: { type: 'string' },
  supply: { type: 'string' },
  ground: { type: 'string' },
  scale: { type: 'string' },
  'treat-as': { type: 'string', multiple: true },
} as const satisfies ParseArgsConfig['options'];

const CELL_OPTIONS = {
  ...READING_OPTIONS,
  cell: { type: 'string' },
  inputs: { type: 'string' },
  outputs: { type: 'string' },
  expect: { type: 'string', multiple: true },
  sequence: { type: 'string' },
  'top-only': { type: 'boolean' },
  'functions-from': { type: 'string' },
  help: { type: 'boolean', short: 'h' },
} as const satisfies ParseArgsConfig['options'];

const CHECK_OPTIONS = {
  ...CELL_OPTIONS,
  json: { type: 'boolean' },
  'all-nets': { type: 'boolean' },
  undriven: { type: 'boolean' },
  power: { type: 'boolean' },
  freq: { type: 'string' },
  activity: { type: 'string' },
  load: { type: 'string' },
  sizing: { type: 'boolean' },
  found: { type: 'boolean' },
  jobs: { type: 'string' },
  transfer: { type: 'string' },
  hold: { type: 'string' },
  convention: { type: 'string' },
  points: { type: 'string' },
  dc: { type: 'boolean' },
  'max-inputs': { type: 'string' },
  prove: { type: 'boolean' },
} as const satisfies ParseArgsConfig['options'];

const EXPORT_OPTIONS = {
  ...CELL_OPTIONS,
  to: { type: 'string' },
} as const satisfies ParseArgsConfig['options'];

export function parseCheckArgs(argv: readonly string[]): CheckArgs {
  const { values: v, positionals } = parse(argv, CHECK_OPTIONS);
  if (!v.help && positionals.length === 0)
    throw new UsageError('check needs at least one FILE (see railwise check --help)');
  const powerFlag = v.freq !== undefined || v.activity !== undefined;
  if (powerFlag && !v.power) throw new UsageError('--freq and --activity go with --power');
  if (v.found && v.sequence !== undefined)
    throw new UsageError('--found reads the function off the sweep: leave out --sequence');
  if (v.load !== undefined && !v.power && !v.sizing)
    throw new UsageError('--load goes with --power or --sizing');
  const transfer = transferChoice(v);
  return {
    ...cellChoice(v),
    files: positionals,
    json: v.json ?? false,
    allNets: v['all-nets'] ?? false,
    undriven: v.undriven ?? false,
    sizing: v.sizing ?? false,
    found: v.found ?? false,
    dc: v.dc ?? false,
    prove: v.prove ?? false,
    ...(transfer === undefined ? {} : { transfer }),
    help: v.help ?? false,
    ...(v.load === undefined ? {} : { load: loadValue(v.load) }),
    ...(v.power ? { power: powerChoice(v) } : {}),
    ...(v.jobs === undefined ? {} : { jobs: positiveInteger('--jobs', v.jobs) }),
    ...(v['max-inputs'] === undefined ? {} : { maxInputs: maxInputs(v['max-inputs']) }),
  };
}

/** `--max-inputs N`: 1 to MAX_SWEEP_INPUTS; past that no sweep is offered, and the message says what is. */
function maxInputs(text: string): number {
  const value = positiveInteger('--max-inputs', text);
  if (value > MAX_SWEEP_INPUTS)
    throw new UsageError(
      `--max-inputs ${value}: a sweep takes at most ${MAX_SWEEP_INPUTS} inputs (${(2 ** MAX_SWEEP_INPUTS).toLocaleString('en-US')} vectors); ${WIDER_CELLS}`,
    );
  return value;
}

/** What to do for a cell with more inputs than any sweep takes. */
export const WIDER_CELLS =
  'prove its properties for every vector with --prove (the sweep is then skipped), or check chosen vectors with --sequence "A=0 B=1; A=1" (a single vector is a one-step sequence)';

export function parseExportArgs(argv: readonly string[]): ExportArgs {
  const { values: v, positionals } = parse(argv, EXPORT_OPTIONS);
  const help = v.help ?? false;
  if (!help && positionals.length !== 1)
    throw new UsageError('export takes exactly one FILE (see railwise export --help)');
  if (!help && v.to !== 'spice' && v.to !== 'verilog' && v.to !== 'csv') {
    throw new UsageError(`--to must be spice, verilog or csv${v.to === undefined ? '' : ` (got "${v.to}")`}`);
  }
  return { ...cellChoice(v), file: positionals[0] ?? '', to: (v.to ?? 'spice') as ExportFormat, help };
}

/** `util.parseArgs` with every problem a UsageError (exit status 2). */
export function parse<T extends NonNullable<ParseArgsConfig['options']>>(
  argv: readonly string[],
  options: T,
) {
  try {
    return parseArgs({ args: [...argv], options, allowPositionals: true, strict: true });
  } catch (e) {
    throw new UsageError(e instanceof Error ? e.message : String(e));
  }
}

export interface CellValues {
  cell?: string;
  inputs?: string;
  outputs?: string;
  expect?: string[];
  sequence?: string;
  vdd?: string;
  supply?: string;
  ground?: string;
  scale?: string;
  'treat-as'?: string[];
  'top-only'?: boolean;
  'functions-from'?: string;
}

/** How a file is read and which of its cells, from the flags check, export and compare share. */
export function cellChoice(v: CellValues): CellChoice {
  return {
    expect: expectations(v.expect ?? []),
    supply: list(v.supply),
    ground: list(v.ground),
    treatAs: treatAs(v['treat-as'] ?? []),
    topOnly: v['top-only'] ?? false,
    ...(v.scale === undefined ? {} : { scale: scaleValue(v.scale) }),
    ...(v['functions-from'] === undefined ? {} : { functionsFrom: v['functions-from'] }),
    ...(v.cell === undefined ? {} : { cell: v.cell }),
    ...(v.inputs === undefined ? {} : { inputs: list(v.inputs) }),
    ...(v.outputs === undefined ? {} : { outputs: list(v.outputs) }),
    ...(v.sequence === undefined ? {} : { sequence: v.sequence }),
    ...(v.vdd === undefined ? {} : { vdd: supplyVolts(v.vdd) }),
  };
}

function powerChoice(v: { freq?: string; activity?: string; load?: string }): Partial<PowerSettings> {
  const activity = v.activity;
  if (activity !== undefined && activity !== 'sequence' && activity !== 'random') {
    throw new UsageError(`--activity must be sequence or random (got "${activity}")`);
  }
  return {
    ...(v.freq === undefined ? {} : { frequency: frequency(v.freq) }),
    ...(v.load === undefined ? {} : { load: loadValue(v.load) }),
    ...(activity === undefined ? {} : { activity }),
  };
}

function transferChoice(v: {
  transfer?: string;
  hold?: string;
  convention?: string;
  points?: string;
}): TransferChoice | undefined {
  if (v.transfer === undefined) {
    const stray =
      v.hold !== undefined
        ? '--hold'
        : v.convention !== undefined
          ? '--convention'
          : v.points !== undefined
            ? '--points'
            : null;
    if (stray !== null) throw new UsageError(`${stray} goes with --transfer IN`);
    return undefined;
  }
  const convention = v.convention ?? 'unity-gain';
  if (!(MARGIN_CONVENTIONS as readonly string[]).includes(convention))
    throw new UsageError(`--convention must be ${MARGIN_CONVENTIONS.join(' or ')} (got "${convention}")`);
  const points = v.points === undefined ? DEFAULT_TRANSFER_POINTS : positiveInteger('--points', v.points);
  if (points < 3 || points > MAX_TRANSFER_POINTS)
    throw new UsageError(`--points ${points}: give 3 to ${MAX_TRANSFER_POINTS}`);
  return {
    input: v.transfer.trim(),
    convention: convention as MarginConvention,
    points,
    ...(v.hold === undefined ? {} : { hold: v.hold }),
  };
}

/** `--expect "Y = !(A & B)"`, repeatable; the first `=` splits output from expression. */
function expectations(texts: readonly string[]): Record<string, string> {
  const out = nameRecord<string>(); // an output may be called __proto__
  for (const text of texts) {
    const eq = text.indexOf('=');
    const output = text.slice(0, Math.max(eq, 0)).trim();
    const expression = text.slice(eq + 1).trim();
    if (eq < 0 || output === '' || expression === '') {
      throw new UsageError(`--expect "${text}": write OUTPUT = EXPRESSION, e.g. --expect "Y = !(A & B)"`);
    }
    out[output] = expression;
  }
  return out;
}

/** `--treat-as NAME=nmos`, repeatable, or comma-separated pairs. */
function treatAs(texts: readonly string[]): Map<string, StandIn> {
  const map = new Map<string, StandIn>();
  for (const text of texts) {
    const { map: pairs, bad } = parseStandIns(text);
    if (bad !== null)
      throw new UsageError(`--treat-as "${bad}": write NAME=nmos, NAME=pmos, NAME=diode or NAME=short`);
    pairs.forEach((kind, name) => map.set(name, kind));
  }
  return map;
}

/** `--scale 1e-6`: metres per unit of the W and L numbers, in its documented range. */
function scaleValue(text: string): number {
  const value = spiceValue(text);
  const problem = value === null ? 'is not a number' : rangeProblem('scale', value);
  if (problem !== null)
    throw new UsageError(`--scale "${text}" ${problem} (e.g. --scale 1e-6 for sizes in µm)`);
  return value as number;
}

function list(text: string | undefined): string[] {
  return text === undefined ? [] : text.split(/[\s,]+/).filter((s) => s !== '');
}

function loadValue(text: string): number {
  const load = spiceValue(text);
  if (load === null || load < 0 || (load > 0 && rangeProblem('farads', load) !== null))
    throw new UsageError(
      `--load "${text}" is not a capacitance in farads from 1 zF to 1 µF, or 0 (e.g. 10f)`,
    );
  return load;
}

/**
 * A clock frequency. With a hertz unit the prefix is read as people write clocks (`100MHz`, `1.2GHz`,
 * `500kHz`: M is mega, any case); without one, as a SPICE number (`100meg`, `1e8`).
 */
export function frequency(text: string): number {
  const hz = /^\s*([0-9]*\.?[0-9]+(?:e[+-]?[0-9]+)?)\s*([kmg]?)hz\s*$/i.exec(text);
  if (hz) {
    const scale = { '': 1, k: 1e3, m: 1e6, g: 1e9 }[(hz[2] ?? '').toLowerCase() as '' | 'k' | 'm' | 'g'];
    const value = Number(hz[1]) * scale;
    if (value > 0 && Number.isFinite(value)) return value;
  }
  return positiveNumber('--freq', text);
}

/** Accepts SPICE-style numbers: `2.5`, `100meg`, `1e8`; finite ones only. */
function positiveNumber(flag: string, text: string): number {
  const value = spiceValue(text);
  if (value === null || !(value > 0) || !Number.isFinite(value))
    throw new UsageError(`${flag} "${text}" is not a positive number`);
  return value;
}

/** `--vdd`: a positive supply in the range a netlist's sources may have (docs/semantics.md §6). */
function supplyVolts(text: string): number {
  const value = positiveNumber('--vdd', text);
  const problem = rangeProblem('volts', value);
  if (problem !== null) throw new UsageError(`--vdd "${text}" ${problem}`);
  return value;
}

function positiveInteger(flag: string, text: string): number {
  const value = Number(text);
  if (!Number.isInteger(value) || value < 1)
    throw new UsageError(`${flag} "${text}" is not a whole number of 1 or more`);
  return value;
}
