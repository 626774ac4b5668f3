// @vitest-environment happy-dom
/**
 * A cell with more inputs than the page sweeps (docs/semantics.md §7): no table, but the shown
 * vector still gets its findings and its expected-function check, and they follow each toggle.
 */
import { act } from 'react';
import { describe, expect, it } from 'vitest';
import { circuit } from '../../src/core/model/builder.ts';
import { loadDesign } from '../../src/state/store.ts';
import { toggleInput } from '../../src/state/simulation.ts';
import { APP_MAX_INPUTS } from '../../src/worker/protocol.ts';
import { design } from '../cells.ts';
import { byTestId, mount, usePanelHarness } from './panelHarness.tsx';

usePanelHarness();

/** APP_MAX_INPUTS + 1 inverters side by side: input Ak drives output Yk. */
function inverterRow() {
  let c = circuit('wide_row').rails();
  for (let k = 0; k <= APP_MAX_INPUTS; k++) {
    c = c
      .input(`A${k}`)
      .output(`Y${k}`)
      .pmos(`P${k}`, { g: `A${k}`, d: `Y${k}`, s: 'VDD', w: 2 })
      .nmos(`N${k}`, { g: `A${k}`, d: `Y${k}`, s: 'GND' });
  }
  return c.build();
}

describe('a cell wider than the page sweeps', () => {
  it('checks the shown vector against its expected functions, toggle by toggle', async () => {
    // Y0 = A0 is wrong on purpose: an inverter gives Y0 = !A0 (common practice, no source).
    loadDesign(design(inverterRow(), { Y0: 'A0', Y1: '!A1' }));
    await mount();
    expect(byTestId('sweep-limit')?.textContent).toContain(`more than the ${APP_MAX_INPUTS}`);
    expect(byTestId('vector-row-0')).toBeNull();
    await act(async () => toggleInput('A0'));
    const findings = byTestId('vector-findings')?.textContent ?? '';
    expect(findings).toContain('mismatch at');
    expect(findings).toContain('Y0 is 0, expected 1');
    expect(findings).not.toContain('Y1 is');
    await act(async () => toggleInput('A0'));
    expect(byTestId('vector-findings')?.textContent).toContain('Y0 is 1, expected 0');
  });
});
