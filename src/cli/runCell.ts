/**
 * Checks one cell and returns plain data: the single-cell JSON object of docs/semantics.md §5, or a failure.
 * No file access and no printing, so a worker thread can run it as well as the main thread.
 */
import {
  checkStructure,
  DEFAULT_MAX_INPUTS,
  SequenceError,
  SweepLimitError,
} from '../core/analysis/check.ts';
import { parseSequenceText } from '../core/analysis/sequenceText.ts';
import type { CheckReport, SweepColumns, VectorReport } from '../core/analysis/report.ts';
import { sweepRows } from '../core/analysis/sweepColumns.ts';
import { CAUTION } from '../core/caution.ts';
import { CompileError } from '../core/compile/compile.ts';
import { ExpressionError } from '../core/expect/parse.ts';
import type { InputValue, InputVector } from '../core/model/design.ts';
import { recordOf } from '../core/model/records.ts';
import { analyseCell, type PowerRequest } from '../core/power/cellAnalysis.ts';
import { powerFromCounts } from '../core/power/powerReport.ts';
import { DEFAULT_POWER_SETTINGS, PowerOptionsError, type PowerSettings } from '../core/power/settings.ts';
import type { PowerReport } from '../core/power/types.ts';
import { sizingReport } from '../core/sizing/sizingReport.ts';
import { foundFunctions, type FoundFunction } from '../core/analysis/foundFunction.ts';
import type { SizingReport } from '../core/sizing/types.ts';
import { compile } from '../core/compile/compile.ts';
import { TransferError, type TransferReport } from '../core/dc/transfer.ts';
import { VectorDcRunner, type VectorDc } from '../core/dc/vectorDc.ts';
import { Simulator } from '../core/solver/simulator.ts';
import { MAX_SWEEP_INPUTS } from '../core/analysis/vectors.ts';
import { WIDER_CELLS, type TransferChoice } from './args.ts';
import { cellTransfer } from './dcCell.ts';
import { cellProof, type ProofJson } from './proofCell.ts';
import type { CellFailure, CellJob, CellSkip } from './loadCells.ts';

export interface RunOptions {
  readonly allNets: boolean;
  readonly undriven: boolean;
  /** `--sequence` text: steps instead of the sweep. */
  readonly sequence?: string;
  /** Power settings given on the command line; the rest are the core's defaults. */
  readonly power?: Partial<PowerSettings>;
  readonly sizing: boolean;
  /** Add the function each output computes, read off the sweep (`--found`). */
  readonly found?: boolean;
  /** Output load for sizing, farads. */
  readonly load: number;
  readonly transfer?: TransferChoice;
  /** Level-1 DC beside each vector, read from the same pass as the check. */
  readonly dc?: boolean;
  /** Inputs a sweep may take (`--max-inputs`); the core's default when left out. */
  readonly maxInputs?: number;
  /** `--prove`: add the proof of every property; past the exhaustive limit the sweep is skipped. */
  readonly prove?: boolean;
}

/** A vector as printed: inputs as the numbers 0 and 1 (X and Z stay strings), per docs/semantics.md §5. */
export interface VectorJson extends Omit<VectorReport, 'inputs'> {
  readonly inputs: Readonly<Record<string, 0 | 1 | 'X' | 'Z'>>;
  /** With --dc: the level-1 operating point of this vector. */
  readonly dc?: VectorDc;
}

/** What the optional flags add to a cell's JSON. */
interface Extras {
  readonly power?: PowerReport | undefined;
  readonly sizing?: SizingReport | undefined;
  readonly transfer?: TransferReport | undefined;
  readonly dc?: readonly VectorDc[] | undefined;
  readonly found?: readonly FoundFunction[] | undefined;
  readonly proof?: ProofJson | undefined;
}

/**
 * A checked cell as plain data, ready to print: the single-cell JSON object of docs/semantics.md §5,
 * except that a sweep's rows stay in columns (`sweep`, printed as `vectors` row by row).
 */
