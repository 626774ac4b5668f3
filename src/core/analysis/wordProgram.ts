// Slots and operands are in range by construction, so `!` marks them (no run-time cost).
/**
 * The bit-parallel sweep's word program (docs/semantics.md §2.10): a list of word operations over
 * slots, each slot a run of words of 32 vectors (bit j of word w: vector 32w + j). The program is
 * data, built once per compile from the component tables' leaves, and run over a block of words
 * per operation (wordRun.ts), so its cost per vector is a few machine operations. No code is
 * generated.
 *
 * A Boolean function of a group's controls is built as a reduced decision diagram from its table's
 * 2^k leaves (Shannon expansion, highest control first, equal halves merged, identical nodes
 * shared across the whole program, so a later group reuses what an earlier one computed), and each
 * node becomes one operation, simplified where a side is constant. Every operation writes a fresh
 * virtual slot while the program is built; `compiled` then drops operations nothing reads and
 * gives the virtual slots physical ones, reusing a slot once its last reader has run.
 */

import { OP_AND, OP_AND_NOT, OP_MUX, OP_NOT, OP_OR, OP_OR_INTO, OP_XOR, STRIDE } from './wordRun.ts';

/**
 * A function's word is named by a reference: a slot s (s >= 0), or its complement ~s (negative), so
 * an inverter costs no operation. Slot 0 holds zeros, slot 1 ones.
 */
export const ZERO = 0;
export const ONES = 1;

/**
 * Virtual slots (one per operation) a plan may start a function with; past it the sweep takes the
 * engine (vectorsWordPlan.ts). One function adds at most two operations per entry of its table
 * (2^12 entries at most, MAX_TABLE_CONTROLS), so references stay below KEY_RANGE and a pair of
 * them is one exact map key.
 */
export const MAX_WORD_SLOTS = 1 << 24;
const KEY_RANGE = 2 * MAX_WORD_SLOTS;

/** The reference to the complement of `ref`; constants stay slots 0 and 1. */
export function complement(ref: number): number {
  return ref === ZERO ? ONES : ref === ONES ? ZERO : ~ref;
}

/** A program ready to run: its operations over physical slots, and where each reference lives. */
export interface CompiledWordProgram {
  readonly ops: Int32Array;
  readonly slotCount: number;
  /** The physical reference of a reference given to `compiled` as read after the run (or a kept slot). */
  physical(ref: number): number;
}

export class WordProgram {
  private readonly ops: number[] = [];
  private slots = 2;
  /** Slots made by `slot()` (and the constants): written before the run or accumulated, never reused. */
  private readonly kept: number[] = [ZERO, ONES];
  /** Nodes by control, then by (low, high): identical nodes computed once in the whole program. */
  private readonly nodes = new Map<number, Map<number, number>>();

  /** Past MAX_WORD_SLOTS: a plan builds no further function. */
  get full(): boolean {
    return this.slots >= MAX_WORD_SLOTS;
  }

  /** A slot kept for the whole program (an input, an accumulator). */
  slot(): number {
    this.kept.push(this.slots);
    return this.slots++;
  }

  /**
   * The function whose value at entry e is `leaves[e]` (0 or -1), entry bit i being control i, whose
   * word `controls[i]` refers to: a reference to a constant, a control, or an earlier function.
   */
  fromLeaves(leaves: Int32Array, controls: Int32Array): number {
    return this.build(leaves, 0, controls.length, controls);
  }

  private build(leaves: Int32Array, offset: number, vars: number, controls: Int32Array): number {
    if (vars === 0) return leaves[offset] === 0 ? ZERO : ONES;
    const half = 1 << (vars - 1);
    const low = this.build(leaves, offset, vars - 1, controls);
    const high = this.build(leaves, offset + half, vars - 1, controls);
    return this.mux(controls[vars - 1]!, low, high);
  }

  /** c ? high : low, with complements and constant sides folded and identical nodes shared. */
  mux(c: number, low: number, high: number): number {
    if (c < 0) return this.mux(~c, high, low);
    if (c === ZERO || c === ONES) return c === ONES ? high : low;
    if (low === high) return low;
    let byControl = this.nodes.get(c);
    if (byControl === undefined) this.nodes.set(c, (byControl = new Map()));
    const key = (low + KEY_RANGE) * 2 * KEY_RANGE + (high + KEY_RANGE);
    let ref = byControl.get(key);
    if (ref === undefined) {
      ref = this.muxOf(c, low, high);
      byControl.set(key, ref);
    }
    return ref;
  }

  private muxOf(c: number, low: number, high: number): number {
    if (low === ZERO && high === ONES) return c;
    if (low === ONES && high === ZERO) return ~c;
    if (low === complement(high)) return this.xor(c, low);
    if (low === ZERO) return this.and(c, high);
    if (high === ZERO) return this.and(complement(c), low);
    if (low === ONES) return this.or(complement(c), high);
    if (high === ONES) return this.or(c, low);
    if (low < 0 && high < 0) return ~this.emit(OP_MUX, ~low, ~high, c);
    return this.emit(OP_MUX, this.positive(low), this.positive(high), c);
  }

