/**
 * The analysis panel mounted in happy-dom with the analysis wiring running and jobs answered
 * in-process at once. Call `usePanelHarness()` once at the top of a test file (which needs
 * `// @vitest-environment happy-dom`), then `mount()` in each test.
 */
import { act } from 'react';
import { createRoot, type Root } from 'react-dom/client';
import { afterEach, beforeEach } from 'vitest';
import { AnalysisPanel } from '../../src/panels/AnalysisPanel.tsx';
import { SWEEP_DEBOUNCE_MS, startAnalysis } from '../../src/state/analysis.ts';
import { resetStore } from '../../src/state/store.ts';
import { runJob } from '../../src/worker/runJob.ts';
import { setJobRunnerFactory } from '../../src/worker/runner.ts';

(globalThis as { IS_REACT_ACT_ENVIRONMENT?: boolean }).IS_REACT_ACT_ENVIRONMENT = true;

let root: Root | null = null;
export let host: HTMLElement;

export const byTestId = (id: string): HTMLElement | null => host.querySelector(`[data-testid="${id}"]`);
export const wait = (ms: number) => new Promise((r) => setTimeout(r, ms));

export async function click(el: Element | null): Promise<void> {
  if (el === null) throw new Error('nothing to click');
  await act(async () => {
    (el as HTMLElement).click();
  });
}

/** Waits past the debounce, so jobs started after an edit have answered. */
export async function pause(): Promise<void> {
  await act(async () => wait(SWEEP_DEBOUNCE_MS + 50));
}

export async function mount(): Promise<void> {
  host = document.createElement('div');
  document.body.append(host);
  const r = createRoot(host);
  root = r;
  await act(async () => r.render(<AnalysisPanel />));
  await pause();
}

export function usePanelHarness(): void {
  let stopAnalysis: () => void = () => {};
  beforeEach(() => {
    resetStore();
    stopAnalysis = startAnalysis();
    setJobRunnerFactory(() => ({ run: (job) => Promise.resolve(runJob(job)), cancel: () => {} }));
  });
  afterEach(async () => {
    stopAnalysis();
    const r = root;
    if (r !== null) await act(async () => r.unmount());
    root = null;
    host?.remove();
  });
}
