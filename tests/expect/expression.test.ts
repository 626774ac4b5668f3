import { describe, expect, it } from 'vitest';
import { evaluateExpression } from '../../src/core/expect/evaluate.ts';
import {
  ExpressionError,
  MAX_EXPRESSION_DEPTH,
  parseExpression,
  splitExpectation,
} from '../../src/core/expect/parse.ts';

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

describe('hostile expressions end in an ExpressionError or a value, never a stack overflow', () => {
  // Behaviour of our own parser, no published source applies. The depth bound is MAX_EXPRESSION_DEPTH.
  const parseError = (text: string): ExpressionError => {
    try {
      parseExpression(text, inputs);
    } catch (e) {
      expect(e).toBeInstanceOf(ExpressionError);
      return e as ExpressionError;
    }
    throw new Error('expected an ExpressionError');
  };

  it('refuses 1,100 nested parentheses with a clear message, and accepts 200', () => {
    const deep = (n: number) => `${'('.repeat(n)}A${')'.repeat(n)}`;
    expect(parseError(deep(1100)).message).toContain(`nested more than ${MAX_EXPRESSION_DEPTH} levels deep`);
    expect(at(deep(200), { A: '1' })).toBe('1');
  });

  it('folds long runs of ! exactly: an odd run is one negation, an even run two', () => {
    expect(at(`${'!'.repeat(100_001)}A`, { A: '1' })).toBe('0');
    expect(at(`${'!'.repeat(100_000)}A`, { A: '1' })).toBe('1');
    // Two negations of Z give X (Z is only meaningful as a result), so they are not dropped.
    expect(at(`${'!'.repeat(10)}Z`, {})).toBe('X');
    expect(at(`${'!'.repeat(9)}Z`, {})).toBe('X');
  });

  it('takes chains of 100,000 operands as balanced trees', () => {
    expect(at(Array(100_000).fill('A').join('&'), { A: '1' })).toBe('1');
    expect(at(`${Array(99_999).fill('A').join(' & ')} & B`, { A: '1', B: '0' })).toBe('0');
    // Parity: 100,001 copies of A under ^ equal A.
    expect(at(Array(100_001).fill('A').join('^'), { A: '1' })).toBe('1');
  });

  it('refuses a ?: chain deeper than the bound and evaluates one within it', () => {
    const chain = (n: number) => `${'S ? 1 : '.repeat(n)}A`;
    expect(parseError(chain(2_000)).message).toContain('levels deep');
    expect(at(chain(200), { S: '0', A: '0' })).toBe('0');
  });

  it('shows a short excerpt of a long source, with control characters escaped', () => {
    const text = `${'A & '.repeat(10_000)}\u001b[2J?`;
    const e = parseError(text);
    expect(e.message.length).toBeLessThan(200);
    expect(e.message).not.toContain('\u001b');
    expect(e.message).toContain('\\u001b');
    expect(e.position).toBe(text.indexOf('\u001b'));
  });

  it('reads an input named like an Object member as an input', () => {
    for (const name of ['__proto__', 'constructor', 'toString']) {
      const expr = parseExpression(`!${name}`, [name]);
      expect(evaluateExpression(expr, { [name]: '1' })).toBe('0');
      expect(evaluateExpression(expr, JSON.parse(`{"${name}": "0"}`))).toBe('1');
      expect(evaluateExpression(expr, {})).toBe('X');
    }
  });
});
