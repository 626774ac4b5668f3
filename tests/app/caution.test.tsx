// @vitest-environment happy-dom
/**
 * One caution, one wording: the README, the app's About box, the command line's help and report,
 * and the exports carry the same sentence.
 */
import { readFileSync } from 'node:fs';
import { act } from 'react';
import { createRoot } from 'react-dom/client';
import { describe, expect, it } from 'vitest';
import { AboutBox } from '../../src/app/AboutBox.tsx';
import { run } from '../../src/cli/main.ts';
import { CAUTION } from '../../src/core/caution.ts';
import { exportSpice } from '../../src/core/netlist-io/spiceExport.ts';
import { exportVerilog } from '../../src/core/netlist-io/verilogExport.ts';
import { DEFAULT_TECHNOLOGY } from '../../src/core/model/technology.ts';
import { nand2 } from '../cells.ts';

(globalThis as { IS_REACT_ACT_ENVIRONMENT?: boolean }).IS_REACT_ACT_ENVIRONMENT = true;

describe('the caution', () => {
  it('reads the same in the README, the app, the command line and the exports', async () => {
    expect(CAUTION).toBe(
      "Switch-level estimates, not sign-off: confirm with circuit simulation and the foundry's rules.",
    );
    expect(readFileSync('README.md', 'utf8')).toContain(CAUTION);
    const host = document.createElement('div');
    const root = createRoot(host);
    await act(async () => root.render(<AboutBox />));
    expect(host.textContent).toContain(CAUTION);
    await act(async () => root.unmount());
    let out = '';
    const io = { out: (t: string) => (out += t), err: () => {}, colour: false };
    await run(['help'], io);
    await run(['check', 'public/examples/tidewater-cells.sp', '--cell', 'tw_inv'], io);
    expect(out.split(CAUTION)).toHaveLength(3);
    expect(exportSpice(nand2, DEFAULT_TECHNOLOGY)).toContain(CAUTION);
    expect(exportVerilog(nand2)).toContain(CAUTION);
  });
});
