// Indexes read here are in range by construction, so `!` marks them (no run-time cost).
import { compile, type CompiledNetlist } from '../compile/compile.ts';
import { evaluateExpression, type ExpectedValue } from '../expect/evaluate.ts';
import { expressionNames } from '../expect/names.ts';
import { ExpressionError, parseExpectation, type Expr } from '../expect/parse.ts';
import type { CellDesign, InputValue, InputVector } from '../model/design.ts';
import { recordOf } from '../model/records.ts';
import type { Netlist } from '../model/netlist.ts';
import { DEFAULT_TECHNOLOGY, type Technology } from '../model/technology.ts';
import { levelName } from '../solver/levels.ts';
import { Simulator, type SolveResult } from '../solver/simulator.ts';
import type { CheckReport, Finding, FindingKind, Summary, VectorReport } from './report.ts';
import { structuralFindings } from './rules.ts';
import { vectorFindings } from './vectorFindings.ts';
import { sequencePass, sweepPass, type PassProgress, type SolveObserver } from './pass.ts';
import { checkSweepLimit, sweepSize } from './vectors.ts';

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
   * Rows go here as they are found and are not kept, so a 65,536-vector sweep never holds its rows:
   * the report then has no rows and only the structural findings, while its summary still counts
   * every finding.
   */
  readonly onRow?: (row: VectorReport, index: number) => void;
}

export const FINDING_KINDS: readonly FindingKind[] = [
  'short',
  'static-current',
  'floating',
  'contention',
  'degraded',
  'charge-sharing',
  'no-steady-state',
  'mismatch',
  'unknown',
  'rule',
  'limit',
];

export { expressionNames };

/** `A=1 B=0` */
export function vectorLabel(v: InputVector, inputs: readonly string[]): string {
  return inputs.length === 0 ? '(no inputs)' : inputs.map((n) => `${n}=${v[n] ?? 'Z'}`).join(' ');
}

class Checker implements SolveObserver {
  readonly compiled: CompiledNetlist;
  readonly simulator: Simulator;
  readonly rows: VectorReport[] = [];
  private readonly expectations: [number, Expr][];
  /** Some expected function names an output (its held value). */
  private readonly refersToHeld: boolean;
  /** The last row made: the held values of the next step in a sequence (rows may be streamed). */
  private previous: VectorReport | undefined;

  constructor(
    readonly netlist: Netlist,
    readonly options: CheckOptions,
    /** A sweep's vectors each start from an unknown state; a sequence's steps follow each other. */
    readonly mode: 'vectors' | 'steps',
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

  /** Rows handed to `onRow` rather than kept, and their findings counted by kind. */
  private readonly streamed = { rows: 0, counts: summarize(0, []) as Record<string, number> };

  add(r: SolveResult, index: number): void {
    // In a sequence an output's held value is its level at the previous step; a sweep has none.
    const held = this.mode === 'steps' && index > 0 ? this.previous : undefined;
    const row = this.vectorReport(r, index, held);
    this.previous = row;
    if (this.options.onRow === undefined) return void this.rows.push(row);
    this.streamed.rows++;
    countFindings(this.streamed.counts, row.findings);
    this.options.onRow(row, index);
  }

  /** Every reader of this pass: the checker's own rows first. */
  observers(): SolveObserver[] {
    return [this, ...(this.options.observers ?? [])];
  }

  /**
   * One vector's report. `held` is the previous step's report in a sequence; without it (a sweep, or a
   * sequence's first step) the outputs' held values are unknown.
   */
  vectorReport(r: SolveResult, index: number, held?: VectorReport): VectorReport {
    const { netlist } = this;
    const c = this.compiled;
    const values = this.refersToHeld
      ? recordOf([...Object.entries(heldValues(netlist.outputs, held)), ...Object.entries(r.inputs)])
      : r.inputs;
    const expected = new Map<number, ExpectedValue>(
      this.expectations.map(([n, e]) => [n, evaluateExpression(e, values)]),
    );
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
      currentPaths: r.paths.map((p) => ({
        chain: p.nets.flatMap((n, i) =>
          i < p.elements.length
            ? [c.netNames[n]!, netlist.devices[c.chDevice[p.elements[i]!]!]!.name]
            : [c.netNames[n]!],
        ),
        current: p.current,
      })),
      findings: vectorFindings(r, index, () => vectorLabel(r.inputs, netlist.inputs), expected),
    };
  }

  /** The vector as given when it names every input (sweeps do), else completed with Z. */
  private allInputs(v: InputVector): InputVector {
    return this.netlist.inputs.every((n) => n in v)
      ? v
      : Object.fromEntries(this.netlist.inputs.map((n) => [n, v[n] ?? 'Z']));
  }

  report(kind: 'vectors' | 'steps', rows: VectorReport[], notes: string[]): CheckReport {
    const findings = [...structuralFindings(this.compiled), ...rows.flatMap((v) => v.findings)];
    const summary = countFindings({ ...this.streamed.counts }, findings);
    return {
      cell: this.netlist.name,
      inputs: this.netlist.inputs,
      outputs: this.netlist.outputs,
      [kind]: rows,
      findings,
      summary: { ...summary, vectors: rows.length + this.streamed.rows },
      notes,
    };
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
  return new Checker(netlist, options, 'vectors').report('vectors', [], [note]);
}

/**
 * Checks single vectors, each from an unknown state exactly as `checkSweep` checks each of its
 * vectors: the replay of a proof's counterexamples (docs/semantics.md §10).
 */
export class VectorChecker {
  private readonly checker: Checker;

  constructor(netlist: Netlist, options: CheckOptions = {}) {
    this.checker = new Checker(netlist, options, 'vectors');
  }

  /** The vector's report; `index` is the vector's place in the sweep's order, named by its findings. */
  check(vector: InputVector, index: number): VectorReport {
    return this.checker.vectorReport(this.checker.simulator.solveFresh(vector), index);
  }
}

/** Checks every input combination, each solved from an unknown state (docs/semantics.md §2.9, sweep mode). */
export function checkSweep(netlist: Netlist, options: CheckOptions = {}): CheckReport {
  const checker = new Checker(netlist, options, 'vectors');
  checkSweepLimit(netlist.inputs, options.maxInputs);
  const total = sweepSize(netlist.inputs, options.undrivenInputs);
  const done = sweepPass(checker.simulator, checker.observers(), options);
  const notes = done < total ? [`stopped after ${done} of ${total} vectors`] : [];
  return checker.report('vectors', checker.rows, notes);
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
  const checker = new Checker(netlist, options, 'steps');
  sequencePass(checker.simulator, steps, checker.observers(), options.onProgress);
  return checker.report('steps', checker.rows, []);
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
