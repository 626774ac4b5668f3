// Hot loop: slots and operands are in range by construction, so `!` marks them (no run-time cost).
/**
 * Runs a compiled word program (wordProgram.ts, docs/semantics.md §2.10) over `words` words per
 * slot: slot s is `mem[s * words …]`. Slots 0 and 1 must hold zeros and ones, and the inputs' slots
 * their words. Each operation is one loop over the words, four words a round (the bench measured
 * about a sixth less time per word than one word a round in Node 20); a count that is not a
 * multiple of four finishes one word a round.
 */
import {
  OP_AND,
  OP_AND_NOT,
  OP_MUX,
  OP_NOT,
  OP_OR,
  OP_OR_INTO,
  OP_OR_NOT,
  OP_XOR,
  STRIDE,
} from './wordProgram.ts';

export function runWordProgram(ops: Int32Array, mem: Int32Array, words: number): void {
  const rounds = words & ~3;
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
  for (let w = 0; w < words; w += 4) {
    mem[d + w] = mem[a + w]! & mem[b + w]!;
    mem[d + w + 1] = mem[a + w + 1]! & mem[b + w + 1]!;
    mem[d + w + 2] = mem[a + w + 2]! & mem[b + w + 2]!;
    mem[d + w + 3] = mem[a + w + 3]! & mem[b + w + 3]!;
  }
}

function orRounds(mem: Int32Array, d: number, a: number, b: number, words: number): void {
  for (let w = 0; w < words; w += 4) {
    mem[d + w] = mem[a + w]! | mem[b + w]!;
    mem[d + w + 1] = mem[a + w + 1]! | mem[b + w + 1]!;
    mem[d + w + 2] = mem[a + w + 2]! | mem[b + w + 2]!;
    mem[d + w + 3] = mem[a + w + 3]! | mem[b + w + 3]!;
  }
}

function muxRounds(mem: Int32Array, d: number, a: number, b: number, c: number, words: number): void {
  for (let w = 0; w < words; w += 2) {
    const s = mem[c + w]!;
    const t = mem[c + w + 1]!;
    mem[d + w] = (mem[a + w]! & ~s) | (mem[b + w]! & s);
    mem[d + w + 1] = (mem[a + w + 1]! & ~t) | (mem[b + w + 1]! & t);
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
