/**
 * Netlists keep their hierarchy (docs/semantics.md §6): `.subckt` definitions become cells with
 * instances, SPICE export writes them back as `.subckt`s and `X` lines, and import → export →
 * import keeps every cell, every instance and what each cell flattens to.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { cellDesign } from '../../src/core/hierarchy/cellDesign.ts';
import type { Cell, Design } from '../../src/core/document/design.ts';
import { DEFAULT_TECHNOLOGY } from '../../src/core/model/technology.ts';
import { exportSpiceDesign } from '../../src/core/netlist-io/spiceDesignExport.ts';
import { exportVerilogDesign } from '../../src/core/netlist-io/verilogDesignExport.ts';
import { designFromImport } from '../../src/core/netlist-io/spiceDesign.ts';
import { importSpice } from '../../src/core/netlist-io/spiceImport.ts';
import { netlistArb } from './arbitraries.ts';

function designOf(text: string): Design {
  return designFromImport(importSpice(text, 'tide.sp'), DEFAULT_TECHNOLOGY, 'tide');
}

const BUFFER = `* tide buffer
.subckt tide_inv A Y VDD GND
MP Y A VDD VDD pch W=2u L=0.25u
MN Y A GND GND nch W=1u L=0.25u
.ends
.subckt tide_buf A Y VDD GND
* railwise: expect Y = A
X1 A mid VDD GND tide_inv
X2 mid Y VDD GND tide_inv
.ends
.end`;

/** What a design means, whatever the order or spelling of its files: each cell's instances and flat netlist. */
function meaning(d: Design) {
  return d.cells.map((c) => ({
    name: c.name,
    instances: c.instances.map((i) => [i.name, i.cell]),
    flat: cellDesign(d, c.name).netlist,
    expectations: c.expectations,
  }));
}

describe('structural Verilog of a design', () => {
  it('writes one module per cell, placed cells first, instances connected by port name', () => {
    const text = exportVerilogDesign(designOf(BUFFER));
    expect(text.indexOf('module tide_inv')).toBeLessThan(text.indexOf('module tide_buf'));
    expect(text).toContain('tide_inv X1 (.A(A), .Y(mid));');
    expect(text).toContain('tide_inv X2 (.A(mid), .Y(Y));');
    expect(text.match(/^endmodule$/gm)).toHaveLength(2);
    // IEEE Std 1364-2005 clause 12.3.6: named port connections `.port(net)`.
  });
});

describe('import keeps the hierarchy', () => {
  const d = designOf(BUFFER);

  it('makes a cell of every subcircuit, with its instances and pins', () => {
    expect(d.cells.map((c) => c.name)).toEqual(['tide_inv', 'tide_buf']);
    const buf = d.cells[1] as Cell;
    expect(buf.netlist.devices).toEqual([]);
    expect(buf.instances).toEqual([
      { name: 'X1', cell: 'tide_inv', pins: { A: 'A', Y: 'mid', VDD: 'VDD', GND: 'GND' } },
      { name: 'X2', cell: 'tide_inv', pins: { A: 'mid', Y: 'Y', VDD: 'VDD', GND: 'GND' } },
    ]);
    expect(buf.netlist.inputs).toEqual(['A']);
    expect(buf.netlist.outputs).toEqual(['Y']);
    expect(buf.expectations).toEqual({ Y: 'A' });
    expect(d.open).toBe('tide_buf');
  });

  it('flattens on analysis to what the command line checks', () => {
    const checked = importSpice(BUFFER, 'tide.sp').cells[0];
    expect(cellDesign(d).netlist).toEqual(checked?.netlist);
  });

  it('writes the hierarchy back: one .subckt per cell, placed cells first, X lines in port order', () => {
    const text = exportSpiceDesign(d);
    expect(text.indexOf('.subckt tide_inv')).toBeLessThan(text.indexOf('.subckt tide_buf'));
    expect(text).toContain('X1 A mid VDD GND tide_inv');
    expect(meaning(designOf(text))).toEqual(meaning(d));
  });
});

/** Up to three random leaf cells (each with a device) and a top cell placing each of them once or twice. */
const hierarchyArb: fc.Arbitrary<Design> = fc
  .array(
    netlistArb.filter((n) => n.devices.length > 0),
    { minLength: 1, maxLength: 3 },
  )
  .chain((leaves) =>
    fc.array(fc.nat(leaves.length - 1), { minLength: 1, maxLength: 4 }).map((uses): Design => {
      const cells: Cell[] = leaves.map((n, i) => ({
        name: `leaf${i}`,
        netlist: { ...n, name: `leaf${i}` },
        instances: [],
        expectations: {},
        sequences: [],
      }));
      const instances = uses.map((u, k) => {
        const leaf = cells[u] as Cell;
        const pins = [...leaf.netlist.inputs, ...leaf.netlist.outputs];
        return {
          name: `X${k}`,
          cell: leaf.name,
          pins: Object.fromEntries(pins.map((p, j) => [p, `w${(k + j) % 5}`])),
        };
      });
      const top: Cell = {
        name: 'top',
        netlist: { name: 'top', devices: [], rails: [], inputs: ['w0'], outputs: ['w1'] },
        instances,
        expectations: {},
        sequences: [],
      };
      return { name: 'tide', technology: DEFAULT_TECHNOLOGY, cells: [...cells, top], open: 'top' };
    }),
  );

describe('round trip with hierarchy (property)', () => {
  it('import → export → import keeps every cell, instance and flat netlist', () => {
    fc.assert(
      fc.property(hierarchyArb, (design) => {
        const first = designOf(exportSpiceDesign(design));
        const second = designOf(exportSpiceDesign(first));
        expect(meaning(second)).toEqual(meaning(first));
        expect(cellDesign(first, 'top').netlist.devices).toEqual(cellDesign(design, 'top').netlist.devices);
        // A subcircuit nothing places and that holds no device is not a cell (a note says so).
        const placed = new Set(design.cells.flatMap((c) => c.instances.map((i) => i.cell)));
        const kept = design.cells.filter(
          (c) => placed.has(c.name) || c.instances.length > 0 || c.netlist.devices.length > 0,
        );
        expect(first.cells.map((c) => c.name).sort()).toEqual(kept.map((c) => c.name).sort());
        expect(first.cells.find((c) => c.name === 'top')?.instances.map((i) => i.cell)).toEqual(
          design.cells.find((c) => c.name === 'top')?.instances.map((i) => i.cell),
        );
      }),
      { numRuns: 100 },
    );
  });
});
