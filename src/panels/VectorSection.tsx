import { useMemo, useState } from 'react';
import type { Finding, VectorReport } from '../core/analysis/report.ts';
import { formatCurrent, formatPower } from '../core/view/format.ts';
import { chainText, splitChain } from '../core/view/highlight.ts';
import { rowOfVector } from '../core/view/vectorTable.ts';
import { stepVector, toggleInput, useSimulation, type SimulationState } from '../state/simulation.ts';
import { useStore } from '../state/store.ts';
import { FindingList } from './FindingList.tsx';
import { InputStrip } from './InputStrip.tsx';
import { NetList } from './NetList.tsx';
import { pickFinding, pickNet, pickTargets } from './pick.ts';
import { Section } from './Section.tsx';
import { Legend } from './Legend.tsx';
import { VectorDcFigures } from './VectorDcFigures.tsx';

/** The report row behind what the sheet shows: the picked sequence step, else the sweep's vector. */
function shownReport(s: SimulationState): VectorReport | null {
  if (s.selectedStep !== null) return s.sequence.result?.report.steps?.[s.selectedStep] ?? null;
  const report = s.sweep.result?.report;
  if (report === undefined || s.sweep.status !== 'done') return null;
  const index = s.selectedRow ?? rowOfVector(report, s.vector);
  return index === null ? null : (report.vectors?.[index] ?? null);
}

function CurrentPaths() {
  const live = useSimulation((s) => s.live);
  if (live === null || live.traces.length === 0) {
    return (
      <p className="rw-clean" data-testid="current-paths">
        ✓ No static current for this vector.
      </p>
    );
  }
  return (
    <ul className="rw-paths" data-testid="current-paths">
      {live.traces.map((t, i) => (
        <li key={i}>
          <button type="button" className="rw-path" onClick={() => pickTargets(splitChain(t.chain))}>
            <span className="rw-path-glyph" aria-hidden="true">
              ⇣
            </span>
            <span className="rw-mono">{chainText(t.chain)}</span>
            <strong data-testid="path-current">{formatCurrent(t.current)}</strong>
          </button>
        </li>
      ))}
    </ul>
  );
}

function VectorFindings() {
  const report = useSimulation(shownReport);
  const status = useSimulation((s) => s.sweep.status);
  if (report === null) {
    const why =
      status === 'running'
        ? 'Checking…'
        : 'Findings appear once every vector is checked (see the table below).';
    return <p className="rw-muted">{why}</p>;
  }
  const findings: readonly Finding[] = report.findings;
  return (
    <FindingList
      findings={findings}
      onPick={pickFinding}
      empty="No findings for this vector."
      testId="vector-findings"
    />
  );
}

/** Every net's level and voltage, built only while unfolded: a big sheet has thousands of nets. */
function EveryNet() {
  const live = useSimulation((s) => s.live);
  const [open, setOpen] = useState(false);
  const nets = useMemo(
    () =>
      live === null || !open
        ? []
        : live.netNames.flatMap((n) => {
            const state = live.net(n);
            return state === undefined ? [] : [[n, state] as const];
          }),
    [live, open],
  );
  return (
    <details
      className="rw-subsection"
      data-testid="every-net"
      onToggle={(e) => setOpen(e.currentTarget.open)}
    >
      <summary>Every net ({live?.netNames.length ?? 0})</summary>
      {open && <NetList nets={nets} onPick={pickNet} />}
    </details>
  );
}

/** The selected vector: its inputs, the sheet's levels, current paths and findings. */
export function VectorSection() {
  const inputs = useStore((s) => s.design.netlist.inputs);
  const vector = useSimulation((s) => s.vector);
  const live = useSimulation((s) => s.live);
  const liveError = useSimulation((s) => s.liveError);
  return (
    <Section title="Vector" testId="vector-section">
      <InputStrip inputs={inputs} vector={vector} onToggle={toggleInput} onStep={stepVector} />
      {liveError !== null && (
        <p className="rw-error-text" role="alert">
          Cannot solve this sheet: {liveError}
        </p>
      )}
      {live !== null && (
        <p className="rw-figures" data-testid="vector-figures">
          Supply current <strong data-testid="supply-current">{formatCurrent(live.supplyCurrent)}</strong> ·
          static power <strong data-testid="static-power">{formatPower(live.staticPower)}</strong>
        </p>
      )}
      <VectorDcFigures />
      <h4>Static current paths</h4>
      <CurrentPaths />
      <h4>Findings</h4>
      <VectorFindings />
      <EveryNet />
      <Legend />
    </Section>
  );
}
