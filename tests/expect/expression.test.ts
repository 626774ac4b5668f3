import { describe, expect, it } from 'vitest';
import { evaluateExpression } from '../../src/core/expect/evaluate.ts';
import { ExpressionError, parseExpression, splitExpectation } from '../../src/core/expect/parse.ts';

const inputs = ['A', 'B', 'S', 'EN'];
const at = (text: string, v: Record<string, '0' | '1' | 'X' | 'Z'>) =>
  evaluateExpression(parseExpression(text, inputs), v);

describe('expected-function expressions', () => {
  // Boolean algebra, common practice, no source.
  it('follows precedence: ! binds tightest, then &, ^, |, and ?: loosest', () => {
    expect(at('A | B & !A', { A: '0', B: '1' })).toBe('1');
    expect(at('A ^ B & A', { A: '1', B: '0' })).toBe('1');
    expect(at('S ? A : B', { S: '1', A: '0', B: '1' })).toBe('0');
    expect(at('S ? A : S ? B : 1', { S: '0', A: '0', B: '0' })).toBe('1');
  });
  it('allows Z as a result for tristate outputs', () => {
    expect(at('EN ? !A : Z', { EN: '0', A: '1' })).toBe('Z');
    expect(at('EN ? !A : Z', { EN: '1', A: '1' })).toBe('0');
  });
  it('gives X only where an unknown input matters', () => {
    expect(at('A & B', { A: '0', B: 'X' })).toBe('0');
    expect(at('A & B', { A: '1', B: 'X' })).toBe('X');
    expect(at('S ? A : B', { S: 'X', A: '1', B: '1' })).toBe('1');
  });
  it.each([
    ['A & & B', 4],
    ['A & (B | S', 10],
    ['A + B', 2],
    ['A & Q', 4],
    ['', 0],
    ['S ? A B', 6],
  ])('reports the bad token of %j at column %i (0-based)', (text, position) => {
    try {
      parseExpression(text, inputs);
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(ExpressionError);
      expect((e as ExpressionError).position).toBe(position);
    }
  });
  it('splits "Y = expr"', () => {
    expect(splitExpectation('Y = !(A & B)')).toEqual({ output: 'Y', expression: ' !(A & B)' });
    expect(() => splitExpectation('!(A & B)')).toThrow(ExpressionError);
  });
});
