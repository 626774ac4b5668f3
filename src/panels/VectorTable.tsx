import { useMemo, useState } from 'react';
import type { FindingKind, Level } from '../core/analysis/report.ts';
import { lookOf } from '../core/view/visualLanguage.ts';
import { countOf } from '../core/view/plural.ts';
import { formatCurrent, formatPower } from '../core/view/format.ts';
import type { RowFilter, SortDirection, SortKey, TableView, VectorRow } from '../core/view/vectorTable.ts';
import { visibleRows, ROW_HEIGHT_PX, TABLE_HEIGHT_PX } from '../core/view/tableWindow.ts';

interface VectorTableProps {
  readonly inputs: readonly string[];
  readonly outputs: readonly string[];
  /** The rows to show, filtered and sorted, as positions in the sweep. */
  readonly order: Int32Array;
  /** Builds the row at a position in the sweep: called only for the rows on screen. */
  readonly rowAt: (index: number) => VectorRow;
  readonly total: number;
  readonly counts: ReadonlyMap<FindingKind, number>;
  readonly view: TableView;
  readonly selected: number | null;
  readonly onView: (view: TableView) => void;
  readonly onSelect: (index: number) => void;
}

function SortHeader({
  label,
  sortKey,
  view,
  onView,
}: { label: string; sortKey: SortKey } & Pick<VectorTableProps, 'view' | 'onView'>) {
  const active = view.sort === sortKey;
  const next: SortDirection = active && view.direction === 'ascending' ? 'descending' : 'ascending';
  const arrow = active ? (view.direction === 'ascending' ? ' ▲' : ' ▼') : '';
  return (
    <th aria-sort={active ? view.direction : 'none'}>
      <button type="button" onClick={() => onView({ ...view, sort: sortKey, direction: next })}>
        {label}
        {arrow}
      </button>
    </th>
  );
}

function FilterChoice({
  view,
  onView,
  counts,
  total,
}: Pick<VectorTableProps, 'view' | 'onView' | 'counts' | 'total'>) {
  return (
    <label className="rw-filter">
      Show{' '}
      <select
        data-testid="table-filter"
        value={view.filter}
        onChange={(e) => onView({ ...view, filter: e.target.value as RowFilter })}
      >
        <option value="all">all {countOf(total, 'vector')}</option>
        <option value="problems">problem vectors{counts.size === 0 ? ' (none)' : ''}</option>
        <option value="errors">vectors with errors</option>
        {[...counts].map(([kind, n]) => (
          <option key={kind} value={kind}>
            {kind} ({n})
          </option>
        ))}
      </select>
    </label>
  );
}

/**
 * An output's level as the sheet marks it: a degraded level carries its arrow in the cell itself
 * ("1↓" a high one threshold short of VDD, "0↑" a low one above ground), not only in the flags.
 */
function LevelText({ level, degraded }: { level: Level | undefined; degraded: boolean }) {
  if (level === undefined) return <>?</>;
  if (!degraded) return <>{level}</>;
  const look = lookOf({ level, degraded });
  return (
    <span className="rw-degraded" title={`degraded: ${look.description}`}>
      {look.mark}
    </span>
  );
}

function RowView({
  row,
  inputs,
  outputs,
  selected,
  onSelect,
}: { row: VectorRow; selected: boolean } & Pick<VectorTableProps, 'inputs' | 'outputs' | 'onSelect'>) {
  return (
    <tr
      data-testid={`vector-row-${row.index}`}
      className={selected ? 'rw-selected' : undefined}
      aria-selected={selected}
      onClick={() => onSelect(row.index)}
    >
      <td>{row.index + 1}</td>
      <td className="rw-mono">{inputs.map((n) => row.inputs[n] ?? '·').join('')}</td>
      {outputs.map((o) => (
        <td
          key={o}
          className={`rw-mono rw-level-${row.outputs[o] ?? 'X'}`}
          data-testid={`level-${row.index}-${o}`}
        >
          <LevelText level={row.outputs[o]} degraded={row.degraded.includes(o)} />
          {row.mismatched.includes(o) && (
            <span className="rw-mismatch" title="differs from the expected function">
              ≠
            </span>
          )}
        </td>
      ))}
      <td className="rw-flags">{row.kinds.join(', ')}</td>
      <td className="rw-num">{row.supplyCurrent === 0 ? '—' : formatCurrent(row.supplyCurrent)}</td>
      <td className="rw-num">{row.staticPower === 0 ? '—' : formatPower(row.staticPower)}</td>
    </tr>
  );
}

/** A row of the height of `count` table rows: stands in for the rows scrolled out of view. */
function Spacer({ count, columns }: { count: number; columns: number }) {
  if (count <= 0) return null;
  return (
    <tr aria-hidden="true" className="rw-spacer" style={{ height: count * ROW_HEIGHT_PX }}>
      <td colSpan={columns} />
    </tr>
  );
}

/**
 * Every vector at a glance; click a header to sort, a row to select that vector. However many rows
 * there are, only those in view (and a few either side) are in the page: the rest are spacers of
 * their height, so scrolling reaches every row.
 */
export function VectorTable(props: VectorTableProps) {
  const { inputs, outputs, order, rowAt, view, onView, selected, onSelect } = props;
  const [scrollTop, setScrollTop] = useState(0);
  const shown = visibleRows(order.length, scrollTop);
  const rows = useMemo(
    () => Array.from(order.subarray(shown.start, shown.end), (i) => rowAt(i)),
    [order, rowAt, shown.start, shown.end],
  );
  const columns = outputs.length + 5;
  return (
    <>
      <FilterChoice view={view} onView={onView} counts={props.counts} total={props.total} />
      <div
        className="rw-table-wrap"
        data-testid="vector-table-scroll"
        style={{ maxHeight: TABLE_HEIGHT_PX }}
        onScroll={(e) => setScrollTop(e.currentTarget.scrollTop)}
      >
        <table className="rw-vectors" data-testid="vector-table" aria-rowcount={order.length + 1}>
          <thead>
            <tr>
              <SortHeader label="#" sortKey="vector" view={view} onView={onView} />
              <th>{inputs.join(' ')}</th>
              {outputs.map((o) => (
                <SortHeader key={o} label={o} sortKey={`output:${o}`} view={view} onView={onView} />
              ))}
              <SortHeader label="flags" sortKey="severity" view={view} onView={onView} />
              <SortHeader label="I supply" sortKey="supplyCurrent" view={view} onView={onView} />
              <SortHeader label="P static" sortKey="staticPower" view={view} onView={onView} />
            </tr>
          </thead>
          <tbody>
            <Spacer count={shown.start} columns={columns} />
            {rows.map((row) => (
              <RowView
                key={row.index}
                row={row}
                inputs={inputs}
                outputs={outputs}
                selected={row.index === selected}
                onSelect={onSelect}
              />
            ))}
            <Spacer count={order.length - shown.end} columns={columns} />
          </tbody>
        </table>
      </div>
      {order.length === 0 && (
        <p className="rw-clean" data-testid="table-empty">
          ✓ No vector matches this filter.
        </p>
      )}
    </>
  );
}
