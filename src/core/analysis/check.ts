// Indexes read here are in range by construction, so `!` marks them (no run-time cost).
import { compile, type CompiledNetlist } from '../compile/compile.ts';
import { evaluateExpression, type ExpectedValue } from '../expect/evaluate.ts';
import { expressionNames } from '../expect/names.ts';
import { ExpressionError, parseExpectation, type Expr } from '../expect/parse.ts';
import type { CellDesign } from '../document/design.ts';
import type { InputValue, InputVector } from '../model/design.ts';
import { recordOf } from '../model/records.ts';
import type { Netlist } from '../model/netlist.ts';
import { DEFAULT_TECHNOLOGY, type Technology } from '../model/technology.ts';
import { levelName } from '../solver/levels.ts';
import { Simulator, type SolveResult } from '../solver/simulator.ts';
import { currentPathsOf } from './findingParts.ts';
import type { CheckReport, Finding, FindingKind, Summary, SweepColumns, VectorReport } from './report.ts';
import { structuralFindings } from './rules.ts';
import { vectorFindings } from './vectorFindings.ts';
import { sequencePass, sweepPass, type PassProgress, type SolveObserver } from './pass.ts';
import { KIND_ORDER, sweepFindings } from './sweepColumns.ts';
import { SweepRows } from './sweepRows.ts';
import { checkSweepLimit, sweepSize, vectorNumber } from './vectors.ts';
import { WordSweep } from './vectorsWordPass.ts';

export { DEFAULT_MAX_INPUTS, SweepLimitError, sweepVectors } from './vectors.ts';
export { SequenceError } from './pass.ts';

export interface CheckOptions {
  readonly technology?: Technology;
  /** Expected function per output, as expression text. */
  readonly expectations?: Readonly<Record<string, string>>;
  /** Report every net's voltage, not just the outputs'. */
  readonly allNets?: boolean;
  /** Sweep also leaves each input undriven (Z). */
  readonly undrivenInputs?: boolean;
  readonly maxInputs?: number;
  /** Called with (done, total) during long sweeps; return false to stop early. */
  readonly onProgress?: PassProgress;
  /** The revision's simulator, when the caller already has one: nothing is compiled again. */
  readonly simulator?: Simulator;
  /** Further readers of each solved vector (power counters, level strips): one solve feeds all. */
  readonly observers?: readonly SolveObserver[];
  /**
   * A sweep's rows go here block by block (SWEEP_BLOCK vectors at most) as they are solved and are
   * not kept, so a sweep of millions of vectors never holds its rows: the report then has no `sweep`
   * and only the structural findings, while its summary still counts every finding.
   */
  readonly onBlock?: (block: SweepColumns) => void;
  /**
   * Sweeps take the bit-parallel path where the cell suits it (docs/semantics.md §2.10; same rows);
   * false keeps every vector on the scalar engine, for comparison.
   */
  readonly wordParallel?: boolean;
}

export { SWEEP_BLOCK } from './sweepRows.ts';

export const FINDING_KINDS: readonly FindingKind[] = KIND_ORDER;

export { expressionNames };

/** `A=1 B=0` */
export function vectorLabel(v: InputVector, inputs: readonly string[]): string {
  return inputs.length === 0 ? '(no inputs)' : inputs.map((n) => `${n}=${v[n] ?? 'Z'}`).join(' ');
}

/** What a check reads of every solved vector: its expected values and its findings. */
class Checker {
  readonly compiled: CompiledNetlist;
  readonly simulator: Simulator;
  private readonly expectations: [number, Expr][];
  /** Some expected function names an output (its held value). */
  private readonly refersToHeld: boolean;
  /** Findings of every vector checked, counted by kind (the rows themselves may be streamed). */
  readonly counts: Record<string, number> = summarize(0, []) as Record<string, number>;

  constructor(
    readonly netlist: Netlist,
    readonly options: CheckOptions,
  ) {
    this.simulator =
      options.simulator ?? new Simulator(compile(netlist, options.technology ?? DEFAULT_TECHNOLOGY));
    this.compiled = this.simulator.compiled;
    this.expectations = parsedExpectations(netlist, options.expectations).map(([output, e]) => [
      this.compiled.netIndex.get(output) as number,
      e,
    ]);
    const outputs = new Set(netlist.outputs);
    this.refersToHeld = this.expectations.some(([, e]) => namesIn(e).some((name) => outputs.has(name)));
  }

