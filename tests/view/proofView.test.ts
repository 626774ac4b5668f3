/** Words for a proof's answers, shared by the workspace and the command line. */
import { describe, expect, it } from 'vitest';
import { MAX_SHOWN_INPUTS, propertyTitle, vectorText } from '../../src/core/view/proofView.ts';

describe('proof words', () => {
  it('names each property as a sentence about the output or the cell', () => {
    expect(propertyTitle({ property: 'function', output: 'Y' })).toBe('Y follows its expected function');
    expect(propertyTitle({ property: 'no-contention', output: null })).toBe('no contention');
    expect(propertyTitle({ property: 'no-floating', output: 'Q' })).toMatch(/^Q never floats/);
  });

  it('spells out a counterexample, and says how many inputs are left out of a wide one', () => {
    expect(vectorText({ A: 1, B: 0 })).toBe('A=1 B=0');
    const wide = Object.fromEntries(Array.from({ length: 64 }, (_, i) => [`A${i}`, 1 as const]));
    const text = vectorText(wide);
    expect(text.split(' ').filter((p) => p.includes('='))).toHaveLength(MAX_SHOWN_INPUTS);
    expect(text).toMatch(/… \(40 more\)$/);
    expect(vectorText({ 'a\u001bb': 0 }, (n) => JSON.stringify(n))).toBe('"a\\u001bb"=0');
  });
});
