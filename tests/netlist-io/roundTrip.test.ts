/**
 * docs/semantics.md §8: import → export → import is the identity on the netlist. Checked on random netlists
 * (every device kind, unusual rail names, rails at their own voltage, widths with many digits).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DEFAULT_TECHNOLOGY } from '../../src/core/model/technology.ts';
import { exportSpice } from '../../src/core/netlist-io/spiceExport.ts';
import { importSpice } from '../../src/core/netlist-io/spiceImport.ts';
import { netlistArb } from './arbitraries.ts';

function reimport(text: string) {
  const result = importSpice(text, 'roundtrip.sp');
  expect(result.cells).toHaveLength(1);
  return result.cells[0];
}

describe('SPICE round trip', () => {
  it('export then import gives back the same netlist', () => {
    fc.assert(
      fc.property(netlistArb, (netlist) => {
        const cell = reimport(exportSpice(netlist, DEFAULT_TECHNOLOGY));
        expect(cell?.netlist).toEqual(netlist);
      }),
      { numRuns: 300 },
    );
  });

  it('import → export → import is the identity, expected functions included', () => {
    fc.assert(
      fc.property(netlistArb, (netlist) => {
        const expectations = Object.fromEntries(
          netlist.outputs.map((o) => [o, netlist.inputs.join(' & ') || '1']),
        );
        const first = reimport(exportSpice(netlist, DEFAULT_TECHNOLOGY, { expectations }));
        const second = reimport(
          exportSpice(first?.netlist ?? netlist, DEFAULT_TECHNOLOGY, {
            expectations: first?.expectations ?? {},
          }),
        );
        expect(second?.netlist).toEqual(first?.netlist);
        expect(second?.expectations).toEqual(expectations);
      }),
      { numRuns: 100 },
    );
  });

  it('prefixes element names SPICE would misread: N1 becomes MN1', () => {
    const text = exportSpice(
      {
        name: 'inv',
        devices: [{ kind: 'nmos', name: 'N1', gate: 'A', drain: 'Y', source: 'GND', w: 1, l: 0.25 }],
        rails: [{ net: 'GND', role: 'ground' }],
        inputs: ['A'],
        outputs: ['Y'],
      },
      DEFAULT_TECHNOLOGY,
    );
    expect(text).toContain('MN1 Y A GND GND rw_nmos W=1u L=0.25u');
  });

  it('writes level-1 model cards from the technology (Shichman–Hodges: VTO, KP, GAMMA, PHI, LAMBDA)', () => {
    const text = exportSpice(
      { name: 'c', devices: [], rails: [], inputs: [], outputs: [] },
      DEFAULT_TECHNOLOGY,
    );
    // RCN 0.25 µm process, tables 3.2–3.3 (from memory): VT0 0.43 / −0.4 V, k' 115 / 30 µA/V²,
    // γ 0.4 V^½, 2φF 0.6 V, λ 0.06 / 0.1 V⁻¹.
    expect(text).toContain('* railwise: technology rw_nmos rw_pmos');
    expect(text).toContain('.model rw_nmos nmos (level=1 vto=0.43 kp=115u gamma=0.4 phi=0.6 lambda=0.06)');
    expect(text).toContain('.model rw_pmos pmos (level=1 vto=-0.4 kp=30u gamma=0.4 phi=0.6 lambda=0.1)');
  });
});