export interface CellJson extends Omit<CheckReport, 'sweep' | 'steps'> {
  readonly file: string;
  readonly sweep?: SweepColumns;
  /** Rows as printed: a sweep's with `--dc` (each with its `dc`), or a sequence's steps. */
  readonly vectors?: readonly VectorJson[];
  readonly steps?: readonly VectorJson[];
  readonly technology: { readonly source: string; readonly vdd: number };
  readonly power?: PowerReport;
  readonly sizing?: SizingReport;
  readonly transfer?: TransferReport;
  /** With --found: per output, the function it computes as a minimal sum of products. */
  readonly found?: readonly FoundFunction[];
  readonly proof?: ProofJson;
  readonly caution: string;
}

export type CellResult =
  { readonly json: CellJson } | { readonly failure: CellFailure } | { readonly skipped: CellSkip };

export function runCell(job: CellJob, options: RunOptions): CellResult {
  try {
    const proof = options.prove ? cellProof(job) : undefined;
    if (proof !== undefined && sweepSkipped(job, options)) {
      const note = `${job.netlist.inputs.length} inputs are past the exhaustive limit of ${sweepLimit(options)}: the sweep was skipped, the proof covers every vector`;
      const report = checkStructure(
        job.netlist,
        { technology: job.technology, expectations: job.expectations },
        note,
      );
      return { json: cellJson(job, report, { proof }) };
    }
    const steps = options.sequence === undefined ? undefined : sequenceSteps(job, options.sequence);
    const power = options.power === undefined ? undefined : powerSettings(job, options.power, steps);
    // --dc reads each solved vector of the check's own pass.
    const simulator = new Simulator(compile(job.netlist, job.technology));
    const dc = options.dc ? new VectorDcRunner(simulator.compiled, { allNets: options.allNets }) : null;
    const { report, power: counts } = analyseCell(job.netlist, {
      technology: job.technology,
      simulator,
      expectations: job.expectations,
      allNets: options.allNets,
      undrivenInputs: options.undriven,
      ...(options.maxInputs === undefined ? {} : { maxInputs: options.maxInputs }),
      ...(dc === null ? {} : { observers: [dc] }),
      ...(steps === undefined ? {} : { steps }),
      ...(power === undefined ? {} : { power: power.request }),
    });
    const sizing = options.sizing
      ? sizingReport(job.netlist, job.technology, { load: options.load })
      : undefined;
    const powerJson =
      counts === null || power === undefined ? undefined : powerFromCounts(counts, power.settings);
    const transfer = options.transfer === undefined ? undefined : cellTransfer(job, options.transfer);
    const found = options.found === true && report.sweep !== undefined ? foundFunctions(report) : undefined;
    return {
      json: cellJson(job, report, { power: powerJson, sizing, transfer, dc: dc?.rows, found, proof }),
    };
  } catch (e) {
    return { failure: { file: job.file, cell: job.cell, ...failureOf(e) } };
  }
}

/** With --prove, a sweep past the exhaustive limit is skipped rather than refused (no --sequence). */
export function sweepSkipped(job: CellJob, options: RunOptions): boolean {
  return (
    options.prove === true &&
    options.sequence === undefined &&
    job.netlist.inputs.length > sweepLimit(options)
  );
}

/** The most inputs a sweep takes: `--max-inputs`, else the core's default. */
function sweepLimit(options: RunOptions): number {
  return options.maxInputs ?? DEFAULT_MAX_INPUTS;
}

/**
 * `--sequence` gives steps (docs/semantics.md §5) or the name of a sequence saved in a design file;
 * a saved name wins over text that happens to read as steps.
 */
export function sequenceSteps(job: CellJob, text: string): readonly InputVector[] {
  const saved = job.sequences.find((s) => s.name.toLowerCase() === text.trim().toLowerCase());
  if (saved !== undefined) return saved.steps;
  if (!text.includes('=') && text.trim() !== '-') {
    const names = job.sequences.map((s) => `"${s.name}"`).join(', ') || 'none';
    throw new SequenceError(
      `"${text}" is neither steps (A=0 B=1; A=1) nor a saved sequence (saved: ${names})`,
    );
  }
  return parseSequenceText(text, job.netlist.inputs);
}

