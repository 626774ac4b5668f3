import { useMemo, useState } from 'react';
import type { Finding, VectorReport } from '../core/analysis/report.ts';
import { formatCurrent, formatPower } from '../core/view/format.ts';
import { chainText, splitChain } from '../core/view/highlight.ts';
import { detailOf } from '../core/analysis/sweepColumns.ts';
import { rowOfVector } from '../core/view/vectorTable.ts';
import { stepVector, toggleInput, useSimulation, type SimulationState } from '../state/simulation.ts';
import { useStore } from '../state/store.ts';
import { usableExpectations } from '../core/expect/problems.ts';
import { appSweepLimit } from '../worker/protocol.ts';
import { FindingList } from './FindingList.tsx';
import { InputStrip } from './InputStrip.tsx';
import { NetList } from './NetList.tsx';
import { pickFinding, pickNet, pickTargets } from './pick.ts';
import { Section } from './Section.tsx';
import { Legend } from './Legend.tsx';
import { VectorDcFigures } from './VectorDcFigures.tsx';

/** The picked sequence step's report, if a step is picked. */
function shownStep(s: SimulationState): VectorReport | null {
  return s.selectedStep === null ? null : (s.sequence.result?.report.steps?.[s.selectedStep] ?? null);
}

/** The sweep row behind what the sheet shows: the picked row, else the row of the shown vector. */
function shownRow(s: SimulationState): number | null {
  const sweep = s.sweep.result?.report.sweep;
  if (sweep === undefined || s.sweep.status !== 'done') return null;
  return s.selectedRow ?? rowOfVector(sweep, s.vector);
}

/**
 * The findings of what the sheet shows: the picked step's, else its sweep row's, else, for a cell
 * too wide to sweep, the shown vector's own (docs/semantics.md §7). Null: none yet.
 */
function useShownFindings(): readonly Finding[] | null {
  const step = useSimulation(shownStep);
  const sweep = useSimulation((s) => (s.sweep.status === 'done' ? s.sweep.result?.report.sweep : undefined));
  const row = useSimulation((s) => (s.selectedStep === null ? shownRow(s) : null));
  const wide = useWideCellFindings();
  return useMemo(() => {
    if (step !== null) return step.findings;
    if (wide !== null) return wide;
    if (sweep === undefined || row === null) return null;
    return detailOf(sweep, row)?.findings ?? [];
  }, [step, sweep, row, wide]);
}

/** Past the page's sweep limit: the live vector's findings, expected functions included; else null. */
function useWideCellFindings(): readonly Finding[] | null {
  const session = useSimulation((s) => s.session);
  const live = useSimulation((s) => s.live);
  const undriven = useSimulation((s) => s.undrivenInputs);
  const given = useStore((s) => s.design.expectations);
  return useMemo(() => {
    if (session === null || live === null) return null;
    if (session.netlist.inputs.length <= appSweepLimit(undriven)) return null;
    return session.findingsOfLast(usableExpectations(session.netlist, given).expectations);
  }, [session, live, undriven, given]);
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
  const findings = useShownFindings();
  const status = useSimulation((s) => s.sweep.status);
  if (findings === null) {
    const why =
      status === 'running'
        ? 'Checking…'
        : 'Findings appear once every vector is checked (see the table below).';
    return <p className="rw-muted">{why}</p>;
  }
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
