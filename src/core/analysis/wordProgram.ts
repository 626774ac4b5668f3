// Hot loop: slots and operands are in range by construction, so `!` marks them (no run-time cost).
/**
 * The bit-parallel sweep's word program (docs/semantics.md §2.10): a list of word operations over
 * slots, each slot a run of words of 32 vectors (bit j of word w: vector 32w + j). The program is
 * data, built once per compile from the component tables' leaves, and run over a block of words
 * per operation, so its cost per vector is a few machine operations. No code is generated.
 *
 * A Boolean function of a group's controls is built as a reduced decision diagram from its table's
 * 2^k leaves (Shannon expansion, highest control first, equal halves merged, identical nodes
 * shared), and each node becomes one operation, simplified where a side is constant.
 */

/**
 * A function's word is named by a reference: a slot s (s >= 0), or its complement ~s (negative), so
 * an inverter costs no operation. Slot 0 holds zeros, slot 1 ones.
 */
export const ZERO = 0;
export const ONES = 1;

const OP_NOT = 0;
const OP_AND = 1;
/** a & ~b */
const OP_AND_NOT = 2;
const OP_OR = 3;
/** a | ~b */
const OP_OR_NOT = 4;
const OP_XOR = 5;
/** c ? b : a */
const OP_MUX = 6;
/** d |= a */
const OP_OR_INTO = 7;

/** Numbers per operation: code, destination, three operands. */
const STRIDE = 5;

/** The reference to the complement of `ref`; constants stay slots 0 and 1. */
export function complement(ref: number): number {
  return ref === ZERO ? ONES : ref === ONES ? ZERO : ~ref;
}

export class WordProgram {
  private readonly ops: number[] = [];
  /** Slots allocated so far, and the temporaries free for reuse. */
  private slots = 2;
  private readonly free: number[] = [];
  /** Nodes of the group being built, by (control, low, high): identical nodes computed once. */
  private readonly nodes = new Map<string, number>();
  private readonly temps: number[] = [];

  get slotCount(): number {
    return this.slots;
  }

  /** A slot kept for the whole program (a net, the inputs, an accumulator). */
  slot(): number {
    return this.slots++;
  }

  /** Starts a group: its temporaries are freed when it ends, its identical nodes shared within it. */
  beginGroup(): void {
    this.nodes.clear();
  }

  /** Ends a group: temporaries not kept by `keep` become free for the next group. */
  endGroup(): void {
    this.free.push(...this.temps);
    this.temps.length = 0;
  }

  /** Keeps the slot of a reference past its group (a net's word lives in it from now on). */
  keep(ref: number): void {
    const i = this.temps.indexOf(ref < 0 ? ~ref : ref);
    if (i >= 0) this.temps.splice(i, 1);
  }

  /**
   * The function whose value at entry e is `leaves[e]` (0 or -1), entry bit i being control i, whose
   * word `controls[i]` refers to: a reference to a constant, a control, or a temporary.
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
    const key = `${c},${low},${high}`;
    let ref = this.nodes.get(key);
    if (ref === undefined) {
      ref = this.muxOf(c, low, high);
      this.nodes.set(key, ref);
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

  /** The slot holding the reference's word: a complement is computed into a temporary. */
  private positive(ref: number): number {
    return ref >= 0 ? ref : this.emit(OP_NOT, ~ref, ZERO, ZERO);
  }

  private emit(code: number, a: number, b: number, c: number): number {
    const d = this.free.pop() ?? this.slots++;
    this.temps.push(d);
    this.ops.push(code, d, a, b, c);
    return d;
  }

  /** The operations, ready to run. */
  compiled(): Int32Array {
    return Int32Array.from(this.ops);
  }
}

/**
 * Runs the operations over `words` words per slot: slot s is `mem[s * words …]`. Slots 0 and 1 must
 * hold zeros and ones, and the inputs' slots their words.
 */
export function runWordProgram(ops: Int32Array, mem: Int32Array, words: number): void {
  for (let p = 0; p < ops.length; p += STRIDE) {
    const d = ops[p + 1]! * words;
    const a = ops[p + 2]! * words;
    const b = ops[p + 3]! * words;
    const c = ops[p + 4]! * words;
    switch (ops[p]) {
      case OP_NOT:
        for (let w = 0; w < words; w++) mem[d + w] = ~mem[a + w]!;
        break;
      case OP_AND:
        for (let w = 0; w < words; w++) mem[d + w] = mem[a + w]! & mem[b + w]!;
        break;
      case OP_AND_NOT:
        for (let w = 0; w < words; w++) mem[d + w] = mem[a + w]! & ~mem[b + w]!;
        break;
      case OP_OR:
        for (let w = 0; w < words; w++) mem[d + w] = mem[a + w]! | mem[b + w]!;
        break;
      case OP_OR_NOT:
        for (let w = 0; w < words; w++) mem[d + w] = mem[a + w]! | ~mem[b + w]!;
        break;
      case OP_XOR:
        for (let w = 0; w < words; w++) mem[d + w] = mem[a + w]! ^ mem[b + w]!;
        break;
      case OP_MUX:
        for (let w = 0; w < words; w++) {
          const s = mem[c + w]!;
          mem[d + w] = (mem[a + w]! & ~s) | (mem[b + w]! & s);
        }
        break;
      case OP_OR_INTO:
        for (let w = 0; w < words; w++) mem[d + w]! |= mem[a + w]!;
        break;
    }
  }
}
