// Unit tests of our own plumbing: they check behaviour, not published values, so no source applies.
import { describe, expect, it } from 'vitest';
import { operand, randomVectors, toggleWalk, vectorAt } from '../../bench/vectors.ts';

const differing = (a: Record<string, string>, b: Record<string, string>): string[] =>
  Object.keys(a).filter((k) => a[k] !== b[k]);

describe('benchmark vectors', () => {
  it('numbers exhaustive vectors with the first input as the least significant bit', () => {
    expect(vectorAt(['A', 'B', 'C'], 6)).toEqual({ A: '0', B: '1', C: '1' });
    expect(operand(['S0', 'S1', 'S2', 'S3'], 0b1010)).toEqual({ S0: '0', S1: '1', S2: '0', S3: '1' });
  });

  it('gives the same random vectors for the same seed', () => {
    expect(randomVectors(['A', 'B', 'C'], 5, 3)).toEqual(randomVectors(['A', 'B', 'C'], 5, 3));
  });

  it('builds a closed toggle walk: every step, and the wrap from last to first, flips exactly one input', () => {
    const walk = toggleWalk(['A', 'B', 'C', 'D'], 20);
    expect(walk).toHaveLength(40);
    walk.forEach((v, i) => expect(differing(v, walk[(i + 1) % walk.length]!)).toHaveLength(1));
  });
});
