// Hot loop: slots and operands are in range by construction, so `!` marks them (no run-time cost).
/**
 * Runs a compiled word program (wordProgram.ts, docs/semantics.md §2.10) over `words` words of 32
 * vectors per slot: slot s is `mem[s * words …]`. Slots 0 and 1 must hold zeros and ones, and the
 * inputs' slots their words. Every operation is bitwise, so it does not matter which vector sits in
 * which bit: with an even count, each pair of 32-bit words is run as one 64-bit word of the same
 * memory (`BigUint64Array` over its buffer), which took about half the time per vector on the
 * 16-input bank in Node 20 and in Chromium (bench/laneWidths.ts). Loading the inputs and reading
 * the levels stay on 32-bit words. Complements are XORs with all ones: `~` on a BigInt was not made
 * a machine operation in Node 20 and cost a BigInt allocation a word.
 */
/** Operation codes: the program's instruction set (wordProgram.ts builds it). */
export const OP_NOT = 0;
export const OP_AND = 1;
/** a & ~b */
export const OP_AND_NOT = 2;
export const OP_OR = 3;
/** a | ~b */
export const OP_OR_NOT = 4;
export const OP_XOR = 5;
/** c ? b : a */
export const OP_MUX = 6;
/** d |= a */
export const OP_OR_INTO = 7;

/** Numbers per operation: code, destination, three operands (unused ones name slot 0). */
export const STRIDE = 5;

/** All 64 bits set. */
const ALL_ONES = 0xffff_ffff_ffff_ffffn;

/**
 * A program's memory: `words` 32-bit words per slot for loading inputs and reading levels
 * (`narrow`), the same buffer as 64-bit words for running (`wide`, when `words` is even). Made once
 * per sweep: a view made per run cost about a fifth of the run on the 16-input bank.
 */
export class WordMemory {
  readonly narrow: Int32Array;
  private readonly wide: BigUint64Array | null;

  constructor(
    slots: number,
    readonly words: number,
  ) {
    this.narrow = new Int32Array(slots * words);
    this.wide = words % 2 === 0 ? new BigUint64Array(this.narrow.buffer) : null;
  }

  run(ops: Int32Array): void {
    if (this.wide === null) runWords32(ops, this.narrow, this.words);
    else runWords64(ops, this.wide, this.words / 2);
  }
}

/** One run over `mem` (tests, benches); a sweep keeps a WordMemory instead. */
export function runWordProgram(ops: Int32Array, mem: Int32Array, words: number): void {
  if (words % 2 === 0 && mem.byteOffset % 8 === 0) {
    runWords64(ops, new BigUint64Array(mem.buffer, mem.byteOffset, mem.length / 2), words / 2);
  } else runWords32(ops, mem, words);
}

/** The program over 64-bit words (`words` of them per slot), one loop per operation. */
export function runWords64(ops: Int32Array, mem: BigUint64Array, words: number): void {
  for (let p = 0; p < ops.length; p += STRIDE) {
    const code = ops[p]!;
    const d = ops[p + 1]! * words;
    const a = ops[p + 2]! * words;
    const b = ops[p + 3]! * words;
    if (code === OP_AND) for (let w = 0; w < words; w++) mem[d + w] = mem[a + w]! & mem[b + w]!;
    else if (code === OP_OR) for (let w = 0; w < words; w++) mem[d + w] = mem[a + w]! | mem[b + w]!;
    else if (code === OP_MUX) {
      // c ? b : a as a ^ ((a ^ b) & c)
      const c = ops[p + 4]! * words;
      for (let w = 0; w < words; w++) mem[d + w] = mem[a + w]! ^ ((mem[a + w]! ^ mem[b + w]!) & mem[c + w]!);
    } else rare64(code, mem, d, a, b, words);
  }
}

function rare64(code: number, mem: BigUint64Array, d: number, a: number, b: number, words: number): void {
  switch (code) {
    case OP_NOT:
      for (let w = 0; w < words; w++) mem[d + w] = mem[a + w]! ^ ALL_ONES;
      break;
    case OP_AND_NOT:
      for (let w = 0; w < words; w++) mem[d + w] = mem[a + w]! & (mem[b + w]! ^ ALL_ONES);
      break;
    case OP_OR_NOT:
      for (let w = 0; w < words; w++) mem[d + w] = mem[a + w]! | (mem[b + w]! ^ ALL_ONES);
      break;
    case OP_XOR:
      for (let w = 0; w < words; w++) mem[d + w] = mem[a + w]! ^ mem[b + w]!;
      break;
    case OP_OR_INTO:
      for (let w = 0; w < words; w++) mem[d + w] = mem[d + w]! | mem[a + w]!;
      break;
  }
}

/** The program over 32-bit words, one loop per operation: odd counts, and the width comparison. */
export function runWords32(ops: Int32Array, mem: Int32Array, words: number): void {
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
        for (let w = 0; w < words; w++)
          mem[d + w] = mem[a + w]! ^ ((mem[a + w]! ^ mem[b + w]!) & mem[c + w]!);
        break;
      case OP_OR_INTO:
        for (let w = 0; w < words; w++) mem[d + w]! |= mem[a + w]!;
        break;
    }
  }
}
