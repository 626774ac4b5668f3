import { describe, expect, it } from 'vitest';
import { countOf, wholeNumber } from '../../src/core/view/plural.ts';
import { vectorCountText, vectorPositionText } from '../../src/core/view/vectorControl.ts';
import { isClean, severityCounts, summaryBadge, summaryLine } from '../../src/core/view/summary.ts';
import type { Finding, Summary } from '../../src/core/analysis/report.ts';

/**
 * How counts read in the panels. English singular for exactly one and plural otherwise, zero
 * included ("0 errors"), and a vector counter that starts at 1 as table rows are counted (common
 * practice, no source). 2^65 = 36,893,488,147,419,103,232 (exact integer arithmetic).
 */
describe('counts with their nouns', () => {
  it('uses the singular for exactly one, the plural for zero and many', () => {
    expect(countOf(1, 'device')).toBe('1 device');
    expect(countOf(2, 'device')).toBe('2 devices');
    expect(countOf(0, 'error')).toBe('0 errors');
    expect(countOf(1, 'step')).toBe('1 step');
    expect(countOf(1n, 'vector')).toBe('1 vector');
    expect(countOf(3, 'match', 'matches')).toBe('3 matches');
  });

  it('groups five digits and more by thousands, and leaves four alone', () => {
    expect(wholeNumber(1024)).toBe('1024');
    expect(wholeNumber(65536)).toBe('65,536');
    expect(countOf(65536, 'vector')).toBe('65,536 vectors');
    expect(wholeNumber(2n ** 65n)).toBe('36,893,488,147,419,103,232');
  });
});

describe('the vector counter', () => {
  it('counts from 1 and names the total', () => {
    expect(vectorPositionText(['A', 'B'], { A: '0', B: '0' })).toBe('vector 1 of 4');
    expect(vectorPositionText(['A', 'B'], { A: '1', B: '1' })).toBe('vector 4 of 4');
    expect(vectorPositionText(['A'], { A: 'Z' })).toBe('a vector with an input at X or Z');
  });

  it('writes 2^n for wide cells and stays exact past 2^53', () => {
    expect(vectorCountText(16)).toBe('65,536');
    expect(vectorCountText(20)).toBe('1,048,576');
    expect(vectorCountText(65)).toBe('2^65');
    const wide = Array.from({ length: 65 }, (_, i) => `I${i}`);
    const last = Object.fromEntries(wide.map((n) => [n, '1' as const]));
    expect(vectorPositionText(wide, last)).toBe('vector 36,893,488,147,419,103,232 of 2^65');
  });
});

describe('summaries', () => {
  const summary = (errors: number, warnings: number, vectors = 4): Summary => ({ vectors, errors, warnings });

  it('says clean only with no findings at all', () => {
    expect(summaryBadge(summary(0, 0))).toBe('✓ clean');
    expect(summaryBadge(summary(0, 1))).toBe('△ 1 warning');
    expect(summaryBadge(summary(2, 0))).toBe('◆ 2 errors');
    expect(summaryBadge(summary(1, 3))).toBe('◆ 1 error · △ 3 warnings');
    expect(isClean(summary(0, 1))).toBe(false);
  });

  it('names the counts on the line over the table', () => {
    expect(summaryLine(summary(0, 0))).toBe('4 vectors, no findings');
    expect(summaryLine(summary(0, 1, 1))).toBe('1 vector: 0 errors, 1 warning');
    expect(summaryLine(summary(1, 2, 2), 'step')).toBe('2 steps: 1 error, 2 warnings');
  });

  it('counts severities among findings', () => {
    const f = (severity: Finding['severity']): Finding => ({
      kind: 'rule',
      severity,
      vector: null,
      nets: [],
      devices: [],
      path: null,
      message: '',
    });
    expect(severityCounts([f('error'), f('warning'), f('warning')])).toEqual({ errors: 1, warnings: 2 });
  });
});
