/**
 * A transistor's model card name survives the sheet (docs/semantics.md §1, "Model cards"): an
 * imported netlist placed on the sheet, edited, saved and opened again still names its cards, so
 * the DC model keeps reading their values. Our own format rules (no published source applies).
 */
import { describe, expect, it } from 'vitest';
import { designFromSpice } from '../../../src/app/files.ts';
import { designOfDocument } from '../../../src/state/documentCells.ts';
import { parseDesignFile, serializeDesign } from '../../../src/core/format/designFile.ts';
import { updatePart } from '../../../src/core/sheet/edits.ts';
import { makeSheetPart, partForDevice } from '../../../src/core/sheet/parts/index.ts';
import type { MosDevice } from '../../../src/core/model/netlist.ts';
import { deriveDesign, documentFromDesign } from '../../../src/state/document.ts';

const DECK = `.subckt inv A Y VDD GND
MP Y A VDD VDD pch W=2u L=0.25u
MN Y A GND GND hvt W=1u L=0.25u
.ends
.model hvt nmos (level=1 vto=0.62 kp=100u)
`;

/** The device with no model card named (the key left out, as a file would). */
function withoutModel({ model: _unnamed, ...rest }: MosDevice): MosDevice {
  return rest;
}

const AT = { id: 'p1', x: 0, y: 0, rotation: 0 as const, mirror: false };

describe('the model a transistor names', () => {
  it('goes from the device to the part and back', () => {
    const device = {
      kind: 'nmos' as const,
      name: 'N1',
      gate: 'A',
      drain: 'Y',
      source: 'GND',
      w: 1,
      l: 0.25,
      model: 'hvt',
    };
    const part = partForDevice(device, AT);
    expect(part).toMatchObject({ kind: 'nmos', w: 1, l: 0.25, model: 'hvt' });
    expect(makeSheetPart('nmos', { ...AT, name: 'N1' })).not.toHaveProperty('model');
  });

  it('survives an edit of W', () => {
    const part = makeSheetPart('nmos', { ...AT, name: 'N1' }, { w: 1, model: 'hvt' });
    const sheet = updatePart({ parts: [part], wires: [] }, 'p1', { w: 3 });
    expect(sheet.parts[0]).toMatchObject({ w: 3, model: 'hvt' });
  });

  it('an imported cell on the sheet keeps its cards, through save and open', () => {
    const { design } = designFromSpice(DECK, 'inv.sp');
    expect({ ...design.technology.models }).toEqual({ hvt: { type: 'nmos', vt0: 0.62, kp: 100e-6 } });
    const doc = documentFromDesign(design);
    const { design: drawn, openCell } = deriveDesign(doc);
    const mn = drawn.netlist.devices.find((d) => d.name === 'MN');
    expect(mn).toMatchObject({ kind: 'nmos', model: 'hvt' });
    const again = parseDesignFile(serializeDesign(designOfDocument(doc, openCell)), 'inv.railwise.json');
    expect(again.cells[0]?.sheet?.parts.find((p) => p.name === 'MN')).toMatchObject({ model: 'hvt' });
    expect(again.technology.models).toEqual(drawn.technology.models);
  });

  it('a part naming a card the file lacks is refused, naming the field', () => {
    const { design } = designFromSpice(DECK, 'inv.sp');
    const doc = documentFromDesign(design);
    const whole = designOfDocument(doc, deriveDesign(doc).openCell);
    // The netlist names no card here, so the sheet's part is what is refused.
    const cells = whole.cells.map((c) => {
      const devices = c.netlist.devices.map((d) => (d.kind === 'nmos' ? withoutModel(d) : d));
      return { ...c, netlist: { ...c.netlist, devices } };
    });
    const text = serializeDesign({ ...whole, cells, technology: { ...whole.technology, models: {} } });
    expect(() => parseDesignFile(text, 'bad.json')).toThrow(
      /cells\[0\]\.sheet\.parts\[\d+\]\.model: no model card 'hvt'/,
    );
  });
});
