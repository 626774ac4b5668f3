// @vitest-environment happy-dom
import { act } from 'react';
import { createRoot } from 'react-dom/client';
import { describe, expect, it } from 'vitest';
import { Legend } from '../../src/panels/Legend.tsx';

(globalThis as { IS_REACT_ACT_ENVIRONMENT?: boolean }).IS_REACT_ACT_ENVIRONMENT = true;

describe('legend', () => {
  it('explains the stored-state mark and the unknown finding', async () => {
    const host = document.createElement('div');
    const root = createRoot(host);
    await act(async () => root.render(<Legend />));
    expect(host.textContent).toContain('‖ holds stored state: several steady states');
    expect(host.textContent).toContain('An output at X for a 0/1 vector is an unknown finding');
    await act(async () => root.unmount());
  });
});
