// @vitest-environment happy-dom
/**
 * The panel shows an undecided output (docs/semantics.md §3): the vector table flags `unknown`, the
 * vector's finding list names it, and the legend explains the stored-state mark and the finding.
 */
import { act } from 'react';
import { createRoot, type Root } from 'react-dom/client';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { AnalysisPanel } from '../../src/panels/AnalysisPanel.tsx';
import { Legend } from '../../src/panels/Legend.tsx';
import { SWEEP_DEBOUNCE_MS, startAnalysis } from '../../src/state/analysis.ts';
import { loadDesign, resetStore } from '../../src/state/store.ts';
import { runJob } from '../../src/worker/runJob.ts';
import { setJobRunnerFactory } from '../../src/worker/runner.ts';
import { design, nandLatch } from '../cells.ts';

(globalThis as { IS_REACT_ACT_ENVIRONMENT?: boolean }).IS_REACT_ACT_ENVIRONMENT = true;

let root: Root;
let host: HTMLElement;
const byTestId = (id: string): HTMLElement | null => host.querySelector(`[data-testid="${id}"]`);

async function render(node: React.ReactNode, settle = 0): Promise<void> {
  host = document.createElement('div');
  document.body.append(host);
  root = createRoot(host);
  await act(async () => root.render(node));
  await act(async () => new Promise((r) => setTimeout(r, settle)));
}

let stopAnalysis: () => void;

beforeEach(() => {
  resetStore();
  stopAnalysis = startAnalysis();
  setJobRunnerFactory(() => ({ run: (job) => Promise.resolve(runJob(job)), cancel: () => {} }));
});

afterEach(async () => {
  stopAnalysis();
  await act(async () => root.unmount());
  host.remove();
});

describe('an undecided output in the panel', () => {
  it('a latch holding in the sweep: the row is flagged unknown and its findings say why', async () => {
    loadDesign(design(nandLatch));
    await render(<AnalysisPanel />, SWEEP_DEBOUNCE_MS + 30);
    const row = byTestId('vector-row-3');
    expect(row?.textContent).toContain('unknown');
    await act(async () => row?.click());
    expect(byTestId('vector-findings')?.textContent).toContain(
      'unknown at SN=1 RN=1: Q is X: several steady states on Q, QN',
    );
  });

  it('the legend explains the stored-state mark and the unknown finding', async () => {
    await render(<Legend />);
    expect(host.textContent).toContain('‖ holds stored state: several steady states');
    expect(host.textContent).toContain('An output at X for a 0/1 vector is an unknown finding');
  });
});
