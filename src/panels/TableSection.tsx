import { useCallback, useMemo } from 'react';
import { countOf } from '../core/view/plural.ts';
import { summaryBadge, summaryLine } from '../core/view/summary.ts';
import { PROGRESS_THRESHOLD_VECTORS, appSweepLimit, jobSize } from '../worker/protocol.ts';
import type { SweepColumns } from '../core/analysis/report.ts';
import { arrangeRows, kindCounts, vectorRow } from '../core/view/vectorTable.ts';
import { AUTO_SWEEP_VECTORS } from '../state/analysis.ts';
import { startProof } from '../state/proof.ts';
import { useStore } from '../state/store.ts';
import {
  cancelJob,
  selectRow,
  setTableView,
  setUndrivenInputs,
  startSweep,
  useSimulation,
} from '../state/simulation.ts';
import { JobBar } from './JobBar.tsx';
import { Section } from './Section.tsx';
import { VectorTable } from './VectorTable.tsx';

function SweepStatus() {
  const sweep = useSimulation((s) => s.sweep);
  const design = useStore((s) => s.design);
  const undrivenInputs = useSimulation((s) => s.undrivenInputs);
  const size = jobSize({ kind: 'sweep', revision: 0, cell: design, undrivenInputs });
  const limit = appSweepLimit(undrivenInputs);
  if (design.netlist.inputs.length > limit) {
    return (
      <p className="rw-muted" data-testid="sweep-limit">
        {countOf(design.netlist.inputs.length, 'input')}: more than the {limit} the page checks exhaustively.
        The shown vector is still checked (its findings are above).{' '}
        <button type="button" data-testid="sweep-limit-prove" onClick={() => void startProof()}>
          Prove it for every vector
        </button>{' '}
        instead (see the proof below), check chosen vectors with sequences, or sweep the whole cell with{' '}
        <code>railwise check --max-inputs</code> (up to 24 inputs).
      </p>
    );
  }
  if (sweep.status === 'running' && sweep.long) {
    return (
      <JobBar
        label={`Checking ${countOf(sweep.progress.total, 'vector')}`}
        progress={sweep.progress}
        onCancel={() => cancelJob('sweep')}
      />
    );
  }
  if (sweep.status === 'running') return <p className="rw-muted">Checking {countOf(size, 'vector')}…</p>;
  const start = (
    <button type="button" data-testid="sweep-start" onClick={() => void startSweep()}>
      Check {size === 1 ? 'the' : 'all'} {countOf(size, 'vector')}
    </button>
  );
  switch (sweep.status) {
    case 'idle':
      return (
        <p className="rw-muted">
          {size > AUTO_SWEEP_VECTORS ? `${countOf(size, 'vector')}: checked on request. ` : ''}
          {start}
          {size > PROGRESS_THRESHOLD_VECTORS ? ' (runs in the background; you can cancel)' : ''}
        </p>
      );
    case 'cancelled':
      return (
        <p className="rw-muted" data-testid="sweep-cancelled">
          Check cancelled. {start}
        </p>
      );
    case 'failed':
      return (
        <p className="rw-error-text" role="alert" data-testid="sweep-error">
          {sweep.error}
        </p>
      );
    case 'done':
      return null;
  }
}

function SweepTable() {
  const result = useSimulation((s) => (s.sweep.status === 'done' ? s.sweep.result : null));
  const view = useSimulation((s) => s.table);
  const selected = useSimulation((s) => s.selectedRow);
  const sweep = result?.report.sweep;
  const order = useMemo(
    () => (sweep === undefined ? new Int32Array(0) : arrangeRows(sweep, view)),
    [sweep, view],
  );
  const counts = useMemo(() => (sweep === undefined ? new Map() : kindCounts(sweep)), [sweep]);
  const rowAt = useCallback((i: number) => vectorRow(sweep as SweepColumns, i), [sweep]);
  if (result === null || sweep === undefined) return null;
  const { report } = result;
  return (
    <>
      <p className="rw-figures" data-testid="sweep-summary">
        {summaryLine(report.summary)} · {result.elapsedMs.toFixed(0)} ms
      </p>
      {report.notes.map((n) => (
        <p key={n} className="rw-muted">
          ⓘ {n}
        </p>
      ))}
      <VectorTable
        inputs={report.inputs}
        outputs={report.outputs}
        order={order}
        rowAt={rowAt}
        total={sweep.count}
        counts={counts}
        view={view}
        selected={selected}
        onView={setTableView}
        onSelect={selectRow}
      />
    </>
  );
}

function UndrivenChoice() {
  const undrivenInputs = useSimulation((s) => s.undrivenInputs);
  return (
    <label className="rw-setting" title="Adds Z as a third value of every input: 3^n vectors">
      <input type="checkbox" checked={undrivenInputs} onChange={(e) => setUndrivenInputs(e.target.checked)} />{' '}
      also leave each input undriven (Z)
    </label>
  );
}

/** Every vector: sweep status, the sortable, filterable table; a row click selects that vector. */
export function TableSection() {
  const summary = useSimulation((s) =>
    s.sweep.status === 'done' ? s.sweep.result?.report.summary : undefined,
  );
  return (
    <Section
      title="Every vector"
      testId="table-section"
      badge={summary === undefined ? undefined : summaryBadge(summary)}
    >
      <UndrivenChoice />
      <SweepStatus />
      <SweepTable />
    </Section>
  );
}
