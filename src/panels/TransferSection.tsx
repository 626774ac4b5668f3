import { lazy, Suspense } from 'react';
import { MARGIN_CONVENTIONS, type MarginConvention } from '../core/dc/figures.ts';
import type { TransferReport } from '../core/dc/transfer.ts';
import {
  openTransfer,
  setTransferConvention,
  setTransferHold,
  setTransferInput,
  setTransferOutput,
  startTransfer,
} from '../state/dc.ts';
import { cancelJob, useSimulation } from '../state/simulation.ts';
import { useStore } from '../state/store.ts';
import { JobBar } from './JobBar.tsx';
import { Section } from './Section.tsx';

// The chart and its figures load when the section is first opened: most sessions never ask for one.
const loadCurve = () => import('./TransferCurve.tsx');
const TransferCurve = lazy(() => loadCurve().then((m) => ({ default: m.TransferCurve })));

/** The conventions in a few words, and the books that use each (docs/semantics.md §2). */
export const CONVENTION_LABELS: Readonly<Record<MarginConvention, { label: string; books: string }>> = {
  'unity-gain': { label: 'at the unity-gain points', books: 'as Weste & Harris read them' },
  rails: { label: 'with the input at a rail', books: 'as Sedra & Smith and Rabaey et al. read them' },
};

/** Which input sweeps and what the others hold: "chosen" lets Railwise pick a sensitising value. */
function Request({ report }: { readonly report: TransferReport | null }) {
  const inputs = useStore((s) => s.design.netlist.inputs);
  const request = useSimulation((s) => s.transferRequest);
  if (request === null) return null;
  const swept = inputs.includes(request.input) ? request.input : '';
  return (
    <div className="rw-transfer-request">
      <label className="rw-setting">
        Sweep{' '}
        <select value={swept} onChange={(e) => setTransferInput(e.target.value)} data-testid="transfer-input">
          {swept === '' && <option value="">(choose)</option>}
          {inputs.map((n) => (
            <option key={n} value={n}>
              {n}
            </option>
          ))}
        </select>{' '}
        from 0 to VDD
      </label>
      {inputs
        .filter((n) => n !== swept)
        .map((n) => {
          const held = request.hold[n];
          const chosen = report?.holdChosen.includes(n) ? report.hold[n] : undefined;
          return (
            <label key={n} className="rw-setting">
              {n}{' '}
              <select
                value={held ?? 'auto'}
                onChange={(e) =>
                  setTransferHold(n, e.target.value === 'auto' ? null : (e.target.value as '0' | '1'))
                }
                data-testid={`transfer-hold-${n}`}
              >
                <option value="auto">chosen{chosen === undefined ? '' : ` (${chosen})`}</option>
                <option value="0">held at 0</option>
                <option value="1">held at 1</option>
              </select>
            </label>
          );
        })}
    </div>
  );
}

function ViewChoice({ outputs }: { readonly outputs: readonly string[] }) {
  const view = useSimulation((s) => s.transferView);
  return (
    <div className="rw-transfer-request">
      <label className="rw-setting">
        VOL and VOH read{' '}
        <select
          value={view.convention}
          onChange={(e) => setTransferConvention(e.target.value as MarginConvention)}
          data-testid="transfer-convention"
        >
          {MARGIN_CONVENTIONS.map((c) => (
            <option key={c} value={c} title={CONVENTION_LABELS[c].books}>
              {CONVENTION_LABELS[c].label}
            </option>
          ))}
        </select>
      </label>
      {outputs.length > 1 && (
        <label className="rw-setting">
          Figures of{' '}
          <select value={view.output ?? outputs[0]} onChange={(e) => setTransferOutput(e.target.value)}>
            {outputs.map((o) => (
              <option key={o} value={o}>
                {o}
              </option>
            ))}
          </select>
        </label>
      )}
    </div>
  );
}

function Status() {
  const transfer = useSimulation((s) => s.transfer);
  const asked = useSimulation((s) => s.transferRequest !== null);
  const noInputs = useStore((s) => s.design.netlist.inputs.length === 0);
  if (noInputs) return <p className="rw-muted">This cell has no input to sweep.</p>;
  switch (transfer.status) {
    case 'running':
      return (
        <JobBar
          label="Solving the curve"
          progress={transfer.progress}
          onCancel={() => cancelJob('transfer')}
        />
      );
    case 'idle':
      return asked ? <p className="rw-muted">Drawing the curve for the current drawing…</p> : null;
    case 'cancelled':
      return (
        <p className="rw-muted" data-testid="transfer-cancelled">
          Curve cancelled.{' '}
          <button type="button" onClick={() => void startTransfer()}>
            Draw it
          </button>
        </p>
      );
    case 'failed':
      return (
        <p className="rw-error-text" role="alert">
          {transfer.error}
        </p>
      );
    case 'done':
      return transfer.result?.error ? (
        <p className="rw-error-text" role="alert" data-testid="transfer-error">
          {transfer.result.error}
        </p>
      ) : null;
  }
}

/** The level-1 DC transfer curve: Vout against one input, with the switching threshold and margins. */
export function TransferSection() {
  const report = useSimulation((s) =>
    s.transfer.status === 'done' ? (s.transfer.result?.report ?? null) : null,
  );
  const outputs = useStore((s) => s.design.netlist.outputs);
  return (
    <Section
      title="DC transfer curve"
      testId="transfer-section"
      open={false}
      onToggle={(open) => {
        if (!open) return;
        openTransfer();
        void loadCurve();
      }}
      badge={report === null ? undefined : vmBadge(report)}
    >
      <Request report={report} />
      <ViewChoice outputs={outputs} />
      <Status />
      {report !== null && (
        <Suspense fallback={null}>
          <TransferCurve />
        </Suspense>
      )}
    </Section>
  );
}

function vmBadge(report: TransferReport): string | undefined {
  const vm = Object.values(report.curves).find((c) => c.vm !== null)?.vm;
  return vm === undefined || vm === null ? undefined : `VM ${vm.toFixed(2)} V`;
}
