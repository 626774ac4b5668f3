/**
 * The one text form of a sequence (docs/semantics.md §5), read alike by `railwise check --sequence`
 * and the step editor. The rules are our own format (no published source applies); the expected
 * values are worked out by hand from those rules.
 */
import { describe, expect, it } from 'vitest';
import {
  SequenceTextError,
  formatSequenceText,
  heldSteps,
  parseSequenceText,
} from '../../src/core/analysis/sequenceText.ts';
import { SequenceError } from '../../src/core/analysis/check.ts';
import type { InputVector } from '../../src/core/model/design.ts';

const D_LATCH = ['D', 'CLK'];

function refusal(text: string): SequenceTextError {
  try {
    parseSequenceText(text, D_LATCH);
  } catch (e) {
    if (e instanceof SequenceTextError) return e;
    throw e;
  }
  throw new Error(`"${text}" was accepted`);
}

describe('sequence text', () => {
  it('separates steps by ";" and by line breaks alike', () => {
    const expected = [{ D: '1', CLK: '1' }, { CLK: '0' }, { D: '0' }];
    expect(parseSequenceText('D=1 CLK=1; CLK=0; D=0', D_LATCH)).toEqual(expected);
    expect(parseSequenceText('D=1 CLK=1\nCLK=0\nD=0\n', D_LATCH)).toEqual(expected);
    expect(parseSequenceText('D=1 CLK=1\r\nCLK=0;\r\n\r\nD=0;', D_LATCH)).toEqual(expected);
  });

  it('reads assignments separated by spaces or commas, values in either case', () => {
    expect(parseSequenceText('D=0, CLK=1', D_LATCH)).toEqual([{ D: '0', CLK: '1' }]);
    expect(parseSequenceText('D=z,CLK=x', D_LATCH)).toEqual([{ D: 'Z', CLK: 'X' }]);
  });

  it('writes "-" for a step that changes nothing and reads it back', () => {
    const steps: InputVector[] = [{ D: '1' }, {}, { CLK: '1' }];
    expect(formatSequenceText(steps, D_LATCH)).toBe('D=1\n-\nCLK=1');
    expect(parseSequenceText('D=1; -; CLK=1', D_LATCH)).toEqual(steps);
  });

  it('round-trips through its text form', () => {
    const steps = parseSequenceText('D=1 CLK=1; CLK=0; D=z CLK=x', D_LATCH);
    expect(parseSequenceText(formatSequenceText(steps, D_LATCH), D_LATCH)).toEqual(steps);
  });

  it('refuses an empty step between two ";" at its place', () => {
    const e = refusal('D=0;; D=1');
    expect(e.position).toBe(4);
    expect(e.message).toBe('column 5: empty step: write - for a step that changes nothing');
    expect(refusal('D=0; ;D=1').column).toBe(6);
  });

  it('names the line and column of a bad value, an unknown input and a stray word', () => {
    const bad = refusal('D=1 CLK=1\nD=2');
    expect([bad.line, bad.column, bad.position]).toEqual([2, 3, 12]);
    expect(bad.message).toMatch(/^line 2, column 3: the value of D must be 0, 1, X or Z$/);
    expect(refusal('Q=1').message).toBe('column 1: "Q" is not an input');
    expect(refusal('D=1 hold').message).toBe('column 5: expected NAME=VALUE, found "hold"');
    expect(refusal('D=1 D=0').message).toBe('column 5: D is set twice in one step');
    expect(refusal('D=7')).toBeInstanceOf(SequenceError);
  });

  it('holds inputs a step leaves out, X before their first mention', () => {
    expect(heldSteps(D_LATCH, [{ D: '1', CLK: '1' }, { CLK: '0' }])).toEqual([
      { D: '1', CLK: '1' },
      { D: '1', CLK: '0' },
    ]);
    expect(heldSteps(['SN', 'RN'], [{ SN: '0' }, { RN: '1' }])).toEqual([
      { SN: '0', RN: 'X' },
      { SN: '0', RN: '1' },
    ]);
  });
});
