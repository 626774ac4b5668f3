/**
 * How a check is summed up in the panels. "Clean" is said only when there is no finding at all;
 * otherwise the counts are named, errors first: "◆ 1 error · △ 2 warnings".
 */
import type { Finding, Summary } from '../analysis/report.ts';
import { countOf } from './plural.ts';

/** The counts a summary names (a report's `summary` has them, structural findings included). */
export type FindingCounts = Pick<Summary, 'errors' | 'warnings'>;

/** Errors and warnings among some findings (the structural ones, say). */
export function severityCounts(findings: readonly Finding[]): FindingCounts {
  let errors = 0;
  for (const f of findings) if (f.severity === 'error') errors++;
  return { errors, warnings: findings.length - errors };
}

export function isClean(counts: FindingCounts): boolean {
  return counts.errors === 0 && counts.warnings === 0;
}

/** The short form beside a section title: "✓ clean", "◆ 1 error", "△ 3 warnings", or both. */
export function summaryBadge(counts: FindingCounts): string {
  if (isClean(counts)) return '✓ clean';
  const parts: string[] = [];
  if (counts.errors > 0) parts.push(`◆ ${countOf(counts.errors, 'error')}`);
  if (counts.warnings > 0) parts.push(`△ ${countOf(counts.warnings, 'warning')}`);
  return parts.join(' · ');
}

/** The line over the table: "4 vectors, no findings", "4 vectors: 0 errors, 1 warning". */
export function summaryLine(summary: Summary, unit: 'vector' | 'step' = 'vector'): string {
  const what = countOf(summary.vectors, unit);
  if (isClean(summary)) return `${what}, no findings`;
  return `${what}: ${countOf(summary.errors, 'error')}, ${countOf(summary.warnings, 'warning')}`;
}