/**
 * Settings as given, else the core's defaults (the app's too); with --sequence the activity is that
 * sequence's unless --activity says otherwise, and --activity sequence alone uses the first saved one.
 */
export function powerSettings(
  job: CellJob,
  given: Partial<PowerSettings>,
  steps: readonly InputVector[] | undefined,
): { settings: PowerSettings; request: PowerRequest } {
  const activity = given.activity ?? (steps === undefined ? DEFAULT_POWER_SETTINGS.activity : 'sequence');
  const sequence = steps ?? job.sequences[0]?.steps;
  const settings = { ...DEFAULT_POWER_SETTINGS, ...given, activity };
  return { settings, request: { activity, ...(sequence === undefined ? {} : { sequence }) } };
}

/** Errors that mean "this cell cannot be checked as asked", each tied to what the user should fix. */
export function failureOf(e: unknown): { message: string; field?: string } {
  if (e instanceof ExpressionError) {
    return {
      message: `expected function${e.output === undefined ? ':' : ' of'} ${e.message}`,
      field: 'expect',
    };
  }
  if (e instanceof SequenceError) return { message: `--sequence: ${e.message}`, field: 'sequence' };
  if (e instanceof TransferError) return { message: `--transfer: ${e.message}`, field: 'transfer' };
  if (e instanceof PowerOptionsError) return { message: `--power: ${e.message}`, field: e.field };
  if (e instanceof SweepLimitError) return { message: sweepLimitMessage(e), field: 'inputs' };
  if (e instanceof CompileError) return { message: e.message };
  const text = e instanceof Error ? (e.stack ?? e.message) : String(e);
  return { message: `internal error (please report it): ${text}` };
}

/** Past the limit asked for, how to sweep anyway; past the largest sweep, what to check instead. */
function sweepLimitMessage(e: SweepLimitError): string {
  if (e.inputs <= MAX_SWEEP_INPUTS && e.limit < e.inputs)
    return `${e.message}; give --max-inputs ${e.inputs} to sweep all ${(2 ** e.inputs).toLocaleString('en-US')} vectors, or ${WIDER_CELLS}`;
  return `${e.message}, and no sweep takes more than ${MAX_SWEEP_INPUTS}; ${WIDER_CELLS}`;
}

function cellJson(job: CellJob, report: CheckReport, extras: Extras): CellJson {
  const { power, sizing, transfer, dc, found, proof } = extras;
  const rows = (list: readonly VectorReport[]): VectorJson[] =>
    list.map((v, i) => (dc?.[i] === undefined ? vectorJson(v) : { ...vectorJson(v), dc: dc[i] }));
  const { sweep, steps } = report;
  return {
    cell: job.cell,
    file: job.file,
    inputs: report.inputs,
    outputs: report.outputs,
    ...(sweep === undefined ? {} : dc === undefined ? { sweep } : { vectors: rows(sweepRows(sweep)) }),
    ...(steps === undefined ? {} : { steps: rows(steps) }),
    findings: report.findings,
    summary: report.summary,
    notes: [...job.notes, ...report.notes],
    technology: { source: job.technology.source, vdd: job.technology.vdd },
    ...(power === undefined ? {} : { power }),
    ...(sizing === undefined ? {} : { sizing }),
    ...(transfer === undefined ? {} : { transfer }),
    ...(found === undefined ? {} : { found }),
    ...(proof === undefined ? {} : { proof }),
    caution: CAUTION,
  };
}

export function vectorJson(v: VectorReport): VectorJson {
  const inputs = recordOf(Object.entries(v.inputs).map(([k, x]) => [k, inputNumber(x)] as const));
  return { ...v, inputs };
}

function inputNumber(x: InputValue): 0 | 1 | 'X' | 'Z' {
  return x === '0' ? 0 : x === '1' ? 1 : x;
}