  not(a: number): number {
    return complement(a);
  }

  and(a: number, b: number): number {
    if (a === ZERO || b === ZERO) return ZERO;
    if (a === ONES) return b;
    if (b === ONES) return a;
    if (a >= 0 && b >= 0) return this.emit(OP_AND, a, b, ZERO);
    if (a < 0 && b < 0) return ~this.emit(OP_OR, ~a, ~b, ZERO);
    return a >= 0 ? this.emit(OP_AND_NOT, a, ~b, ZERO) : this.emit(OP_AND_NOT, b, ~a, ZERO);
  }

  or(a: number, b: number): number {
    return complement(this.and(complement(a), complement(b)));
  }

  xor(a: number, b: number): number {
    if (a === ZERO) return b;
    if (b === ZERO) return a;
    if (a === ONES) return complement(b);
    if (b === ONES) return complement(a);
    const word = this.emit(OP_XOR, a < 0 ? ~a : a, b < 0 ? ~b : b, ZERO);
    return a < 0 !== b < 0 ? ~word : word;
  }

  /** Adds `a` into the kept slot `into` (an accumulator); nothing for a constant zero. */
  orInto(into: number, a: number): void {
    if (a !== ZERO) this.ops.push(OP_OR_INTO, into, this.positive(a), ZERO, ZERO);
  }

  /** The slot holding the reference's word: a complement is computed into a new slot. */
  private positive(ref: number): number {
    return ref >= 0 ? ref : this.emit(OP_NOT, ~ref, ZERO, ZERO);
  }

  private emit(code: number, a: number, b: number, c: number): number {
    if (this.slots >= KEY_RANGE) throw new RangeError(`a word program holds at most ${KEY_RANGE} slots`);
    const d = this.slots++;
    this.ops.push(code, d, a, b, c);
    return d;
  }

  /**
   * The program ready to run, for the references in `read` (read after the run) and the kept slots:
   * operations that neither reaches are dropped, and a slot is reused once its last reader has run
   * (an operation may write the slot of an operand it reads last: every operation works word by
   * word, reading word w before writing word w).
   */
  compiled(read: ArrayLike<number> = []): CompiledWordProgram {
    const pinned = new Uint8Array(this.slots);
    for (const s of this.kept) pinned[s] = 1;
    for (let i = 0; i < read.length; i++) pinned[slotOf(read[i]!)] = 1;
    const place = new Int32Array(this.slots).fill(-1);
    const { ops, slotCount } = allocate(this.ops, pinned, place);
    return { ops, slotCount, physical: (ref) => (ref < 0 ? ~place[~ref]! : place[ref]!) };
  }
}

const slotOf = (ref: number): number => (ref < 0 ? ~ref : ref);

/**
 * The operations that reach a pinned slot, over physical slots: pinned slots first, in order, then
 * each result in a slot freed by an earlier operation's last read, or a new one. `place` receives
 * each virtual slot's physical slot (-1 once freed, and for dropped results).
 */
function allocate(
  ops: readonly number[],
  pinned: Uint8Array,
  place: Int32Array,
): { ops: Int32Array; slotCount: number } {
  const count = ops.length / STRIDE;
  const used = neededOps(ops, count, pinned);
  const lastRead = new Int32Array(pinned.length).fill(-1);
  for (let i = 0; i < count; i++)
    if (used[i] === 1) for (let k = 2; k < STRIDE; k++) lastRead[ops[i * STRIDE + k]!] = i;
  let next = 0;
  for (let s = 0; s < pinned.length; s++) if (pinned[s] === 1) place[s] = next++;
  const free: number[] = [];
  const out: number[] = [];
  for (let i = 0; i < count; i++) {
    if (used[i] === 0) continue;
    const at = i * STRIDE;
    out.push(ops[at]!, 0, place[ops[at + 2]!]!, place[ops[at + 3]!]!, place[ops[at + 4]!]!);
    for (let k = 2; k < STRIDE; k++) {
      const s = ops[at + k]!;
      if (pinned[s] === 1 || lastRead[s] !== i || place[s]! < 0) continue;
      free.push(place[s]!);
      place[s] = -1;
    }
    const d = ops[at + 1]!;
    if (place[d] === -1) place[d] = free.pop() ?? next++;
    out[out.length - 4] = place[d]!;
  }
  return { ops: Int32Array.from(out), slotCount: next };
}

/** Per operation, 1 when its result reaches a pinned slot (walked backwards from the end). */
function neededOps(ops: readonly number[], count: number, pinned: Uint8Array): Uint8Array {
  const live = pinned.slice();
  const used = new Uint8Array(count);
  for (let i = count - 1; i >= 0; i--) {
    const at = i * STRIDE;
    if (live[ops[at + 1]!] === 0) continue;
    used[i] = 1;
    for (let k = 2; k < STRIDE; k++) live[ops[at + k]!] = 1;
  }
  return used;
}
