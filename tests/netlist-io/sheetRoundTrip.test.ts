// Our own round trip through the SPICE export (docs/semantics.md §6); no published source applies.
import { describe, expect, it } from 'vitest';
import { exportSpice } from '../../src/core/netlist-io/spiceExport.ts';
import { cellsFromText, type CellJob } from '../../src/core/netlist-io/cellFiles.ts';
import { sheetToNetlist } from '../../src/core/sheet/toNetlist.ts';
import { autoPlace } from '../../src/core/sheet/autoPlace.ts';
import { moveItems } from '../../src/core/sheet/transform.ts';
import { STARTERS } from '../../src/core/starters/index.ts';
import { DEFAULT_TECHNOLOGY } from '../../src/core/model/technology.ts';
import type { Sheet } from '../../src/core/sheet/types.ts';

function roundTrip(sheet: Sheet, name: string): CellJob {
  const netlist = sheetToNetlist(sheet, name).netlist;
  const text = exportSpice(netlist, DEFAULT_TECHNOLOGY, { sheet });
  const loaded = cellsFromText(text, `${name}.sp`).cells[0]!;
  if (!('job' in loaded)) throw new Error(JSON.stringify(loaded));
  return loaded.job;
}

describe('open, export, open again', () => {
  it('gives back every starter cell as drawn, with its netlist', () => {
    for (const s of STARTERS) {
      const sheet = autoPlace(s.design.netlist);
      const job = roundTrip(sheet, s.id);
      expect(job.sheet, s.id).toEqual(sheet);
      expect(sheetToNetlist(job.sheet!, s.id).netlist, s.id).toEqual(sheetToNetlist(sheet, s.id).netlist);
    }
  });

  it('keeps a layout the designer changed, and names SPICE cannot spell', () => {
    const nand = autoPlace(STARTERS.find((s) => s.id === 'nand2')!.design.netlist);
    const renamed: Sheet = {
      ...nand,
      parts: nand.parts.map((p) =>
        p.name === 'PA' ? { ...p, name: 'P A=1' } : p.name === 'Y' ? { ...p, name: 'out y' } : p,
      ),
    };
    const moved = moveItems(renamed, { parts: [renamed.parts[1]!.id], wires: [] }, 4, 2);
    const job = roundTrip(moved, 'nand2');
    expect(job.sheet).toEqual(moved);
    expect(job.netlist.devices.map((d) => d.name)).toContain('P A=1');
    expect(job.netlist.outputs).toEqual(['out y']);
  });

  it('places a cell afresh, with a note, when the file was changed so the drawing no longer fits', () => {
    const sheet = autoPlace(STARTERS.find((s) => s.id === 'inverter')!.design.netlist);
    const netlist = sheetToNetlist(sheet, 'inv').netlist;
    const text = exportSpice(netlist, DEFAULT_TECHNOLOGY, { sheet }).replace(
      /^(MN?1 .*)$/m,
      '$1\nMextra y a 0 0 rw_nmos W=1u L=0.25u',
    );
    const loaded = cellsFromText(text, 'inv.sp').cells[0]!;
    expect('job' in loaded && loaded.job.sheet).toBeFalsy();
    expect('job' in loaded && loaded.job.notes.some((n) => n.includes('placed afresh'))).toBe(true);
  });

  it('keeps the model cards the devices name', () => {
    const text = [
      '* our own inverter on named models',
      '.model nch nmos (level=1 vto=0.45 kp=120u)',
      '.model pch pmos (level=1 vto=-0.42 kp=35u)',
      '.subckt inv a y vdd gnd',
      'mp y a vdd vdd pch w=2u l=0.25u',
      'mn y a gnd gnd nch w=1u l=0.25u',
      '.ends',
    ].join('\n');
    const first = cellsFromText(text, 'inv.sp').cells[0]!;
    if (!('job' in first)) throw new Error('not read');
    const sheet = autoPlace(first.job.netlist);
    const again = exportSpice(sheetToNetlist(sheet, 'inv').netlist, first.job.technology, { sheet });
    const second = cellsFromText(again, 'inv.sp').cells[0]!;
    if (!('job' in second)) throw new Error('not read again');
    expect(second.job.sheet).toEqual(sheet);
    expect(second.job.netlist.devices.map((d) => ('model' in d ? d.model : null))).toEqual(['pch', 'nch']);
  });
});
