/**
 * The minimiser against functions whose minimal covers are worked out by hand from textbook Boolean
 * algebra, plus a property: every cover agrees with its function on every vector it must decide.
 */
import { reportRows } from '../../src/core/analysis/sweepColumns.ts';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  covers,
  coverText,
  minimalCover,
  MinimiseError,
  primeImplicants,
  type Cube,
} from '../../src/core/logic/minimise.ts';
import { foundFunctions } from '../../src/core/analysis/foundFunction.ts';
import { checkSweep } from '../../src/core/analysis/check.ts';
import { evaluateExpression } from '../../src/core/expect/evaluate.ts';
import { parseExpression } from '../../src/core/expect/parse.ts';
import { starterById } from '../../src/core/starters/index.ts';
import { nand2 } from '../cells.ts';

const literals = (cubes: readonly Cube[]) =>
  cubes.reduce((s, c) => s + c.care.toString(2).replace(/0/g, '').length, 0);

describe('hand-checkable minimal covers', () => {
  it("De Morgan: the NAND's ones {00, 01, 10} give !A | !B", () => {
    // ¬(A·B) = ¬A + ¬B (De Morgan's law; any Boolean algebra text, e.g. Mano & Ciletti,
    // Digital Design, 5th ed., §2.4, theorem 5b).
    expect(coverText(minimalCover(2, [0, 1, 2]).cubes, ['A', 'B'])).toBe('!A | !B');
  });

  it('consensus: AB + !AC + BC needs only AB + !AC', () => {
    // Consensus theorem: xy + x'z + yz = xy + x'z (Mano & Ciletti 5th ed. §2.4, example of
    // consensus). Ones of AB + A'C over (A, B, C): 001, 011, 110, 111 → minterms 1, 3, 6, 7;
    // BC adds 011 and 111, already there.
    const cover = minimalCover(3, [1, 3, 6, 7]);
    expect(cover.cubes).toHaveLength(2);
    expect(coverText(cover.cubes, ['A', 'B', 'C'])).toBe('!A & C | A & B');
  });

  it('a Karnaugh map of four corners and a centre square: !B & !D | B & D', () => {
    // f(A,B,C,D) = Σm(0, 2, 8, 10, 5, 7, 13, 15). On the map (rows AB = 00 01 11 10, columns
    // CD = 00 01 11 10) the ones 0, 2, 8, 10 are the four corners, which wrap into one square
    // where B = 0 and D = 0: !B·!D. The ones 5, 7, 13, 15 are the centre square, B = 1 and D = 1:
    // B·D. No prime covers ones of both squares, so the minimal cover is these two terms.
    const cover = minimalCover(4, [0, 2, 5, 7, 8, 10, 13, 15]);
    expect(cover.exact).toBe(true);
    expect(coverText(cover.cubes, ['A', 'B', 'C', 'D'])).toBe('!B & !D | B & D');
  });

  it("uses don't-cares: Σm(1, 3, 7, 11, 15) + d(0, 2, 5) takes two terms of two literals", () => {
    // C·D covers 3, 7, 11, 15 (xx11). Minterm 1 (0001) then needs !A·!B (00xx, with the
    // don't-cares 0 and 2) or !A·D (0xx1, with the don't-care 5): both two literals, so either
    // cover is minimal at 2 terms and 4 literals.
    const cover = minimalCover(4, [1, 3, 7, 11, 15], [0, 2, 5]);
    expect(cover.cubes).toHaveLength(2);
    expect(literals(cover.cubes)).toBe(4);
    expect(['C & D | !A & !B', '!A & !B | C & D', 'C & D | !A & D', '!A & D | C & D']).toContain(
      coverText(cover.cubes, ['A', 'B', 'C', 'D']),
    );
  });

  it('gives 0 for no ones and 1 for all ones', () => {
    expect(coverText(minimalCover(2, []).cubes, ['A', 'B'])).toBe('0');
    expect(coverText(minimalCover(2, [0, 1, 2, 3]).cubes, ['A', 'B'])).toBe('1');
  });

  it('finds the six primes of the classic cyclic function Σm(0, 1, 2, 5, 6, 7)', () => {
    // The cyclic cover problem (no essential primes): primes !A!B, !A!C, !BC, B!C, AC, AB; a
    // minimal cover takes three of them (McCluskey 1956's kind of example; worked by hand).
    expect(primeImplicants(3, [0, 1, 2, 5, 6, 7], [])).toHaveLength(6);
    expect(minimalCover(3, [0, 1, 2, 5, 6, 7]).cubes).toHaveLength(3);
  });

  it('refuses more inputs than it takes', () => {
    expect(() => minimalCover(13, [1])).toThrow(MinimiseError);
  });
});

describe('every cover is its function (property)', () => {
  it('agrees on every one and every zero', () => {
    fc.assert(
      fc.property(
        fc
          .integer({ min: 1, max: 6 })
          .chain((n) =>
            fc.tuple(
              fc.constant(n),
              fc.array(fc.constantFrom(0, 1, 2), { minLength: 2 ** n, maxLength: 2 ** n }),
            ),
          ),
        ([n, table]) => {
          const ones = table.flatMap((v, m) => (v === 1 ? [m] : []));
          const dc = table.flatMap((v, m) => (v === 2 ? [m] : []));
          const { cubes } = minimalCover(n, ones, dc);
          table.forEach((v, m) => {
            if (v === 2) return;
            expect(cubes.some((c) => covers(c, m))).toBe(v === 1);
          });
        },
      ),
      { numRuns: 300 },
    );
  });
});

describe('found functions of a checked cell', () => {
  it('read a NAND2 as !A | !B', () => {
    expect(foundFunctions(checkSweep(nand2))).toEqual([
      { output: 'Y', expression: '!A | !B', undecided: 0, minimal: true },
    ]);
  });

  it('read a tristate inverter as driving only while enabled, in text the expected-function parser takes', () => {
    const tri = starterById('tristate-inverter')!.design;
    const [found] = foundFunctions(checkSweep(tri.netlist));
    expect(found?.expression).toMatch(/\? .* : Z$/);
    const expr = parseExpression(found!.expression!, tri.netlist.inputs);
    for (const row of reportRows(checkSweep(tri.netlist)))
      expect(evaluateExpression(expr, row.inputs)).toBe(row.outputs['Y']);
  });
});
