/**
 * The word runner's two widths (docs/semantics.md §2.10): every operation code over 32-bit words and
 * over the same memory as 64-bit words gives the word-by-word Boolean result (the bitwise
 * definitions of NOT, AND, OR, XOR and the multiplexer are common practice, no source).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  OP_AND,
  OP_AND_NOT,
  OP_MUX,
  OP_NOT,
  OP_OR,
  OP_OR_INTO,
  OP_OR_NOT,
  OP_XOR,
  runWords32,
  runWords64,
  WordMemory,
} from '../../src/core/analysis/wordRun.ts';

const CODES = [OP_NOT, OP_AND, OP_AND_NOT, OP_OR, OP_OR_NOT, OP_XOR, OP_MUX, OP_OR_INTO];

/** One operation on 32-bit words, written out from its definition. */
function reference(code: number, d: number, a: number, b: number, c: number): number {
  if (code === OP_NOT) return ~a;
  if (code === OP_AND) return a & b;
  if (code === OP_AND_NOT) return a & ~b;
  if (code === OP_OR) return a | b;
  if (code === OP_OR_NOT) return a | ~b;
  if (code === OP_XOR) return a ^ b;
  if (code === OP_MUX) return (a & ~c) | (b & c);
  return d | a;
}

const SLOTS = 6;
const WORDS = 4;
const op = fc.tuple(
  fc.constantFrom(...CODES),
  fc.integer({ min: 2, max: SLOTS - 1 }),
  fc.integer({ min: 0, max: SLOTS - 1 }),
  fc.integer({ min: 0, max: SLOTS - 1 }),
  fc.integer({ min: 0, max: SLOTS - 1 }),
);

describe('word runner', () => {
  it('gives each operation its Boolean definition on 32-bit and on 64-bit words alike', () => {
    fc.assert(
      fc.property(
        fc.array(op, { minLength: 1, maxLength: 12 }),
        fc.array(fc.integer({ min: -(2 ** 31), max: 2 ** 31 - 1 }), {
          minLength: SLOTS * WORDS,
          maxLength: SLOTS * WORDS,
        }),
        (program, start) => {
          const ops = Int32Array.from(program.flat());
          const expected = Int32Array.from(start);
          for (const [code, d, a, b, c] of program) {
            for (let w = 0; w < WORDS; w++) {
              const at = (s: number): number => expected[s * WORDS + w]!;
              expected[d * WORDS + w] = reference(code, at(d), at(a), at(b), at(c));
            }
          }
          const narrow = Int32Array.from(start);
          runWords32(ops, narrow, WORDS);
          const memory = new WordMemory(SLOTS, WORDS);
          memory.narrow.set(start);
          memory.run(ops);
          const wide = Int32Array.from(start);
          runWords64(ops, new BigUint64Array(wide.buffer), WORDS / 2);
          expect(narrow).toEqual(expected);
          expect(memory.narrow).toEqual(expected);
          expect(wide).toEqual(expected);
        },
      ),
      { numRuns: 300, seed: 1111 },
    );
  });
});
