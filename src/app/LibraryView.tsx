import type { LibraryRow } from '../core/analysis/libraryCheck.ts';
import {
  DEFAULT_LIBRARY_VIEW,
  functionLines,
  libraryTableRows,
  resultText,
  type LibraryFilter,
  type LibrarySort,
} from '../core/view/libraryTable.ts';
import {
  cancelLibraryCheck,
  closeLibraryView,
  setLibraryView,
  sortLibraryBy,
  startLibraryCheck,
} from '../state/library.ts';
import { useSimulation } from '../state/simulation.ts';
import { useStore } from '../state/store.ts';
import { openCellOnSheet } from '../state/navigation.ts';
import { fitToView } from '../state/view.ts';
import { Dialog } from './Dialog.tsx';
import { attachLibertyFile, LIBERTY_INPUT_ID } from './libraryFiles.ts';
import './library.css';

const FILTERS: readonly [LibraryFilter, string][] = [
  ['all', 'All cells'],
  ['failing', 'Failing'],
  ['passing', 'Passing'],
  ['unusable', 'Unusable'],
];

const COLUMNS: readonly [LibrarySort | null, string][] = [
  ['cell', 'Cell'],
  ['pins', 'Pins'],
  ['transistors', 'Transistors'],
  [null, 'Function (expected, or found)'],
  ['status', 'Result'],
];

function open(cell: string): void {
  closeLibraryView();
  openCellOnSheet(cell);
  fitToView();
}

function Row({ row, current }: { row: LibraryRow; current: boolean }) {
  return (
    <tr data-cell={row.cell} data-status={row.status} aria-current={current ? 'true' : undefined}>
      <td>
        <button type="button" onClick={() => open(row.cell)} title={`Put ${row.cell} on the sheet`}>
          {row.cell}
        </button>
        {row.instances > 0 ? <span className="rw-lib-note"> {row.instances} instances</span> : null}
      </td>
      <td>
        {row.inputs.join(' ') || '–'} → {row.outputs.join(' ') || '–'}
      </td>
      <td className="rw-lib-number">{row.transistors}</td>
      <td>
        {functionLines(row).map((f) => (
          <div key={f.text} className={f.found ? 'rw-lib-found' : undefined}>
            {f.found ? <span className="rw-lib-tag">found </span> : null}
            <code>{f.text}</code>
          </div>
        ))}
      </td>
      <td className={`rw-lib-result rw-lib-${row.status}`}>{resultText(row)}</td>
    </tr>
  );
}

/** Every cell of the design with its check, computed in the worker; any cell opens onto the sheet. */
export function LibraryView() {
  const view = useSimulation((s) => s.libraryView);
  const job = useSimulation((s) => s.library);
  const designName = useStore((s) => s.doc.designName ?? s.doc.name);
  const openName = useStore((s) => s.doc.name);
  if (view === null) return null;
  const rows = libraryTableRows(job.result?.rows ?? [], view);
  const all = job.result?.rows ?? [];
  const count = (status: LibraryRow['status']) => all.filter((r) => r.status === status).length;
  return (
    <Dialog title={`Cells of ${designName}`} onClose={closeLibraryView}>
      <div className="rw-lib-bar">
        <label>
          Show{' '}
          <select
            aria-label="Show cells"
            value={view.filter}
            onChange={(e) => setLibraryView({ filter: e.target.value as LibraryFilter })}
          >
            {FILTERS.map(([value, text]) => (
              <option key={value} value={value}>
                {text}
              </option>
            ))}
          </select>
        </label>
        <span role="status" aria-live="polite">
          {job.status === 'running'
            ? `Checking cells… ${job.progress.done} of ${job.progress.total}`
            : job.status === 'done'
              ? `${all.length} cells: ${count('pass')} pass, ${count('fail')} fail, ${count('unusable')} unusable`
              : job.status === 'cancelled'
                ? 'Check cancelled'
                : job.status === 'failed'
                  ? `Check failed: ${job.error ?? ''}`
                  : ''}
        </span>
        {job.status === 'running' ? (
          <>
            <progress max={job.progress.total} value={job.progress.done} />
            <button type="button" onClick={cancelLibraryCheck}>
              Cancel
            </button>
          </>
        ) : (
          <button type="button" onClick={() => void startLibraryCheck()}>
            Check again
          </button>
        )}
        <button type="button" onClick={() => document.getElementById(LIBERTY_INPUT_ID)?.click()}>
          Expected functions from Liberty…
        </button>
        <input
          id={LIBERTY_INPUT_ID}
          data-testid="attach-liberty"
          type="file"
          accept=".lib"
          hidden
          onChange={(e) => {
            const file = e.target.files?.[0];
            e.target.value = '';
            if (file) void attachLibertyFile(file);
          }}
        />
      </div>
      <table className="rw-lib-table" aria-label="Cells">
        <thead>
          <tr>
            {COLUMNS.map(([sort, text]) => (
              <th
                key={text}
                aria-sort={
                  sort !== null && sort === (view ?? DEFAULT_LIBRARY_VIEW).sort ? view.direction : undefined
                }
              >
                {sort === null ? (
                  text
                ) : (
                  <button type="button" onClick={() => sortLibraryBy(sort)}>
                    {text}
                  </button>
                )}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.map((r) => (
            <Row key={r.cell} row={r} current={r.cell === openName} />
          ))}
        </tbody>
      </table>
      <p className="rw-lib-note">
        Switch-level check of each cell on its own, every input vector from an unknown state; a found function
        is read off that sweep.
      </p>
    </Dialog>
  );
}
