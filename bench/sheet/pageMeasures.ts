/**
 * What the browser benchmark measures inside the page. Each function runs in the page through
 * Playwright's `evaluate`, so it may only use what it is given and `window.__railwise`, and it
 * declares no named inner functions (the TypeScript loader would wrap them in a helper the page
 * does not have).
 * A frame is timed from the change to the rasterised canvas (see `frame` in src/app/testApi.ts).
 */
import type { Page } from '@playwright/test';

/** Milliseconds of each of `frames` pan steps, then of as many zoom steps (in, then back out). */
export async function panZoomFrames(page: Page, frames: number): Promise<{ pan: number[]; zoom: number[] }> {
  return page.evaluate((n) => {
    const api = window.__railwise!;
    const start = api.state().viewport;
    const { width, height } = api.state().screen;
    const pan: number[] = [];
    const zoom: number[] = [];
    let v = start;
    for (let i = 0; i < 2 * n; i++) {
      if (i < n) v = { ...v, x: v.x - 12 };
      else {
        const scale = v.scale * (i < 1.5 * n ? 1.08 : 1 / 1.08);
        const [cx, cy] = [width / 2, height / 2];
        v = { scale, x: cx - ((cx - v.x) / v.scale) * scale, y: cy - ((cy - v.y) / v.scale) * scale };
      }
      const next = v;
      const t0 = performance.now();
      api.frame(() => api.setViewport(next));
      (i < n ? pan : zoom).push(performance.now() - t0);
    }
    api.frame(() => api.setViewport(start));
    return { pan, zoom };
  }, frames);
}

/** Milliseconds from flipping the first input to the repainted sheet, `times` times. */
export async function toggleTimes(page: Page, times: number): Promise<number[]> {
  return page.evaluate((n) => {
    const api = window.__railwise!;
    const input = api.state().design.netlist.inputs[0];
    if (input === undefined) return [];
    return Array.from({ length: n }, () => {
      const t0 = performance.now();
      api.frame(() => api.toggleInput(input));
      return performance.now() - t0;
    });
  }, times);
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
