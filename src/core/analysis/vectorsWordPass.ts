// Slots and words are in range by construction, so `!` marks them (no run-time cost).
/**
 * The bit-parallel sweep (docs/semantics.md §2.10): 32 vectors a word, every group evaluated from its
 * component table in topological order, as one word program run over 4,096 vectors at a time; a vector that reaches anything the tables do not call clean
 * (X, a level off the rails, a flagged or floating observed net, a static current) or whose output
 * differs from its expected function is solved by the scalar engine instead, so every row is what
 * the scalar engine writes. Clean vectors have no findings, no current and plain voltages.
 */
import type { Simulator, SolveResult } from '../solver/simulator.ts';
import { ComponentTables } from '../tables/componentTables.ts';
import type { PassProgress } from './pass.ts';
import { SWEEP_BLOCK, sweepVector } from './vectors.ts';
import { wordExpectations } from './vectorsWordExpect.ts';
import { wordPlan, wordPlanRefusal, type WordPlan } from './vectorsWordPlan.ts';
import { ONES, ZERO } from './wordProgram.ts';
import { WordMemory } from './wordRun.ts';

/** Where the pass writes its rows, in order. */
export interface WordRows {
  /**
   * Called first for each block of `count` words: per reported net two runs of level words (code
   * bits 0 and 1, `levels[(2j + bit) * count + w]`), and per word its fast lanes.
   */
  addWords(levels: Int32Array, count: number, fast: Int32Array): void;
  /** The next `count` rows, which the tables decided: no findings, no current, levels as given to addWord. */
  addPlains(count: number): void;
  /** A row the scalar engine solved. */
  add(result: SolveResult, index: number): void;
}

/** Bit j of PATTERNS[p] is bit p of j: an input that changes within a word of 32 vectors. */
const PATTERNS = [0xaaaaaaaa, 0xcccccccc, 0xf0f0f0f0, 0xff00ff00, 0xffff0000].map((x) => x | 0);

/** Words of 32 vectors per run of the program: one block of a streamed sweep. */
const BLOCK_WORDS = SWEEP_BLOCK / 32;

export class WordSweep {
  private readonly ops: Int32Array;
  private readonly words: number;
  private readonly memory: WordMemory;
  private readonly mem: Int32Array;
  private readonly levels: Int32Array;
  private readonly fast: Int32Array;
  /** Physical slots of the inputs (in `inputNets` order) and of the fallback accumulator. */
  private readonly inputSlots: Int32Array;
  private readonly fallback: number;
  /** Per reported net: the slots of its words and -1 where a word is the slot's complement. */
  private readonly highSlot: Int32Array;
  private readonly highFlip: Int32Array;
  private readonly floatingSlot: Int32Array;
  private readonly floatingFlip: Int32Array;

  private constructor(
    private readonly simulator: Simulator,
    plan: WordPlan,
    total: number,
  ) {
    const program = plan.program.compiled([...plan.high, ...plan.floating]);
    this.ops = program.ops;
    this.words = Math.min(BLOCK_WORDS, total / 32);
    this.memory = new WordMemory(program.slotCount, this.words);
    this.mem = this.memory.narrow;
    this.mem.fill(-1, ONES * this.words, (ONES + 1) * this.words);
    this.levels = new Int32Array(2 * plan.high.length * this.words);
    this.fast = new Int32Array(this.words);
    this.inputSlots = plan.inputSlots.map(program.physical);
    this.fallback = program.physical(plan.fallback);
    const high = plan.high.map(program.physical);
    const floating = plan.floating.map(program.physical);
    this.highSlot = high.map(slotOf);
    this.highFlip = high.map(flipOf);
    this.floatingSlot = floating.map(slotOf);
    this.floatingFlip = floating.map(flipOf);
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
    const tables = new ComponentTables(c, { schedule: simulator.drivenSchedule() });
    if (wordPlanRefusal(c, tables, vectors) !== null) return null;
    const plan = wordPlan(c, tables, reported);
    if (plan === null) return null;
    expect?.mismatch(plan.program, plan.netSlots, plan.fallback);
    return new WordSweep(simulator, plan, vectors);
  }

  /** Every vector in truth-table order; returns how many were done. */
  run(rows: WordRows, onProgress?: PassProgress): number {
    const inputs = this.simulator.compiled.netlist.inputs;
    const total = 2 ** inputs.length;
    const { words, mem, fallback } = this;
    const block = 32 * words;
    for (let first = 0; first < total; first += block) {
      this.loadInputs(first);
      mem.fill(0, fallback * words, (fallback + 1) * words);
      this.memory.run(this.ops);
      this.writeLevels(rows);
      for (let w = 0; w < words; w++) this.writeRows(rows, this.fast[w]!, first + 32 * w);
      if (onProgress?.(first + block, total) === false) return first + block;
    }
    return total;
  }

  /** The inputs' words for the block from vector `first`: the low five change within a word. */
  private loadInputs(first: number): void {
    const { words, mem, inputSlots } = this;
    const n = inputSlots.length;
    for (let i = 0; i < n; i++) {
      const p = n - 1 - i;
      const at = inputSlots[i]! * words;
      if (p < 5) mem.fill(PATTERNS[p]!, at, at + words);
      else for (let w = 0; w < words; w++) mem[at + w] = ((first >>> 5) + w) & (1 << (p - 5)) ? -1 : 0;
    }
  }

  /**
   * The block's fast lanes and level words, handed to the rows. A net that never floats (its
   * floating word the constant zero) keeps its all-zero code-bit-1 run from the first block on, and
   * a level word that is not a complement is copied as it is.
   */
  private writeLevels(rows: WordRows): void {
    const { levels, mem, words, fast, highSlot, highFlip, floatingSlot, floatingFlip } = this;
    const fallback = this.fallback * words;
    for (let w = 0; w < words; w++) fast[w] = ~mem[fallback + w]!;
    for (let j = 0; j < highSlot.length; j++) {
      const [high, hf, z, zf] = [
        highSlot[j]! * words,
        highFlip[j]!,
        floatingSlot[j]! * words,
        floatingFlip[j]!,
      ];
      const [bit0, bit1] = [2 * j * words, (2 * j + 1) * words];
      if (z === ZERO && zf === 0 && hf === 0) levels.set(mem.subarray(high, high + words), bit0);
      else if (z === ZERO && zf === 0) for (let w = 0; w < words; w++) levels[bit0 + w] = ~mem[high + w]!;
      else {
        for (let w = 0; w < words; w++) {
          const floats = mem[z + w]! ^ zf;
          levels[bit0 + w] = (mem[high + w]! ^ hf) | floats; // 0 → 00, 1 → 01, Z → 11 (X never fast)
          levels[bit1 + w] = floats;
        }
      }
    }
    rows.addWords(levels, words, fast);
  }

  /** The rows of one word in order: plain runs at once, the other lanes solved by the scalar engine. */
  private writeRows(rows: WordRows, fast: number, first: number): void {
    if (fast === -1) return rows.addPlains(32);
    const inputs = this.simulator.compiled.netlist.inputs;
    let plain = 0;
    for (let lane = 0; lane < 32; lane++) {
      if ((fast >>> lane) & 1) {
        plain++;
        continue;
      }
      if (plain > 0) rows.addPlains(plain);
      plain = 0;
      const k = first + lane;
      rows.add(this.simulator.solveFresh(sweepVector(inputs, k), { recycle: true }), k);
    }
    if (plain > 0) rows.addPlains(plain);
  }
}

const slotOf = (ref: number): number => (ref < 0 ? ~ref : ref);
const flipOf = (ref: number): number => (ref < 0 ? -1 : 0);
