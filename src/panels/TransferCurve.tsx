/** The transfer curve's chart, figures, notes and CSV link: loaded with the first curve shown. */
import { useMemo } from 'react';
import { inConvention } from '../core/dc/figures.ts';
import { transferCsv, transferCsvName } from '../core/dc/transferCsv.ts';
import { transferChart } from '../core/view/transferChart.ts';
import { useSimulation } from '../state/simulation.ts';
import { useStore } from '../state/store.ts';
import { TransferChartView } from './TransferChartView.tsx';
import { TransferFigures } from './TransferFigures.tsx';

/** The curve for the current drawing: shown only when the job answered for it (never a stale one). */
export function TransferCurve() {
  const report = useSimulation((s) =>
    s.transfer.status === 'done' ? (s.transfer.result?.report ?? null) : null,
  );
  const view = useSimulation((s) => s.transferView);
  const name = useStore((s) => s.design.name);
  const chart = useMemo(
    () => (report === null ? null : transferChart(report, view.output, view.convention)),
    [report, view],
  );
  const csv = useMemo(() => (report === null ? '' : transferCsv(report)), [report]);
  if (report === null || chart === null) return null;
  const output = chart.curves.find((c) => c.chosen)?.output ?? null;
  const curve = output === null ? undefined : report.curves[output];
  return (
    <>
      <TransferChartView chart={chart} />
      {curve !== undefined && output !== null && (
        <TransferFigures
          output={output}
          figures={inConvention(curve, view.convention)}
          convention={view.convention}
        />
      )}
      {[...report.notes, ...(curve?.notes ?? [])].map((n) => (
        <p key={n} className="rw-muted">
          ⓘ {n}
        </p>
      ))}
      <p className="rw-muted">
        <a
          href={`data:text/csv;charset=utf-8,${encodeURIComponent(csv)}`}
          download={transferCsvName(name, report.input)}
          data-testid="transfer-csv"
        >
          Export the points (CSV)
        </a>{' '}
        · {report.model}
      </p>
    </>
  );
}
