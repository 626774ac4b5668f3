/**
 * The library view's table: rows sorted and filtered by status, and the words each cell shows for
 * its function (expected, or found when there is none) and its check result. Pure, for the view
 * to render.
 */
import type { LibraryRow, LibraryStatus } from '../analysis/libraryCheck.ts';
import { foundFunctionText } from '../analysis/foundFunction.ts';

export type LibrarySort = 'cell' | 'status' | 'transistors' | 'pins';
export type LibraryFilter = 'all' | 'failing' | 'passing' | 'unusable';

export interface LibraryTableView {
  readonly sort: LibrarySort;
  readonly direction: 'ascending' | 'descending';
  readonly filter: LibraryFilter;
}

export const DEFAULT_LIBRARY_VIEW: LibraryTableView = { sort: 'cell', direction: 'ascending', filter: 'all' };

/** Worst first when sorted by status ascending: unusable, then failing, then passing. */
const STATUS_RANK: Record<LibraryStatus, number> = { unusable: 0, fail: 1, pass: 2 };

const KEEP: Record<LibraryFilter, (s: LibraryStatus) => boolean> = {
  all: () => true,
  failing: (s) => s === 'fail',
  passing: (s) => s === 'pass',
  unusable: (s) => s === 'unusable',
};

function compare(sort: LibrarySort): (a: LibraryRow, b: LibraryRow) => number {
  switch (sort) {
    case 'cell':
      return (a, b) => a.cell.localeCompare(b.cell);
    case 'status':
      return (a, b) => STATUS_RANK[a.status] - STATUS_RANK[b.status] || b.errors - a.errors;
    case 'transistors':
      return (a, b) => a.transistors - b.transistors;
    case 'pins':
      return (a, b) => a.inputs.length + a.outputs.length - (b.inputs.length + b.outputs.length);
  }
}

export function libraryTableRows(rows: readonly LibraryRow[], view: LibraryTableView): LibraryRow[] {
  const byCell = compare('cell');
  const primary = compare(view.sort);
  const sign = view.direction === 'ascending' ? 1 : -1;
  return rows.filter((r) => KEEP[view.filter](r.status)).sort((a, b) => sign * primary(a, b) || byCell(a, b));
}

/** Per output: the expected function, or the found one marked as found. */
export function functionLines(row: LibraryRow): { readonly text: string; readonly found: boolean }[] {
  return row.outputs.map((out) => {
    const expected = row.expectations[out];
    if (expected !== undefined) return { text: `${out} = ${expected}`, found: false };
    const found = row.found.find((f) => f.output === out);
    return { text: found === undefined ? `${out}: not checked` : foundFunctionText(found), found: true };
  });
}

/** `pass`, `pass · 2 warnings (degraded 2)`, `fail · 3 errors (short 1, floating 2)`, or why unusable. */
export function resultText(row: LibraryRow): string {
  if (row.status === 'unusable') return `unusable: ${row.message ?? 'not checked'}`;
  const kinds = Object.entries(row.kinds).map(([k, n]) => `${k} ${n}`);
  const counts =
    row.errors > 0
      ? `${row.errors} error${row.errors === 1 ? '' : 's'}`
      : row.warnings > 0
        ? `${row.warnings} warning${row.warnings === 1 ? '' : 's'}`
        : '';
  return [row.status, ...(counts === '' ? [] : [`${counts} (${kinds.join(', ')})`])].join(' · ');
}
