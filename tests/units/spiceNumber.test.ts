/**
 * SPICE numbers: scale factors T G MEG K M U N P F and MIL, letters after the factor ignored
 * (Berkeley SPICE3 user's manual, "general structure and conventions"; from memory).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { formatSpiceNumber, spiceValue } from '../../src/core/units/spiceNumber.ts';

describe('spiceValue', () => {
  it.each([
    ['2u', 2e-6],
    ['740.00n', 740e-9],
    ['1.12e-06', 1.12e-6],
    ['10k', 1e4],
    ['1MEG', 1e6],
    ['1m', 1e-3],
    ['3g', 3e9],
    ['1t', 1e12],
    ['5f', 5e-15],
    ['10pF', 10e-12],
    ['2.5V', 2.5],
    ['-0.4', -0.4],
    ['.5u', 0.5e-6],
  ])('%s is %d', (text, value) => {
    expect(spiceValue(text)).toBe(value);
  });

  it('reads 1 mil as 25.4 µm (one thousandth of an inch)', () => {
    expect(spiceValue('1mil', -6)).toBeCloseTo(25.4, 12);
  });

  it('converts to another unit without rounding error: 1.5u is exactly 1.5 µm', () => {
    expect(spiceValue('1.5u', -6)).toBe(1.5);
    expect(spiceValue('740.00n', -6)).toBe(0.74);
    expect(spiceValue('1.12e-06', -6)).toBe(1.12);
  });

  it('rejects what is not a number', () => {
    for (const text of ['', 'u', 'abc', '1..2', '{w}', '2*3']) expect(spiceValue(text)).toBeNull();
  });
});

describe('formatSpiceNumber', () => {
  it('uses engineering suffixes', () => {
    expect(formatSpiceNumber(40e3)).toBe('40k');
    expect(formatSpiceNumber(1e-15)).toBe('1f');
    expect(formatSpiceNumber(2.5)).toBe('2.5');
  });

  it('always reads back to exactly the same number', () => {
    const value = fc.double({ min: 1e-20, max: 1e12, noNaN: true, noDefaultInfinity: true });
    fc.assert(
      fc.property(value, fc.constantFrom(0, -6), (v, exponent) => {
        expect(spiceValue(formatSpiceNumber(v, exponent), exponent)).toBe(v);
      }),
      { numRuns: 2000 },
    );
  });
});
