/**
 * Libraries (docs/semantics.md §6): a file whose top level holds several subcircuits that no other instantiates
 * is a library, each subcircuit its own cell, and one broken cell never stops the rest.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { importSpice } from '../../src/core/netlist-io/spiceImport.ts';

const FIXTURE = 'tests/cli/fixtures/buoy-lib-with-broken-cell.sp';
const EXAMPLE = 'public/examples/tidewater-cells.sp';

describe('library import', () => {
  it('checks every top-level subcircuit as a cell and isolates the broken one with its line', () => {
    const lib = importSpice(readFileSync(FIXTURE, 'utf8'), FIXTURE);
    expect(lib.isLibrary).toBe(true);
    expect(lib.cells.map((c) => c.name)).toEqual(['buoy_inv', 'buoy_nor2', 'buoy_nand2_wrong_expect']);
    expect(lib.failed).toHaveLength(1);
    const broken = lib.failed[0];
    expect(broken?.name).toBe('buoy_bandgap_stub');
    expect(broken?.error.line).toBe(9);
    expect(broken?.error.message).toMatch(
      /^tests\/cli\/fixtures\/buoy-lib-with-broken-cell\.sp:9: Q1: bipolar/,
    );
  });

  it('leaves a subcircuit with no devices (a filler) out of the cells, with a note', () => {
    const lib = importSpice(readFileSync(FIXTURE, 'utf8'), FIXTURE);
    expect(lib.cells.find((c) => c.name === 'buoy_fill')).toBeUndefined();
    expect(lib.notes).toContain('subcircuits with no devices are not checked: buoy_fill');
  });

  it('checks the cells that others instantiate too, or only the top-level ones when asked', () => {
    const text = `.subckt inv A Y VDD GND
MP Y A VDD VDD pch W=2u L=0.25u
MN Y A GND GND nch W=1u L=0.25u
.ends
.subckt buf A Y VDD GND
X1 A m VDD GND inv
X2 m Y VDD GND inv
.ends
.subckt nand A B Y VDD GND
MP1 Y A VDD VDD pch W=2u L=0.25u
MP2 Y B VDD VDD pch W=2u L=0.25u
MN1 Y A n GND nch W=2u L=0.25u
MN2 n B GND GND nch W=2u L=0.25u
.ends`;
    const lib = importSpice(`* railwise: expect Y = A\n${text}`, 'lib.sp');
    expect(lib.isLibrary).toBe(true);
    expect(lib.cells.map((c) => c.name)).toEqual(['inv', 'buf', 'nand']);
    // An expected function outside every cell of a library belongs to none of them.
    expect(lib.cells.every((c) => Object.keys(c.expectations).length === 0)).toBe(true);
    expect(lib.notes).toEqual(['line 1: a "expect" directive outside any .subckt of a library is ignored']);
    const top = importSpice(text, 'lib.sp', { topOnly: true });
    expect(top.cells.map((c) => c.name)).toEqual(['buf', 'nand']);
    expect(top.notes).toEqual([
      '1 subcircuits that other cells instantiate are not checked on their own (top-level cells only)',
    ]);
  });

  it('reads the example library: eight cells, pins and expected functions', () => {
    const lib = importSpice(readFileSync(EXAMPLE, 'utf8'), EXAMPLE);
    expect(lib.failed).toEqual([]);
    expect(lib.cells).toHaveLength(8);
    const mux = lib.cells.find((c) => c.name === 'tw_mux2');
    expect(mux?.netlist).toMatchObject({ inputs: ['D0', 'D1', 'S'], outputs: ['Y'] });
    expect(mux?.expectations).toEqual({ Y: 'S ? D1 : D0' });
  });
});
