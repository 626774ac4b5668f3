import { describe, expect, it } from 'vitest';
import { copyItems, pasteClip } from '../../src/core/sheet/clipboard.ts';
import { nextPartName } from '../../src/core/sheet/naming.ts';
import {
  addPart,
  addWire,
  deleteItems,
  SheetEditError,
  updatePart,
  EMPTY_SHEET,
} from '../../src/core/sheet/edits.ts';
import { elbowRoute, normalizePath } from '../../src/core/sheet/routing.ts';
import { sheetToNetlist } from '../../src/core/sheet/toNetlist.ts';
import { drawnInverter } from './fixtures.ts';

describe('pure edits', () => {
  it('numbers new devices per prefix and takes the trade names for rails', () => {
    let s = addPart(EMPTY_SHEET, { kind: 'nmos', at: { x: 0, y: 0 } });
    s = addPart(s, { kind: 'nmos', at: { x: 4, y: 0 } });
    s = addPart(s, { kind: 'vdd', at: { x: 4, y: 0 } });
    expect(s.parts.map((p) => [p.id, p.name])).toEqual([
      ['p1', 'N1'],
      ['p2', 'N2'],
      ['p3', 'VDD'],
    ]);
    expect(nextPartName(s, 'input')).toBe('A');
  });

  it('refuses a diagonal wire and a broken value, leaving the sheet as it was', () => {
    const sheet = drawnInverter();
    expect(() =>
      addWire(sheet, [
        { x: 0, y: 0 },
        { x: 3, y: 4 },
      ]),
    ).toThrow(SheetEditError);
    expect(() => updatePart(sheet, 'p1', { w: -1 })).toThrow(SheetEditError);
    expect(() => updatePart(sheet, 'p1', { name: ' ' })).toThrow(SheetEditError);
    expect(sheet).toEqual(drawnInverter());
  });

  it('routes with one bend and merges straight runs', () => {
    expect(elbowRoute({ x: 0, y: 0 }, { x: 3, y: 2 }, true)).toEqual([
      { x: 0, y: 0 },
      { x: 3, y: 0 },
      { x: 3, y: 2 },
    ]);
    expect(elbowRoute({ x: 0, y: 0 }, { x: 3, y: 2 }, false)).toEqual([
      { x: 0, y: 0 },
      { x: 0, y: 2 },
      { x: 3, y: 2 },
    ]);
    expect(
      normalizePath([
        { x: 0, y: 0 },
        { x: 2, y: 0 },
        { x: 2, y: 0 },
        { x: 5, y: 0 },
      ]),
    ).toEqual([
      { x: 0, y: 0 },
      { x: 5, y: 0 },
    ]);
  });

  it('pastes with fresh ids and renumbered devices; pins and labels keep their names', () => {
    const sheet = drawnInverter();
    const clip = copyItems(sheet, { parts: ['p1', 'p5'], wires: ['w1'] });
    const { sheet: next, pasted } = pasteClip(sheet, clip, 20, 0);
    expect(pasted).toEqual({ parts: ['p7', 'p8'], wires: ['w5'] });
    const added = next.parts.slice(-2);
    expect(added.map((p) => [p.name, p.x])).toEqual([
      ['P2', 20],
      ['A', 14],
    ]);
    expect(sheetToNetlist(next).issues).toEqual([]);
  });

  it('deletes parts and wires by id', () => {
    const s = deleteItems(drawnInverter(), { parts: ['p6'], wires: ['w2'] });
    expect(s.parts.map((p) => p.id)).not.toContain('p6');
    expect(s.wires.map((w) => w.id)).toEqual(['w1', 'w3', 'w4']);
    expect(sheetToNetlist(s).netlist.outputs).toEqual([]);
  });
});
