/**
 * The bit-parallel sweep (docs/semantics.md §2.10): 32 vectors a word, every group evaluated from its
 * component table in topological order; a vector that reaches anything the tables do not call clean
 * (X, a level off the rails, a flagged or floating observed net, a static current) or whose output
 * differs from its expected function is solved by the scalar engine instead, so every row is what
 * the scalar engine writes. Clean vectors have no findings, no current and plain voltages.
 */
import type { Simulator, SolveResult } from '../solver/simulator.ts';
import { ComponentTables } from '../tables/componentTables.ts';
import type { PassProgress } from './pass.ts';
import { sweepVector } from './vectors.ts';
import { wordExpectations, type WordExpectations } from './vectorsWordExpect.ts';
import { WordEvaluator, wordPlan, wordPlanRefusal, type WordPlan } from './vectorsWordPlan.ts';

/** Where the pass writes its rows, in order. */
export interface WordRows {
  /** Called first for each word: two level words per reported net (code bits 0 and 1), fast lanes. */
  addWord(levels: Int32Array, fast: number): void;
  /** A row the tables decided: no findings, no current, levels as given to addWord. */
  addPlain(index: number): void;
  /** A row the scalar engine solved. */
  add(result: SolveResult, index: number): void;
}

/** Bit j of PATTERNS[p] is bit p of j: an input that changes within a word of 32 vectors. */
const PATTERNS = [0xaaaaaaaa, 0xcccccccc, 0xf0f0f0f0, 0xff00ff00, 0xffff0000].map((x) => x | 0);

export class WordSweep {
  private readonly high: Int32Array;
  private readonly floating: Int32Array;
  private readonly levels: Int32Array;
  private readonly controls = new Int32Array(32);
  private readonly evaluator = new WordEvaluator();

  private constructor(
    private readonly simulator: Simulator,
    private readonly plan: WordPlan,
    private readonly reported: Int32Array,
    private readonly expect: WordExpectations | null,
  ) {
    const { netCount } = simulator.compiled;
    this.high = new Int32Array(netCount);
    this.floating = new Int32Array(netCount);
    this.levels = new Int32Array(2 * reported.length);
    for (const n of plan.highRails) this.high[n] = -1;
  }

  /**
   * The bit-parallel sweep of a two-valued sweep reporting `reported` nets, or null when the cell
   * does not suit it (the reason is in wordPlanRefusal) and the scalar pass must run.
   */
  static plan(
    simulator: Simulator,
    reported: Int32Array,
    expectations: Readonly<Record<string, string>>,
  ): WordSweep | null {
    const c = simulator.compiled;
    const vectors = 2 ** c.netlist.inputs.length;
    if (vectors < 1024) return null;
    const expect = Object.keys(expectations).length === 0 ? null : wordExpectations(c, expectations);
    if (expect === null && Object.keys(expectations).length > 0) return null;
    const tables = new ComponentTables(c);
    if (wordPlanRefusal(c, tables, vectors) !== null) return null;
    const plan = wordPlan(c, tables, reported);
    return plan === null ? null : new WordSweep(simulator, plan, reported, expect);
  }

  /** Every vector in truth-table order; returns how many were done. */
  run(rows: WordRows, onProgress?: PassProgress): number {
    const inputs = this.simulator.compiled.netlist.inputs;
    const total = 2 ** inputs.length;
    for (let first = 0; first < total; first += 32) {
      const lanes = Math.min(32, total - first);
      const fast = ~this.evaluate(first) & ((2 ** lanes - 1) | 0);
      rows.addWord(this.levelWords(), fast);
      for (let lane = 0; lane < lanes; lane++) {
        const k = first + lane;
        if ((fast >>> lane) & 1) rows.addPlain(k);
        else rows.add(this.simulator.solveFresh(sweepVector(inputs, k), { recycle: true }), k);
      }
      if (onProgress?.(first + lanes, total) === false) return first + lanes;
    }
    return total;
  }

  /** Loads the word of vectors from `first` and evaluates every group; returns the lanes to solve. */
  private evaluate(first: number): number {
    const { high, floating, controls, evaluator } = this;
    const c = this.simulator.compiled;
    const n = c.inputNets.length;
    for (let i = 0; i < n; i++) {
      const p = n - 1 - i;
      high[c.inputNets[i] as number] = p < 5 ? (PATTERNS[p] as number) : (first >> p) & 1 ? -1 : 0;
    }
    let fallback = 0;
    for (const step of this.plan.steps) {
      const k = step.controls.length;
      for (let i = 0; i < k; i++) controls[i] = high[step.controls[i] as number] as number;
      evaluator.begin(controls, k);
      fallback |= evaluator.value(step.fallback);
      for (let i = 0; i < step.nets.length; i++) {
        const net = step.nets[i] as number;
        high[net] = evaluator.value(step.high[i]!);
        const f = step.floating[i];
        floating[net] = f === null || f === undefined ? 0 : evaluator.value(f);
      }
    }
    return this.expect === null ? fallback : fallback | this.expect.mismatch(high);
  }

  /** Level codes as two bits: 0 → 00, 1 → 01, Z → 11 (X never reaches a fast lane). */
  private levelWords(): Int32Array {
    const { levels, reported, high, floating } = this;
    for (let j = 0; j < reported.length; j++) {
      const n = reported[j] as number;
      const z = floating[n] as number;
      levels[2 * j] = (high[n] as number) | z;
      levels[2 * j + 1] = z;
    }
    return levels;
  }
}
