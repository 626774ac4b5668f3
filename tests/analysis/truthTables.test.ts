import { describe, expect, it } from 'vitest';
import { checkDesign } from '../../src/core/analysis/check.ts';
import { STARTERS } from '../../src/core/starters/index.ts';
import { reportRows } from '../../src/core/analysis/sweepColumns.ts';

// Truth tables of the standard static and pass-gate cells: common practice, no source (any CMOS
// text, e.g. W&H 4th ed. ch. 1). Rows in binary order of the inputs, first input most significant.
const tables: Record<string, string> = {
  inverter: '10',
  nand2: '1110',
  nor2: '1000',
  aoi21: '10101000', // Y = !(A·B + C) over A B C = 000 … 111
  oai21: '11101010', // Y = !((A + B)·C)
  mux2: '00011011', // Y = S ? D1 : D0 over D0 D1 S
  'tristate-inverter': 'Z1Z0', // A EN: 00 → Z, 01 → 1, 10 → Z, 11 → 0
  'transmission-gate': 'Z0Z1',
  'resistor-load-inverter': '10',
  'ratioed-nor2': '1000',
};

describe('starter cells reproduce their truth tables', () => {
  for (const [id, column] of Object.entries(tables)) {
    it(`${id}: ${column}`, () => {
      const starter = STARTERS.find((s) => s.id === id);
      expect(starter).toBeDefined();
      const report = checkDesign(starter!.design);
      const output = starter!.design.netlist.outputs[0]!;
      expect(
        reportRows(report)
          .map((v) => v.outputs[output])
          .join(''),
      ).toBe(column);
      expect(report.summary.mismatch).toBe(0);
      expect(report.summary.errors).toBe(0);
    });
  }
});
