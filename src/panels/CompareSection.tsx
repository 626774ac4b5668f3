import type { ChangeEvent } from 'react';
import { OPEN_FILE_ACCEPT } from '../core/netlist-io/fileKinds.ts';
import { vectorText } from '../core/view/proofView.ts';
import { compareWithCell, compareWithFile, showCounterexample } from '../state/proof.ts';
import { cancelJob, useSimulation } from '../state/simulation.ts';
import { useStore } from '../state/store.ts';
import type { CompareResult } from '../worker/protocol.ts';
import { JobBar } from './JobBar.tsx';
import { Section } from './Section.tsx';

function pickFile(e: ChangeEvent<HTMLInputElement>): void {
  const file = e.target.files?.[0];
  e.target.value = ''; // the same file may be chosen again after an edit
  if (file !== undefined) void file.text().then((text) => compareWithFile(file.name, text));
}

function Choices({ result }: { readonly result: CompareResult }) {
  return (
    <label className="rw-setting">
      {result.file} is a library: compare with{' '}
      <select value="" onChange={(e) => void compareWithCell(e.target.value)} data-testid="compare-cell">
        <option value="">(choose a cell)</option>
        {result.choices.map((name) => (
          <option key={name} value={name}>
            {name}
          </option>
        ))}
      </select>
    </label>
  );
}

function Answer({ result }: { readonly result: CompareResult }) {
  const mine = useStore((s) => s.design.name);
  const c = result.comparison;
  if (result.error !== null)
    return (
      <p className="rw-error-text" role="alert" data-testid="compare-error">
        {result.error}
      </p>
    );
  if (c === null) return <Choices result={result} />;
  const against = `${result.other ?? 'its cell'} of ${result.file}`;
  if (c.equivalent === true)
    return (
      <p className="rw-clean" data-testid="compare-answer">
        ✓ Equivalent to {against}: every output has the same level for every input vector.
      </p>
    );
  if (c.equivalent === null)
    return (
      <p className="rw-muted" data-testid="compare-answer">
        ? Undecided against {against}: {c.reason}
      </p>
    );
  const vector = c.vector ?? {};
  const differing = Object.keys(c.outputs?.a ?? {}).filter((o) => c.outputs?.a[o] !== c.outputs?.b[o]);
  return (
    <div data-testid="compare-answer">
      <p>
        ◆ Differs from {against} at <span className="rw-mono">{vectorText(vector)}</span>{' '}
        <button type="button" data-testid="compare-show" onClick={() => showCounterexample(vector)}>
          Show on sheet
        </button>
      </p>
      <ul className="rw-proof">
        {differing.map((o) => (
          <li key={o} className="rw-proof-row">
            {o}: {c.outputs?.a[o]} in {mine}, {c.outputs?.b[o]} in {result.other}
          </li>
        ))}
      </ul>
    </div>
  );
}

/** The sheet's cell against a cell of a design file or netlist, for every vector (docs/semantics.md §10). */
export function CompareSection() {
  const comparison = useSimulation((s) => s.comparison);
  return (
    <Section
      title="Compare with a cell from a file"
      testId="compare-section"
      open={comparison.status !== 'idle'}
    >
      <p className="rw-muted">
        Proves the two cells give every output the same level for every vector, or finds one where they differ
        (replayed in both). The pins must have the same names.
      </p>
      <label className="rw-setting">
        File <input type="file" accept={OPEN_FILE_ACCEPT} onChange={pickFile} data-testid="compare-file" />
      </label>
      {comparison.status === 'running' && (
        <JobBar label="Comparing" progress={comparison.progress} onCancel={() => cancelJob('compare')} />
      )}
      {comparison.status === 'cancelled' && <p className="rw-muted">Comparison cancelled.</p>}
      {comparison.status === 'failed' && (
        <p className="rw-error-text" role="alert">
          {comparison.error}
        </p>
      )}
      {comparison.status === 'done' && comparison.result !== null && <Answer result={comparison.result} />}
    </Section>
  );
}
