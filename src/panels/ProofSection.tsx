import type { PropertyResult } from '../core/proof/decide.ts';
import { findingsAbout } from '../core/proof/properties.ts';
import { propertyTitle, vectorText } from '../core/view/proofView.ts';
import { vectorCountText } from '../core/view/vectorControl.ts';
import { showCounterexample, startProof } from '../state/proof.ts';
import { cancelJob, useSimulation } from '../state/simulation.ts';
import { useStore } from '../state/store.ts';
import { appSweepLimit } from '../worker/protocol.ts';
import { JobBar } from './JobBar.tsx';
import { Section } from './Section.tsx';

/** One property: proved, a counterexample the sheet can show, or undecided with its reason. */
function PropertyRow({ p, index }: { readonly p: PropertyResult; readonly index: number }) {
  const title = propertyTitle(p);
  if (p.holds === true)
    return (
      <li className="rw-proof-row rw-proof-holds" data-testid={`proof-property-${index}`}>
        <span aria-hidden="true">✓</span> {title}: <strong>proved</strong> for every vector
      </li>
    );
  if (p.holds === null)
    return (
      <li className="rw-proof-row rw-proof-unknown" data-testid={`proof-property-${index}`}>
        <span aria-hidden="true">?</span> {title}: <strong>undecided</strong>
        <span className="rw-detail">{p.reason}</span>
      </li>
    );
  const vector = p.vector ?? {};
  const shown = findingsAbout(p, p.findings ?? [])[0] ?? p.findings?.[0];
  return (
    <li className="rw-proof-row rw-proof-fails" data-testid={`proof-property-${index}`}>
      <span aria-hidden="true">◆</span> {title}: <strong>fails</strong> at{' '}
      <span className="rw-mono">{vectorText(vector)}</span>{' '}
      <button type="button" data-testid={`proof-show-${index}`} onClick={() => showCounterexample(vector)}>
        Show on sheet
      </button>
      {shown !== undefined && <span className="rw-detail">{shown.message}</span>}
    </li>
  );
}

function ProofResultView() {
  const result = useSimulation((s) => (s.proof.status === 'done' ? s.proof.result : null));
  if (result === null) return null;
  if (result.report === null)
    return (
      <p className="rw-error-text" role="alert" data-testid="proof-error">
        {result.error}
      </p>
    );
  const { properties, notes } = result.report;
  const held = properties.filter((p) => p.holds === true).length;
  return (
    <>
      <p className="rw-figures" data-testid="proof-summary">
        <strong>{held}</strong> of {properties.length} properties proved · {result.elapsedMs.toFixed(0)} ms
      </p>
      <ul className="rw-proof" data-testid="proof-properties">
        {properties.map((p, i) => (
          <PropertyRow key={`${p.property}.${p.output ?? ''}`} p={p} index={i} />
        ))}
      </ul>
      {notes.map((n) => (
        <p key={n} className="rw-muted">
          ⓘ {n}
        </p>
      ))}
    </>
  );
}

function ProofStatus() {
  const proof = useSimulation((s) => s.proof);
  const inputs = useStore((s) => s.design.netlist.inputs.length);
  if (proof.status === 'running')
    return (
      <JobBar label="Proving every property" progress={proof.progress} onCancel={() => cancelJob('proof')} />
    );
  return (
    <p className="rw-muted">
      {proof.status === 'cancelled' && 'Proof cancelled. '}
      <button type="button" data-testid="proof-start" onClick={() => void startProof()}>
        {proof.status === 'done' ? 'Prove again' : `Prove for all ${vectorCountText(inputs)} vectors`}
      </button>
      {proof.status === 'failed' && (
        <span className="rw-error-text" role="alert">
          {' '}
          {proof.error}
        </span>
      )}
    </p>
  );
}

/**
 * Proofs by SAT over every 0/1 input vector at once (docs/semantics.md §10): offered for any cell,
 * and past the exhaustive limit instead of the table. Cells with feedback are out of scope.
 */
export function ProofSection() {
  const proof = useSimulation((s) => s.proof);
  const undrivenInputs = useSimulation((s) => s.undrivenInputs);
  const pastLimit = useStore((s) => s.design.netlist.inputs.length > appSweepLimit(undrivenInputs));
  const report = proof.status === 'done' ? proof.result?.report : undefined;
  const failing = report?.properties.filter((p) => p.holds !== true).length;
  return (
    <Section
      title="Proof for every vector"
      testId="proof-section"
      open={pastLimit || proof.status !== 'idle'}
      badge={failing === undefined ? undefined : failing === 0 ? '✓' : `${failing} open`}
    >
      <p className="rw-muted">
        Each output against its expected function, and no static current, contention, floating, unknown or
        degraded output, for all input vectors at once. Every counterexample is replayed by the simulator.
        Cells that hold state (latches) are out of scope: check them with sequences.
      </p>
      <ProofStatus />
      <ProofResultView />
    </Section>
  );
}
