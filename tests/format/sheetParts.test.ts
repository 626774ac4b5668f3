/**
 * Sheet parts in design files: files written before each part kind carried typed properties still
 * open. Our own format rules (no published source applies).
 */
import { cellDesign, designOfCell } from '../../src/core/hierarchy/cellDesign.ts';
import { describe, expect, it } from 'vitest';
import { parseDesignFile, serializeDesign } from '../../src/core/format/designFile.ts';
import { sheetToNetlist } from '../../src/core/sheet/toNetlist.ts';

/**
 * A file as this build's predecessors wrote it: one record shape for every part, with sizes
 * optional, so a PMOS without W and L or a capacitor without farads was valid, and an odd key on a
 * label was carried along.
 */
const TODAYS_FILE = `{
  "format": "railwise-design",
  "version": 1,
  "name": "Harbour buffer",
  "netlist": { "name": "harbour", "devices": [], "rails": [], "inputs": [], "outputs": [] },
  "sheet": {
    "parts": [
      { "id": "p1", "kind": "pmos", "name": "P1", "x": 0, "y": -3, "rotation": 0, "mirror": false },
      { "id": "p2", "kind": "nmos", "name": "N1", "x": 0, "y": 3, "rotation": 0, "mirror": false, "w": 1.5, "l": 0.18 },
      { "id": "p3", "kind": "resistor", "name": "R1", "x": 6, "y": 0, "rotation": 0, "mirror": false, "ohms": 40000 },
      { "id": "p4", "kind": "capacitor", "name": "C1", "x": 10, "y": 0, "rotation": 0, "mirror": false },
      { "id": "p5", "kind": "label", "name": "Y", "x": 0, "y": 0, "rotation": 0, "mirror": false, "ohms": 5 },
      { "id": "p6", "kind": "vdd", "name": "VDD", "x": 0, "y": -5, "rotation": 0, "mirror": false }
    ],
    "wires": []
  }
}
`;

describe('design files of the earlier part shape', () => {
  const design = cellDesign(parseDesignFile(TODAYS_FILE, 'harbour.railwise.json'));
  const parts = design.sheet!.parts;

  it('fill a missing size with the kind default, as the drawing always read it', () => {
    expect(parts[0]).toEqual({
      id: 'p1',
      kind: 'pmos',
      name: 'P1',
      x: 0,
      y: -3,
      rotation: 0,
      mirror: false,
      w: 2,
      l: 0.25,
    });
    expect(parts[1]).toMatchObject({ w: 1.5, l: 0.18 });
    expect(parts[2]).toMatchObject({ ohms: 40000 });
    expect(parts[3]).toMatchObject({ farads: 10e-15 });
  });

  it('drop a property the kind does not have', () => {
    expect(parts[4]).not.toHaveProperty('ohms');
  });

  it('derive the netlist the earlier build derived from the same file', () => {
    const devices = sheetToNetlist(design.sheet!).netlist.devices;
    expect(devices.map((d) => [d.kind, d.name])).toEqual([
      ['pmos', 'P1'],
      ['nmos', 'N1'],
      ['resistor', 'R1'],
      ['capacitor', 'C1'],
    ]);
    expect(devices[0]).toMatchObject({ w: 2, l: 0.25 });
    expect(devices[3]).toMatchObject({ farads: 10e-15 });
  });

  it('are written back with every size present, and read back unchanged', () => {
    const whole = designOfCell(design);
    const again = parseDesignFile(serializeDesign(whole), 'again.railwise.json');
    expect(again).toEqual(whole);
    expect(serializeDesign(whole)).toContain('"farads": 1e-14');
  });
});
