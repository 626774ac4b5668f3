/**
 * What the browser benchmark measures inside the page. Each batch runs in the page through
 * Playwright's `evaluate`, so it may only use what it is given and `window.__railwise`, and it
 * declares no named inner functions (the TypeScript loader would wrap them in a helper the page
 * does not have). Each step's wall time is taken in the page, from the change to the rasterised
 * canvas (see `frame` in src/app/testApi.ts); the CPU time of the page's renderer process is read
 * from the browser's own counter around the whole batch (it ticks in 10 ms steps, too coarse for
 * one frame), and given per step.
 */
import { writeFileSync } from 'node:fs';
import type { CDPSession, Page } from '@playwright/test';

export interface Batch {
  /** Wall milliseconds of each step. */
  readonly wallMs: readonly number[];
  /** Renderer CPU milliseconds per step, over the batch. */
  readonly cpuMsPerStep: number;
}

interface View {
  readonly x: number;
  readonly y: number;
  readonly scale: number;
}

export async function processCpuMs(cdp: CDPSession): Promise<number> {
  const { metrics } = await cdp.send('Performance.getMetrics');
  return 1000 * (metrics.find((m) => m.name === 'ProcessTime')?.value ?? Number.NaN);
}

async function batch(cdp: CDPSession, run: () => Promise<number[]>): Promise<Batch> {
  const before = await processCpuMs(cdp);
  const wallMs = await run();
  return { wallMs, cpuMsPerStep: ((await processCpuMs(cdp)) - before) / Math.max(wallMs.length, 1) };
}

/** Views for `frames` pan steps (12 px each) from `start`, then as many zoom steps in and back out. */
function panZoomViews(start: View, screen: { width: number; height: number }, frames: number): View[] {
  const views: View[] = [];
  let v = start;
  for (let i = 0; i < 2 * frames; i++) {
    if (i < frames) v = { ...v, x: v.x - 12 };
    else {
      const scale = v.scale * (i < 1.5 * frames ? 1.08 : 1 / 1.08);
      const [cx, cy] = [screen.width / 2, screen.height / 2];
      v = { scale, x: cx - ((cx - v.x) / v.scale) * scale, y: cy - ((cy - v.y) / v.scale) * scale };
    }
    views.push(v);
  }
  return views;
}

/** One frame per view, each timed from the change of view to the rasterised canvas. */
function framesOf(page: Page, views: readonly View[]): Promise<number[]> {
  return page.evaluate((list) => {
    const api = window.__railwise!;
    return list.map((v) => {
      const t0 = performance.now();
      api.frame(() => api.setViewport(v));
      return performance.now() - t0;
    });
  }, views);
}

export async function panZoomFrames(
  page: Page,
  cdp: CDPSession,
  frames: number,
): Promise<{ pan: Batch; zoom: Batch }> {
  const { start, screen } = await page.evaluate(() => {
    const s = window.__railwise!.state();
    return { start: s.viewport, screen: s.screen };
  });
  const views = panZoomViews(start, screen, frames);
  const pan = await batch(cdp, () => framesOf(page, views.slice(0, frames)));
  const zoom = await batch(cdp, () => framesOf(page, views.slice(frames)));
  await framesOf(page, [start]);
  return { pan, zoom };
}

/** From flipping the first input to the repainted sheet, `times` times. */
export async function toggleTimes(page: Page, cdp: CDPSession, times: number): Promise<Batch> {
  return batch(cdp, () =>
    page.evaluate((n) => {
      const api = window.__railwise!;
      const input = api.state().design.netlist.inputs[0];
      if (input === undefined) return [];
      return Array.from({ length: n }, () => {
        const t0 = performance.now();
        api.frame(() => api.toggleInput(input));
        return performance.now() - t0;
      });
    }, times),
  );
}

/** Waits until the page shows the cell `cell`, settled; returns the page's clock at that moment (ms). */
export async function settledAt(page: Page, cell: string, timeoutMs = 180_000): Promise<number> {
  const handle = await page.waitForFunction(
    (name) => {
      const api = window.__railwise;
      return api?.state().design.name === name && api.settled() ? performance.now() : false;
    },
    cell,
    { polling: 'raf', timeout: timeoutMs },
  );
  return (await handle.jsonValue()) as number;
}

/** Marks the page's clock when the file input next changes: the start of an import. */
export async function markImportStart(page: Page): Promise<void> {
  await page.evaluate(() => {
    const input = document.querySelector('[data-testid="open-file"]');
    input?.addEventListener(
      'change',
      () => ((window as { importStart?: number }).importStart = performance.now()),
      {
        capture: true,
        once: true,
      },
    );
  });
}

export async function importStart(page: Page): Promise<number> {
  return page.evaluate(() => (window as { importStart?: number }).importStart ?? Number.NaN);
}

/**
 * Runs `step` under the page's CPU profiler when `file` is given and writes the profile there (a
 * `.cpuprofile` to open in a browser's developer tools); otherwise just runs it. A profiled step
 * carries the profiler's own cost.
 */
export async function profiled<T>(cdp: CDPSession, file: string | null, step: () => Promise<T>): Promise<T> {
  if (file === null) return step();
  await cdp.send('Profiler.enable');
  await cdp.send('Profiler.start');
  const result = await step();
  const { profile } = await cdp.send('Profiler.stop');
  writeFileSync(file, JSON.stringify(profile));
  return result;
}
