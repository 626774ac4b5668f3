/**
 * The sweep's word program (docs/semantics.md §2.10): a function built from its truth table's leaves
 * gives, for every vector of a word, the leaf its controls select. The full adder's carry (majority)
 * and sum (odd parity) are common practice, no source; random functions are internal consistency.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { ONES, WordProgram, ZERO } from '../../src/core/analysis/wordProgram.ts';
import { runWordProgram } from '../../src/core/analysis/wordRun.ts';

/** The word a reference names: a slot's, or its complement's (negative references). */
function wordAt(mem: Int32Array, ref: number, words: number, w: number): number {
  return ref < 0 ? ~mem[~ref * words + w]! : mem[ref * words + w]!;
}

/** Control i's word over 4 words of 32 vectors: bit j of word w is bit i of vector 32w + j. */
function controlWords(i: number, words: number): number[] {
  return Array.from({ length: words }, (_, w) => {
    let word = 0;
    for (let j = 0; j < 32; j++) if (((32 * w + j) >> i) & 1) word |= 1 << j;
    return word;
  });
}

/** Runs the function of `leaves` over k controls for 128 vectors; returns each vector's bit. */
function evaluate(leaves: readonly number[], k: number): number[] {
  const words = 4;
  const program = new WordProgram();
  const controls = Int32Array.from({ length: k }, () => program.slot());
  const built = program.compiled([program.fromLeaves(Int32Array.from(leaves), controls)]);
  const out = built.physical(program.fromLeaves(Int32Array.from(leaves), controls));
  const mem = new Int32Array(built.slotCount * words);
  mem.fill(-1, ONES * words, (ONES + 1) * words);
  controls.forEach((slot, i) => mem.set(controlWords(i, words), built.physical(slot) * words));
  runWordProgram(built.ops, mem, words);
  return Array.from({ length: 32 * words }, (_, v) => (wordAt(mem, out, words, v >> 5) >>> (v & 31)) & 1);
}

/** Leaf of each vector: its low k bits select the entry. */
function expected(leaves: readonly number[], k: number): number[] {
  return Array.from({ length: 128 }, (_, v) => (leaves[v & ((1 << k) - 1)] === 0 ? 0 : 1));
}

const leavesOf = (k: number, f: (e: number) => boolean): number[] =>
  Array.from({ length: 2 ** k }, (_, e) => (f(e) ? -1 : 0));
const bits = (e: number): number => (e & 1) + ((e >> 1) & 1) + ((e >> 2) & 1);

describe('word program', () => {
  it("gives the full adder's carry (majority) and sum (odd parity) for every vector", () => {
    const carry = leavesOf(3, (e) => bits(e) >= 2);
    const sum = leavesOf(3, (e) => bits(e) % 2 === 1);
    expect(evaluate(carry, 3)).toEqual(expected(carry, 3));
    expect(evaluate(sum, 3)).toEqual(expected(sum, 3));
  });

  it('folds constants, single controls and their complements into no operation at all', () => {
    const program = new WordProgram();
    const [a, b] = [program.slot(), program.slot()];
    const controls = Int32Array.of(a, b);
    expect(program.fromLeaves(Int32Array.of(0, 0, 0, 0), controls)).toBe(ZERO);
    expect(program.fromLeaves(Int32Array.of(-1, -1, -1, -1), controls)).toBe(ONES);
    expect(program.fromLeaves(Int32Array.of(0, 0, -1, -1), controls)).toBe(b);
    expect(program.fromLeaves(Int32Array.of(-1, -1, 0, 0), controls)).toBe(~b);
    expect(program.compiled().ops).toHaveLength(0);
  });

  it('equals the table on random functions of up to 7 controls', () => {
    fc.assert(
      fc.property(
        fc
          .integer({ min: 0, max: 7 })
          .chain((k) =>
            fc.tuple(fc.constant(k), fc.array(fc.boolean(), { minLength: 2 ** k, maxLength: 2 ** k })),
          ),
        ([k, table]) => {
          const leaves = table.map((x) => (x ? -1 : 0));
          expect(evaluate(leaves, k)).toEqual(expected(leaves, k));
        },
      ),
      { numRuns: 300, seed: 1104 },
    );
  });

  it('expression operations fold constants and compute the rest word-wise', () => {
    const program = new WordProgram();
    const a = program.slot();
    expect(program.and(a, ZERO)).toBe(ZERO);
    expect(program.or(a, ONES)).toBe(ONES);
    expect(program.xor(a, ZERO)).toBe(a);
    expect(program.xor(a, ONES)).toBe(~a);
    const b = program.slot();
    const nor = program.and(program.not(a), program.not(b));
    const x = program.xor(nor, b);
    const built = program.compiled([x]);
    const mem = new Int32Array(built.slotCount);
    mem[ONES] = -1;
    mem[built.physical(a)] = 0x0f0f0f0f;
    mem[built.physical(b)] = 0x00ff00ff;
    runWordProgram(built.ops, mem, 1);
    expect(wordAt(mem, built.physical(x), 1, 0)).toBe(~(0x0f0f0f0f | 0x00ff00ff) ^ 0x00ff00ff);
  });

  it('shares identical nodes across the program, drops what nothing reads and reuses freed slots', () => {
    const program = new WordProgram();
    const [a, b, c] = [program.slot(), program.slot(), program.slot()];
    const carry = leavesOf(3, (e) => bits(e) >= 2);
    const first = program.fromLeaves(Int32Array.from(carry), Int32Array.of(a, b, c));
    // The same function of the same controls built again (another group) is the same node.
    expect(program.fromLeaves(Int32Array.from(carry), Int32Array.of(a, b, c))).toBe(first);
    program.xor(a, c); // read by nothing: dropped
    // A chain of four: each link is read once, by the next, so two slots serve the whole chain.
    let chain = first;
    for (let i = 0; i < 4; i++) chain = program.and(program.or(chain, a), b);
    const built = program.compiled([chain]);
    expect(built.ops.length / 5).toBe(3 + 8); // the carry's three, the chain's eight
    expect(built.slotCount).toBeLessThan(2 + 3 + 1 + 3);
    const mem = new Int32Array(built.slotCount);
    mem[ONES] = -1;
    const [wa, wb, wc] = [0x0f0f0f0f, 0x00ff00ff, 0x33333333];
    mem[built.physical(a)] = wa;
    mem[built.physical(b)] = wb;
    mem[built.physical(c)] = wc;
    runWordProgram(built.ops, mem, 1);
    let expectedChain = (wa & wb) | (wa & wc) | (wb & wc);
    for (let i = 0; i < 4; i++) expectedChain = (expectedChain | wa) & wb;
    expect(wordAt(mem, built.physical(chain), 1, 0)).toBe(expectedChain);
  });
});
