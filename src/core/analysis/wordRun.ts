// Hot loop: slots and operands are in range by construction, so `!` marks them (no run-time cost).
/**
 * Runs a compiled word program (wordProgram.ts, docs/semantics.md §2.10) over `words` words per
 * slot: slot s is `mem[s * words …]`. Slots 0 and 1 must hold zeros and ones, and the inputs' slots
 * their words. Each operation is one loop over the words; the common ones (AND, OR, MUX) do eight
 * or four words a round, which took about a quarter less time than one word a round on the 16-input
 * bank in Node 20. A count that is not a multiple of eight finishes one word a round.
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

export function runWordProgram(ops: Int32Array, mem: Int32Array, words: number): void {
  const rounds = words & ~7;
  for (let p = 0; p < ops.length; p += STRIDE) {
    const code = ops[p]!;
    const d = ops[p + 1]! * words;
    const a = ops[p + 2]! * words;
    const b = ops[p + 3]! * words;
    const c = ops[p + 4]! * words;
    if (code === OP_AND) andRounds(mem, d, a, b, rounds);
    else if (code === OP_OR) orRounds(mem, d, a, b, rounds);
    else if (code === OP_MUX) muxRounds(mem, d, a, b, c, rounds);
    else runOne(code, mem, d, a, b, c, 0, rounds);
    if (rounds < words) runOne(code, mem, d, a, b, c, rounds, words);
  }
}

function andRounds(mem: Int32Array, d: number, a: number, b: number, words: number): void {
  for (let w = 0; w < words; w += 8) {
    mem[d + w] = mem[a + w]! & mem[b + w]!;
    mem[d + w + 1] = mem[a + w + 1]! & mem[b + w + 1]!;
    mem[d + w + 2] = mem[a + w + 2]! & mem[b + w + 2]!;
    mem[d + w + 3] = mem[a + w + 3]! & mem[b + w + 3]!;
    mem[d + w + 4] = mem[a + w + 4]! & mem[b + w + 4]!;
    mem[d + w + 5] = mem[a + w + 5]! & mem[b + w + 5]!;
    mem[d + w + 6] = mem[a + w + 6]! & mem[b + w + 6]!;
    mem[d + w + 7] = mem[a + w + 7]! & mem[b + w + 7]!;
  }
}

function orRounds(mem: Int32Array, d: number, a: number, b: number, words: number): void {
  for (let w = 0; w < words; w += 8) {
    mem[d + w] = mem[a + w]! | mem[b + w]!;
    mem[d + w + 1] = mem[a + w + 1]! | mem[b + w + 1]!;
    mem[d + w + 2] = mem[a + w + 2]! | mem[b + w + 2]!;
    mem[d + w + 3] = mem[a + w + 3]! | mem[b + w + 3]!;
    mem[d + w + 4] = mem[a + w + 4]! | mem[b + w + 4]!;
    mem[d + w + 5] = mem[a + w + 5]! | mem[b + w + 5]!;
    mem[d + w + 6] = mem[a + w + 6]! | mem[b + w + 6]!;
    mem[d + w + 7] = mem[a + w + 7]! | mem[b + w + 7]!;
  }
}

/** c ? b : a as a ^ ((a ^ b) & c): three operations a word instead of four. */
function muxRounds(mem: Int32Array, d: number, a: number, b: number, c: number, words: number): void {
  for (let w = 0; w < words; w += 4) {
    const s0 = mem[c + w]!;
    const s1 = mem[c + w + 1]!;
    const s2 = mem[c + w + 2]!;
    const s3 = mem[c + w + 3]!;
    mem[d + w] = mem[a + w]! ^ ((mem[a + w]! ^ mem[b + w]!) & s0);
    mem[d + w + 1] = mem[a + w + 1]! ^ ((mem[a + w + 1]! ^ mem[b + w + 1]!) & s1);
    mem[d + w + 2] = mem[a + w + 2]! ^ ((mem[a + w + 2]! ^ mem[b + w + 2]!) & s2);
    mem[d + w + 3] = mem[a + w + 3]! ^ ((mem[a + w + 3]! ^ mem[b + w + 3]!) & s3);
  }
}

/** Words `from` to `to` of one operation, one word a round: the rarer operations and the tail. */
function runOne(
  code: number,
  mem: Int32Array,
  d: number,
  a: number,
  b: number,
  c: number,
  from: number,
  to: number,
): void {
  switch (code) {
    case OP_NOT:
      for (let w = from; w < to; w++) mem[d + w] = ~mem[a + w]!;
      break;
    case OP_AND:
      for (let w = from; w < to; w++) mem[d + w] = mem[a + w]! & mem[b + w]!;
      break;
    case OP_AND_NOT:
      for (let w = from; w < to; w++) mem[d + w] = mem[a + w]! & ~mem[b + w]!;
      break;
    case OP_OR:
      for (let w = from; w < to; w++) mem[d + w] = mem[a + w]! | mem[b + w]!;
      break;
    case OP_OR_NOT:
      for (let w = from; w < to; w++) mem[d + w] = mem[a + w]! | ~mem[b + w]!;
      break;
    case OP_XOR:
      for (let w = from; w < to; w++) mem[d + w] = mem[a + w]! ^ mem[b + w]!;
      break;
    case OP_MUX:
      for (let w = from; w < to; w++) {
        const s = mem[c + w]!;
        mem[d + w] = (mem[a + w]! & ~s) | (mem[b + w]! & s);
      }
      break;
    case OP_OR_INTO:
      for (let w = from; w < to; w++) mem[d + w]! |= mem[a + w]!;
      break;
  }
}
