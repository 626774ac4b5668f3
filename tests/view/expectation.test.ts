import { describe, expect, it } from 'vitest';
import { expressionProblem } from '../../src/core/expect/problems.ts';
import { tokenSpan } from '../../src/core/view/expectation.ts';

describe('expected-function problems', () => {
  // NAND2: Y = !(A & B) (common practice, no source).
  it('accepts a correct function', () => {
    expect(expressionProblem('!(A & B)', ['A', 'B'])).toBeNull();
    expect(expressionProblem('EN ? !A : Z', ['A', 'EN'])).toBeNull();
  });

  it('points at a misspelt input', () => {
    const problem = expressionProblem('!(A & Bx)', ['A', 'B']);
    expect(problem?.position).toBe(6);
    expect(problem?.message).toContain('Bx');
    expect(problem?.message).not.toContain('column');
    expect(tokenSpan('!(A & Bx)', 6)).toEqual([6, 8]);
  });

  it('points at the end for an unfinished expression', () => {
    const problem = expressionProblem('!(A &', ['A', 'B']);
    expect(problem?.position).toBe(5);
    expect(tokenSpan('!(A &', 5)).toEqual([5, 6]);
  });
});
