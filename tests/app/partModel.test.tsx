// @vitest-environment happy-dom
/**
 * The properties form names the model card a selected transistor takes its level-1 values from
 * (docs/semantics.md §1, "Model cards"). Our own behaviour: no published source applies.
 */
import { act } from 'react';
import { createRoot } from 'react-dom/client';
import { describe, expect, it } from 'vitest';
import { designFromSpice } from '../../src/app/files.ts';
import { PropertiesForm } from '../../src/app/PropertiesForm.tsx';
import { loadDesign, setSelection, store } from '../../src/state/store.ts';

(globalThis as { IS_REACT_ACT_ENVIRONMENT?: boolean }).IS_REACT_ACT_ENVIRONMENT = true;

const DECK = `.subckt inv A Y VDD GND
MP Y A VDD VDD pch W=2u L=0.25u
MN Y A GND GND hvt W=1u L=0.25u
.ends
.model hvt nmos (level=1 vto=0.62)
`;

describe('a transistor with a model card', () => {
  it('says which card sets its DC model; one without says nothing', async () => {
    loadDesign(designFromSpice(DECK, 'inv.sp').design);
    const parts = store.getState().doc.sheet.parts;
    const host = document.createElement('div');
    const root = createRoot(host);
    await act(async () => root.render(<PropertiesForm />));
    const show = async (name: string): Promise<string | null> => {
      const id = parts.find((p) => p.name === name)?.id as string;
      await act(async () => setSelection({ parts: [id], wires: [] }));
      return host.querySelector('[data-testid="part-model"]')?.textContent ?? null;
    };
    expect(await show('MN')).toMatch(/Model card hvt/);
    expect(await show('MP')).toBeNull();
    await act(async () => root.unmount());
  });
});
