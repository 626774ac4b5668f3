// Indexes read here are in range by construction, so `!` marks them (no run-time cost).
/** Plain-text tables for the terminal: text columns left-aligned, numbers right-aligned. */

export type Cell = string | number;

/** Numbers with a sensible number of significant figures for a timing table. */
export function formatNumber(x: number): string {
  if (!Number.isFinite(x)) return String(x);
  if (Number.isInteger(x)) return x.toLocaleString('en-US');
  const abs = Math.abs(x);
  if (abs >= 1000) return Math.round(x).toLocaleString('en-US');
  if (abs >= 100) return x.toFixed(0);
  if (abs >= 10) return x.toFixed(1);
  if (abs >= 0.01 || abs === 0) return x.toFixed(2);
  return x.toExponential(2);
}

export function formatTable(headers: readonly string[], rows: readonly (readonly Cell[])[]): string {
  const text = rows.map((row) => row.map((c) => (typeof c === 'number' ? formatNumber(c) : c)));
  const widths = headers.map((h, i) => Math.max(h.length, ...text.map((r) => (r[i] ?? '').length)));
  const numeric = headers.map((_, i) => rows.length > 0 && rows.every((r) => typeof r[i] === 'number'));
  const line = (cells: readonly string[]): string =>
    cells
      .map((c, i) => (numeric[i] ? c.padStart(widths[i]!) : c.padEnd(widths[i]!)))
      .join('  ')
      .trimEnd();
  return [line(headers), line(widths.map((w) => '-'.repeat(w))), ...text.map(line)].join('\n');
}
