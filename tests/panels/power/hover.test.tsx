// @vitest-environment happy-dom
import { act } from 'react';
import { createRoot } from 'react-dom/client';
import { afterEach, describe, expect, it } from 'vitest';
import { powerReport } from '../../../src/core/power/powerReport.ts';
import { NetCapacitanceTable } from '../../../src/panels/power/NetCapacitanceTable.tsx';
import { nand, UNIT_RC_TECH } from '../../sizing/cells.ts';

(globalThis as { IS_REACT_ACT_ENVIRONMENT?: boolean }).IS_REACT_ACT_ENVIRONMENT = true;

const report = powerReport(nand(2), UNIT_RC_TECH, { frequency: 1e6, activity: 'random', load: 10e-15 });
let host: HTMLElement | null = null;

afterEach(() => host?.remove());

function mount(): HTMLElement {
  host = document.createElement('div');
  document.body.append(host);
  const root = createRoot(host);
  act(() => root.render(<NetCapacitanceTable nets={report.nets} />));
  return host;
}

describe('capacitance breakdown on hover', () => {
  it('pointing at the output row shows its gate, diffusion, capacitor and load parts', () => {
    const el = mount();
    const row = [...el.querySelectorAll('tbody tr')].find((r) => r.textContent?.startsWith('Y'));
    expect(row).toBeDefined();
    act(() => {
      row?.dispatchEvent(new MouseEvent('mouseover', { bubbles: true, relatedTarget: document.body }));
    });
    const text = el.querySelector('[data-testid="capacitance-breakdown"]')?.textContent ?? '';
    // Unit RC NAND2 (N 2, P 2): output diffusion 2C + 2C + 2C = 6 fF, load 10 fF, no gates on Y.
    expect(text).toContain('Y');
    expect(text).toContain('diffusion 6 fF');
    expect(text).toContain('load 10 fF');
  });

  it('keyboard focus shows the same breakdown', () => {
    const el = mount();
    const row = el.querySelector<HTMLElement>('tbody tr');
    act(() => row?.focus());
    expect(el.querySelector('[data-testid="capacitance-breakdown"]')).not.toBeNull();
  });
});
