import { compile, type CompiledNetlist } from '../compile/compile.ts';
import { evaluateExpression, type ExpectedValue } from '../expect/evaluate.ts';
import { ExpressionError, parseExpression, type Expr } from '../expect/parse.ts';
import type { CellDesign, InputVector } from '../model/design.ts';
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
  'rule',
  'limit',
];

/** `A=1 B=0` */
export function vectorLabel(v: InputVector, inputs: readonly string[]): string {
  return inputs.length === 0 ? '(no inputs)' : inputs.map((n) => `${n}=${v[n] ?? 'Z'}`).join(' ');
}

class Checker implements SolveObserver {
  readonly compiled: CompiledNetlist;
  readonly simulator: Simulator;
  readonly rows: VectorReport[] = [];
  private readonly expectations: [number, Expr][];

  constructor(
    readonly netlist: Netlist,
    readonly options: CheckOptions,
  ) {
    this.simulator =
      options.simulator ?? new Simulator(compile(netlist, options.technology ?? DEFAULT_TECHNOLOGY));
    this.compiled = this.simulator.compiled;
    this.expectations = Object.entries(options.expectations ?? {}).map(([output, text]) => {
      const n = this.compiled.netIndex.get(output);
      if (n === undefined || !netlist.outputs.includes(output)) {
        throw new ExpressionError(`'${output}' is not an output`, `${output} = ${text}`, 0);
      }
      return [n, parseExpression(text, netlist.inputs)];
    });
  }

  add(r: SolveResult, index: number): void {
    this.rows.push(this.vectorReport(r, index));
  }

  /** Every reader of this pass: the checker's own rows first. */
  observers(): SolveObserver[] {
    return [this, ...(this.options.observers ?? [])];
  }

  vectorReport(r: SolveResult, index: number): VectorReport {
    const { netlist } = this;
    const c = this.compiled;
    const expected = new Map<number, ExpectedValue>(
      this.expectations.map(([n, e]) => [n, evaluateExpression(e, r.inputs)]),
    );
    const voltageNets = this.options.allNets ? c.netNames : netlist.outputs;
    const volts = (name: string): number | null => {
      const v = r.volts[c.netIndex.get(name) as number];
      return Number.isNaN(v) ? null : v;
    };
    return {
      inputs: this.allInputs(r.inputs),
      outputs: Object.fromEntries(
        netlist.outputs.map((n) => [n, levelName(r.levels[c.netIndex.get(n) as number])]),
      ),
      voltages: Object.fromEntries(voltageNets.map((n) => [n, volts(n)])),
      supplyCurrent: r.supplyCurrent,
      staticPower: r.staticPower,
      currentPaths: r.paths.map((p) => ({
        chain: p.nets.flatMap((n, i) =>
          i < p.elements.length
            ? [c.netNames[n], netlist.devices[c.chDevice[p.elements[i]]].name]
            : [c.netNames[n]],
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
    return {
      cell: this.netlist.name,
      inputs: this.netlist.inputs,
      outputs: this.netlist.outputs,
      [kind]: rows,
      findings,
      summary: summarize(rows.length, findings),
      notes,
    };
  }
}

export function summarize(vectors: number, findings: readonly Finding[]): Summary {
  const counts: Record<string, number> = { vectors, errors: 0, warnings: 0 };
  for (const k of FINDING_KINDS) counts[k] = 0;
  for (const f of findings) {
    counts[f.severity === 'error' ? 'errors' : 'warnings']++;
    counts[f.kind]++;
  }
  return counts as Summary;
}

/** Checks every input combination, each solved from an unknown state (docs/semantics.md §2.9, sweep mode). */
export function checkSweep(netlist: Netlist, options: CheckOptions = {}): CheckReport {
  const checker = new Checker(netlist, options);
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
  const checker = new Checker(netlist, options);
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
