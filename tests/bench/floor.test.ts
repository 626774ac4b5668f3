// Unit tests of our own plumbing: they check behaviour, not published values, so no source applies.
import { describe, expect, it } from 'vitest';
import { compile } from '../../src/core/compile/compile.ts';
import { DEFAULT_TECHNOLOGY } from '../../src/core/model/technology.ts';
import { floorFrame, floorLoop } from '../../bench/floor.ts';
import { inverterChain } from '../../bench/generators/index.ts';

describe('floor loop', () => {
  it('writes one byte per transistor: the level of its gate net', () => {
    const compiled = compile(inverterChain(3), DEFAULT_TECHNOLOGY);
    const frame = floorFrame(compiled);
    expect(frame.out).toHaveLength(6);
    frame.levels.fill(2);
    // Vector 1 sets input A (the only input) to 1; the chain's own nets keep the 2 written above.
    floorLoop(frame, 2);
    const gateOf = Array.from(frame.gates, (g) => compiled.netNames[g]);
    expect(gateOf).toEqual(['A', 'A', 'n1', 'n1', 'n2', 'n2']);
    expect(Array.from(frame.out)).toEqual([1, 1, 2, 2, 2, 2]);
  });
});