  /**
   * One vector's findings, counted. `held` is the previous step's report in a sequence; without it
   * (a sweep, or a sequence's first step) the outputs' held values are unknown.
   */
  findingsOf(r: SolveResult, index: number, held?: VectorReport): Finding[] {
    const { netlist } = this;
    const values = this.refersToHeld
      ? recordOf([...Object.entries(heldValues(netlist.outputs, held)), ...Object.entries(r.inputs)])
      : r.inputs;
    const expected = new Map<number, ExpectedValue>(
      this.expectations.map(([n, e]) => [n, evaluateExpression(e, values)]),
    );
    const findings = vectorFindings(r, index, () => vectorLabel(r.inputs, netlist.inputs), expected);
    countFindings(this.counts, findings);
    return findings;
  }

  /** One step's report, in the shape of docs/semantics.md §5. */
  vectorReport(r: SolveResult, index: number, held?: VectorReport): VectorReport {
    const { netlist } = this;
    const c = this.compiled;
    const voltageNets = this.options.allNets ? c.netNames : netlist.outputs;
    const volts = (name: string): number | null => {
      const v = r.volts[c.netIndex.get(name) as number]!;
      return Number.isNaN(v) ? null : v;
    };
    return {
      inputs: this.allInputs(r.inputs),
      outputs: Object.fromEntries(
        netlist.outputs.map((n) => [n, levelName(r.levels[c.netIndex.get(n) as number]!)]),
      ),
      voltages: Object.fromEntries(voltageNets.map((n) => [n, volts(n)])),
      supplyCurrent: r.supplyCurrent,
      staticPower: r.staticPower,
      currentPaths: currentPathsOf(r),
      findings: this.findingsOf(r, index, held),
    };
  }

  /** The vector as given when it names every input, else completed with Z. */
  private allInputs(v: InputVector): InputVector {
    return this.netlist.inputs.every((n) => n in v)
      ? v
      : Object.fromEntries(this.netlist.inputs.map((n) => [n, v[n] ?? 'Z']));
  }

  /** The report: structural findings first, then those of the rows kept; the summary counts all. */
  report(vectors: number, rows: Pick<CheckReport, 'steps' | 'sweep'>, notes: string[]): CheckReport {
    const structural = structuralFindings(this.compiled);
    const kept = rows.steps?.flatMap((v) => v.findings) ?? (rows.sweep ? [...sweepFindings(rows.sweep)] : []);
    const summary = countFindings({ ...this.counts }, structural);
    return {
      cell: this.netlist.name,
      inputs: this.netlist.inputs,
      outputs: this.netlist.outputs,
      ...rows,
      findings: [...structural, ...kept],
      summary: { ...summary, vectors },
      notes,
    };
  }
}

/** The steps of a sequence as report rows, each read with the one before it (held values). */
class StepRows implements SolveObserver {
  readonly rows: VectorReport[] = [];

  constructor(private readonly checker: Checker) {}

  add(r: SolveResult, index: number): void {
    const held = index > 0 ? this.rows[this.rows.length - 1] : undefined;
    this.rows.push(this.checker.vectorReport(r, index, held));
  }
}

/** Each output's level in the previous report, read as an input value (X where not 0 or 1). */
function heldValues(outputs: readonly string[], held: VectorReport | undefined): Record<string, InputValue> {
  return recordOf(
    outputs.map((o) => {
      const level = held?.outputs[o];
      return [o, level === '0' || level === '1' ? level : 'X'];
    }),
  );
}

/** The names an expression reads, walked with a list rather than the call stack. */
function namesIn(root: Expr): string[] {
  const names: string[] = [];
  const todo: Expr[] = [root];
  for (let e = todo.pop(); e !== undefined; e = todo.pop()) {
    if (e.kind === 'name') names.push(e.name);
    else if (e.kind === 'not') todo.push(e.arg);
    else if (e.kind === 'choose') todo.push(e.select, e.whenTrue, e.whenFalse);
    else if (e.kind !== 'const') todo.push(e.left, e.right);
  }
  return names;
}

/**
 * The expected functions parsed against the names they may read (inputs, and outputs for held
 * values), by output; throws ExpressionError
 * naming the output for one that is not an output or does not parse. A check refuses these before
 * it solves anything (`refusalBeforeCheck`).
 */
export function parsedExpectations(
  netlist: Netlist,
  expectations: Readonly<Record<string, string>> = {},
): [string, Expr][] {
  return Object.entries(expectations).map(([output, text]) => {
    if (!netlist.outputs.includes(output)) throw new ExpressionError('not an output', text, 0, output);
    return [output, parseExpectation(output, text, expressionNames(netlist))];
  });
}

/**
 * Throws what a check with these options would refuse before solving a vector (an expected function
 * that does not parse, too many inputs for a sweep), so a caller can refuse a cell before it starts
 * writing the cell's report.
 */
