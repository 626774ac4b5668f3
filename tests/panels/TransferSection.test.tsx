// @vitest-environment happy-dom
/**
 * The DC views of the analysis panel in happy-dom, with jobs run in-process: the transfer curve
 * (opened, drawn, its convention switched, its points offered as CSV) and the shown vector's
 * level-1 answer beside the switch-level estimate.
 */
import { act } from 'react';
import { describe, expect, it } from 'vitest';
import { loadDesign } from '../../src/state/store.ts';
import { design, inverter, resistorLoadInverter } from '../cells.ts';
import { byTestId, click, mount, pause, usePanelHarness } from './panelHarness.tsx';

usePanelHarness();

async function choose(id: string, value: string): Promise<void> {
  const select = byTestId(id) as HTMLSelectElement;
  await act(async () => {
    select.value = value;
    select.dispatchEvent(new Event('change', { bubbles: true }));
  });
}

async function openTransferSection(): Promise<void> {
  const details = byTestId('transfer-section') as HTMLDetailsElement;
  await act(async () => {
    details.open = true;
    details.dispatchEvent(new Event('toggle'));
  });
  // The chart's code loads when the section opens (src/panels/TransferSection.tsx).
  await act(async () => {
    await import('../../src/panels/TransferCurve.tsx');
  });
  await pause();
}

describe('the DC transfer curve view', () => {
  it('draws the curve with its figures once opened, and switches the convention', async () => {
    loadDesign(design(inverter));
    await mount();
    expect(byTestId('transfer-chart')).toBeNull();
    await openTransferSection();
    expect(byTestId('transfer-chart')?.getAttribute('aria-label')).toMatch(/VM \d\.\d\d V/);
    expect(byTestId('curve-Y')?.getAttribute('d')).toMatch(/^M/);
    for (const f of ['vm', 'vil', 'vih', 'vol', 'voh', 'nml', 'nmh'])
      expect(byTestId(`mark-${f}`)).not.toBeNull();
    expect(byTestId('figure-vm')?.textContent).toMatch(/^1\.\d{3} V$/);
    // With the input at the rails, a static CMOS inverter's VOL is 0 V (docs/semantics.md §2).
    await choose('transfer-convention', 'rails');
    expect(byTestId('figure-vol')?.textContent).toBe('0.000 V');
    const csv = byTestId('transfer-csv') as HTMLAnchorElement;
    expect(csv.getAttribute('download')).toBe('inv-transfer-A.csv');
    const text = decodeURIComponent(csv.href.replace(/^data:text\/csv;charset=utf-8,/, ''));
    // 201 points and a header; at Vin = 0 the output sits at VDD, less what GMIN draws (1 pS).
    expect(text.split('\r\n')).toHaveLength(203);
    expect(text).toMatch(/^V\(A\) \[V\],V\(Y\) \[V\]\r\n0,2\.4999999\d*\r\n/);
  });
});

describe("the shown vector's level-1 answer", () => {
  it('stands beside the switch-level estimate, marked where they differ', async () => {
    loadDesign(design(resistorLoadInverter));
    await mount();
    await click(byTestId('bit-A'));
    await pause();
    const row = byTestId('vector-dc-Y');
    expect(row?.textContent).toMatch(/^Y0 · \d\.\d\d V\d\.\d\d V/);
    expect(byTestId('vector-dc-current')?.textContent).toMatch(/supply current\d+\.?\d* µA\d+\.?\d* µA/);
  });
});
