// @vitest-environment happy-dom
import { act } from 'react';
import { describe, expect, it } from 'vitest';
import { loadDesign, store } from '../../src/state/store.ts';
import { design, nand2MissingPullUp, resistorLoadInverter } from '../cells.ts';
import { byTestId, click, host, mount, usePanelHarness } from './panelHarness.tsx';

usePanelHarness();

describe('analysis panel', () => {
  // Resistor-load inverter, A = 1: 2.5 V / (40 kΩ + 3.25 kΩ) = 57.8 µA (Ohm's law with RCN's Rn = 13 kΩ
  // at W/L = 1, table 3.3, from memory).
  it('shows the current of the vector that draws it', async () => {
    loadDesign(design(resistorLoadInverter, { Y: '!A' }));
    await mount();
    expect(byTestId('current-paths')?.textContent).toContain('No static current');
    await click(byTestId('bit-A'));
    expect(byTestId('supply-current')?.textContent).toBe('57.8 µA');
    expect(byTestId('current-paths')?.textContent).toContain('VDD → R1 → Y → N1 → GND');
    expect(byTestId('vector-findings')?.textContent).toContain('static-current');
    // A finding jumps to its devices: highlighted and selected on the sheet.
    await click(byTestId('vector-findings')?.querySelector('button') ?? null);
    const { selection, geometry } = store.getState();
    expect([...selection.highlight.devices].sort()).toEqual(['N1', 'R1']);
    expect(selection.highlight.nets).toEqual(expect.arrayContaining(['VDD', 'Y', 'GND']));
    expect(selection.selected.parts.map((id) => geometry.partDevices[id]).sort()).toEqual(['N1', 'R1']);
  });

  it('filters the table to problem vectors and selects a row', async () => {
    loadDesign(design(nand2MissingPullUp, { Y: '!(A & B)' }));
    await mount();
    const filter = byTestId('table-filter') as HTMLSelectElement;
    await act(async () => {
      filter.value = 'problems';
      filter.dispatchEvent(new Event('change', { bubbles: true }));
    });
    const rows = host.querySelectorAll('[data-testid^="vector-row-"]');
    expect([...rows].map((r) => r.getAttribute('data-testid'))).toEqual(['vector-row-2']);
    await click(rows[0]!);
    expect(byTestId('bit-A')?.textContent).toContain('1');
    expect(byTestId('bit-B')?.textContent).toContain('0');
    const everyNet = byTestId('every-net') as HTMLDetailsElement;
    await act(async () => {
      everyNet.open = true;
      everyNet.dispatchEvent(new Event('toggle'));
    });
    expect(byTestId('net-Y')?.textContent).toContain('Z');
  });

  it('refuses an expected function with a typo, pointing at it, and saves a correct one', async () => {
    loadDesign(design(nand2MissingPullUp));
    await mount();
    const field = byTestId('expect-Y') as HTMLInputElement;
    const type = async (text: string) =>
      act(async () => {
        const setter = Object.getOwnPropertyDescriptor(HTMLInputElement.prototype, 'value')?.set;
        setter?.call(field, text);
        field.dispatchEvent(new Event('input', { bubbles: true }));
        field.dispatchEvent(new KeyboardEvent('keydown', { key: 'Enter', bubbles: true }));
      });
    await type('!(A & Bq)');
    expect(byTestId('expectation-error')?.querySelector('mark')?.textContent).toBe('Bq');
    expect(store.getState().design.expectations).toEqual({});
    await type('!(A & B)');
    expect(byTestId('expectation-error')).toBeNull();
    expect(store.getState().design.expectations).toEqual({ Y: '!(A & B)' });
  });
});
