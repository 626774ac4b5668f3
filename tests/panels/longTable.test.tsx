// @vitest-environment happy-dom
// Behaviour of our own panel, not published values: no source applies.
import { act } from 'react';
import { describe, expect, it } from 'vitest';
import { circuit } from '../../src/core/model/builder.ts';
import { ROW_HEIGHT_PX } from '../../src/core/view/tableWindow.ts';
import { startSweep } from '../../src/state/simulation.ts';
import { loadDesign, store } from '../../src/state/store.ts';
import { design } from '../cells.ts';
import { byTestId, click, host, mount, usePanelHarness } from './panelHarness.tsx';

usePanelHarness();

/** Eleven inverters: 2,048 vectors, more than is checked without a click. */
function inverters(n: number) {
  let b = circuit(`inv${n}`).rails();
  for (let i = 0; i < n; i++) {
    b = b
      .input(`A${i}`)
      .output(`Y${i}`)
      .pmos(`P${i}`, { g: `A${i}`, d: `Y${i}`, s: 'VDD', w: 2 })
      .nmos(`N${i}`, { g: `A${i}`, d: `Y${i}`, s: 'GND' });
  }
  return b.build();
}

const shownRows = (): number[] =>
  [...host.querySelectorAll('[data-testid^="vector-row-"]')].map((r) =>
    Number(r.getAttribute('data-testid')?.slice('vector-row-'.length)),
  );

describe('a long vector table', () => {
  it('puts only the rows in view in the page, and the rows scrolled to when it scrolls', async () => {
    loadDesign(design(inverters(11)));
    await mount();
    await act(async () => startSweep());
    expect(store.getState().simulation.sweep.status).toBe('done');
    const first = shownRows();
    expect(first[0]).toBe(0);
    expect(first.length).toBeLessThan(60);
    const scroller = byTestId('vector-table-scroll') as HTMLElement;
    await act(async () => {
      scroller.scrollTop = 1500 * ROW_HEIGHT_PX;
      scroller.dispatchEvent(new Event('scroll'));
    });
    const later = shownRows();
    expect(later).toContain(1500);
    expect(later.length).toBeLessThan(60);
    // A row far down selects its vector: 1500 = 0b10111011100, the first input most significant.
    await click(host.querySelector('[data-testid="vector-row-1500"]'));
    expect(store.getState().simulation.vector).toMatchObject({ A0: '1', A1: '0', A2: '1', A10: '0' });
  });
});