export function refusalBeforeCheck(netlist: Netlist, options: CheckOptions, sweep: boolean): void {
  parsedExpectations(netlist, options.expectations);
  if (sweep) checkSweepLimit(netlist.inputs, options.maxInputs);
}

export function summarize(vectors: number, findings: readonly Finding[]): Summary {
  const counts: Record<string, number> = { vectors, errors: 0, warnings: 0 };
  for (const k of FINDING_KINDS) counts[k] = 0;
  return countFindings(counts, findings);
}

function countFindings(counts: Record<string, number>, findings: readonly Finding[]): Summary {
  for (const f of findings) {
    const severity = f.severity === 'error' ? 'errors' : 'warnings';
    counts[severity] = (counts[severity] ?? 0) + 1;
    counts[f.kind] = (counts[f.kind] ?? 0) + 1;
  }
  return counts as Summary;
}

/**
 * A check that solves no vector: the structural findings and a note, for a cell whose sweep is
 * skipped (too many inputs) while a proof covers its vectors.
 */
export function checkStructure(netlist: Netlist, options: CheckOptions, note: string): CheckReport {
  const checker = new Checker(netlist, options);
  const sweep = new SweepRows(checker, undefined, 0).finish(); // no rows: `vectors` prints as []
  return checker.report(0, sweep === undefined ? {} : { sweep }, [note]);
}

/**
 * Checks single vectors, each from an unknown state exactly as `checkSweep` checks each of its
 * vectors: the replay of a proof's counterexamples (docs/semantics.md §10).
 */
export class VectorChecker {
  private readonly checker: Checker;

  constructor(netlist: Netlist, options: CheckOptions = {}) {
    this.checker = new Checker(netlist, options);
  }

  /** The vector's report; `index` is the vector's place in the sweep's order, named by its findings. */
  check(vector: InputVector, index: number): VectorReport {
    return this.checker.vectorReport(this.checker.simulator.solveFresh(vector), index);
  }
}

/** Checks every input combination, each solved from an unknown state (docs/semantics.md §2.9, sweep mode). */
export function checkSweep(netlist: Netlist, options: CheckOptions = {}): CheckReport {
  const checker = new Checker(netlist, options);
  checkSweepLimit(netlist.inputs, options.maxInputs);
  const total = sweepSize(netlist.inputs, options.undrivenInputs);
  const rows = new SweepRows(checker, options.onBlock);
  const words = wordSweepOf(checker, rows, options);
  const done =
    words === null
      ? sweepPass(checker.simulator, [rows, ...(options.observers ?? [])], options)
      : words.run(rows, options.onProgress);
  const notes = done < total ? [`stopped after ${done} of ${total} vectors`] : [];
  const sweep = rows.finish();
  return checker.report(done, sweep === undefined ? {} : { sweep }, notes);
}

/** The bit-parallel sweep when nothing but the rows reads the vectors and the cell suits it. */
function wordSweepOf(checker: Checker, rows: SweepRows, options: CheckOptions): WordSweep | null {
  if (options.wordParallel === false || options.undrivenInputs === true) return null;
  if ((options.observers?.length ?? 0) > 0) return null;
  return WordSweep.plan(checker.simulator, rows.reportedNets, options.expectations ?? {});
}

/**
 * Applies steps in order, carrying stored charge from each to the next (docs/semantics.md §2.9, sequence mode).
 * An input a step does not mention keeps its previous value; before its first mention it is X.
 */
export function checkSequence(
  netlist: Netlist,
  steps: readonly InputVector[],
  options: CheckOptions = {},
): CheckReport {
  const checker = new Checker(netlist, options);
  const rows = new StepRows(checker);
  sequencePass(checker.simulator, steps, [rows, ...(options.observers ?? [])], options.onProgress);
  return checker.report(rows.rows.length, { steps: rows.rows }, []);
}

/**
 * One solved vector's findings, read as a sweep row's are, expected functions included: the page's
 * shown vector when the cell has more inputs than a sweep takes (docs/semantics.md §7).
 */
export function solvedVectorFindings(
  netlist: Netlist,
  simulator: Simulator,
  r: SolveResult,
  expectations: Readonly<Record<string, string>>,
): Finding[] {
  const checker = new Checker(netlist, { simulator, expectations });
  return checker.findingsOf(r, vectorNumber(netlist.inputs, r.inputs));
}

/** Checks a design: its sweep with its own technology and expected functions. */
export function checkDesign(
  design: CellDesign,
  options: Omit<CheckOptions, 'technology' | 'expectations'> = {},
): CheckReport {
  return checkSweep(design.netlist, {
    ...options,
    technology: design.technology,
    expectations: design.expectations,
  });
}

export { ExpressionError };
