// Unit tests of our own plumbing: they check behaviour, not published values, so no source applies.
import { describe, expect, it } from 'vitest';
import { headlessEditor } from '../editor/headless.ts';
import { BLANK_DOCUMENT, loadDesign, setSelection } from '../../src/state/store.ts';
import { STARTERS } from '../../src/core/starters/index.ts';
import { editPart } from '../../src/editor/actions.ts';
import { sheetToNetlist } from '../../src/core/sheet/toNetlist.ts';
import { COMMANDS, commandForKey, placeKeyOf } from '../../src/app/commands.ts';
import { SHELF_KINDS } from '../../src/core/sheet/parts/index.ts';
import { drawnInverter } from '../sheet/fixtures.ts';
import { partBounds } from '../../src/core/sheet/geometry.ts';
import type { SheetPart } from '../../src/core/sheet/types.ts';

/** A copy lands where it touches nothing (docs/semantics.md §1): its box meets no other part's. */
function clearOfTheRest(parts: readonly SheetPart[], id: string): boolean {
  const box = partBounds(parts.find((p) => p.id === id)!);
  return parts
    .filter((p) => p.id !== id)
    .map(partBounds)
    .every((b) => b.x1 < box.x0 || box.x1 < b.x0 || b.y1 < box.y0 || box.y1 < b.y0);
}

/** Each command test ends by undoing (back to before) and redoing (back to after). */
function inverterEditor() {
  return headlessEditor({ ...BLANK_DOCUMENT, sheet: drawnInverter() });
}

function checkUndoRedo(ed: ReturnType<typeof inverterEditor>, before: unknown, after: unknown): void {
  ed.key('z', { ctrl: true });
  expect(ed.state().doc).toEqual(before);
  ed.key('y', { ctrl: true });
  expect(ed.state().doc).toEqual(after);
}

describe('commands (keyboard), each with undo and redo', () => {
  it('Q turns the selection a quarter clockwise', () => {
    const ed = inverterEditor();
    const before = ed.state().doc;
    setSelection({ parts: ['p2'], wires: [] });
    ed.key('q');
    expect(ed.state().doc.sheet.parts[1]!.rotation).toBe(1);
    checkUndoRedo(ed, before, ed.state().doc);
  });

  it('F flips the selection left–right', () => {
    const ed = inverterEditor();
    const before = ed.state().doc;
    setSelection({ parts: ['p1'], wires: [] });
    ed.key('f');
    expect(ed.state().doc.sheet.parts[0]!.mirror).toBe(true);
    checkUndoRedo(ed, before, ed.state().doc);
  });

  it('Delete removes the selection and clears it', () => {
    const ed = inverterEditor();
    const before = ed.state().doc;
    setSelection({ parts: ['p6'], wires: ['w2'] });
    ed.key('Delete');
    expect(ed.state().doc.sheet.parts).toHaveLength(5);
    expect(ed.state().selection.selected).toEqual({ parts: [], wires: [] });
    checkUndoRedo(ed, before, ed.state().doc);
  });

  it('Ctrl+D duplicates and selects the copy, renumbering devices', () => {
    const ed = inverterEditor();
    const before = ed.state().doc;
    setSelection({ parts: ['p2'], wires: [] });
    ed.key('d', { ctrl: true });
    const parts = ed.state().doc.sheet.parts;
    expect(parts[parts.length - 1]).toMatchObject({ kind: 'nmos', name: 'N2' });
    expect(clearOfTheRest(ed.state().doc.sheet.parts, parts[parts.length - 1]!.id)).toBe(true);
    expect(ed.state().selection.selected.parts).toEqual([parts[parts.length - 1]!.id]);
    checkUndoRedo(ed, before, ed.state().doc);
  });

  it('Ctrl+C then Ctrl+V pastes; a second paste lands further on', () => {
    const ed = inverterEditor();
    setSelection({ parts: ['p1'], wires: [] });
    ed.key('c', { ctrl: true });
    const before = ed.state().doc;
    ed.key('v', { ctrl: true });
    ed.key('v', { ctrl: true });
    const added = ed.state().doc.sheet.parts.slice(-2);
    expect(added.map((p) => p.name)).toEqual(['P2', 'P3']);
    for (const p of added) expect(clearOfTheRest(ed.state().doc.sheet.parts, p.id)).toBe(true);
    const after = ed.state().doc;
    ed.key('z', { ctrl: true });
    ed.key('z', { ctrl: true });
    expect(ed.state().doc).toEqual(before);
    ed.key('z', { ctrl: true, shift: true });
    ed.key('z', { ctrl: true, shift: true });
    expect(ed.state().doc).toEqual(after);
  });

  it('arrow keys nudge by one grid unit and wires follow', () => {
    const ed = inverterEditor();
    const before = ed.state().doc;
    setSelection({ parts: ['p6'], wires: [] });
    ed.key('ArrowDown');
    expect(ed.state().doc.sheet.parts[5]).toMatchObject({ x: 4, y: 1 });
    expect(ed.state().design.netlist).toEqual(sheetToNetlist(before.sheet, before.name).netlist);
    checkUndoRedo(ed, before, ed.state().doc);
  });

  it('dragging a part is one undo step however many frames, and wires follow', () => {
    const ed = inverterEditor();
    const before = ed.state().doc;
    ed.drag({ x: 5, y: 0.3 }, { x: 5, y: 6.3 });
    expect(ed.state().doc.sheet.parts[5]).toMatchObject({ x: 4, y: 6 });
    expect(ed.state().history.past).toHaveLength(1);
    expect(ed.state().design.netlist.outputs).toEqual(['Y']);
    expect(ed.state().design.netlist.devices).toEqual(sheetToNetlist(before.sheet).netlist.devices);
    checkUndoRedo(ed, before, ed.state().doc);
  });

  it('Escape during a drag puts everything back and records nothing', () => {
    const ed = inverterEditor();
    const before = ed.state().doc;
    ed.down(5, 0.3);
    ed.move(5, 3.3);
    ed.move(5, 6.3);
    ed.key('Escape');
    ed.up(5, 6.3);
    expect(ed.state().doc).toBe(before);
    expect(ed.state().history.past).toHaveLength(0);
  });

  it('a box drag on empty sheet selects what lies inside; shift adds', () => {
    const ed = inverterEditor();
    ed.drag({ x: -3, y: -7 }, { x: 5, y: 1 });
    expect(ed.state().selection.selected).toEqual({ parts: ['p1', 'p3'], wires: ['w1', 'w2'] });
    ed.drag({ x: -10, y: -1 }, { x: -5, y: 1 }, true);
    expect(ed.state().selection.selected.parts).toEqual(['p1', 'p3', 'p5']);
    expect(ed.state().history.past).toHaveLength(0);
  });

  it('editing W in the form is one step, and a bad value changes nothing', () => {
    const ed = inverterEditor();
    const before = ed.state().doc;
    expect(editPart('p2', { w: 3 })).toBe(true);
    expect(ed.state().design.netlist.devices[1]).toMatchObject({ name: 'N1', w: 3 });
    const after = ed.state().doc;
    expect(editPart('p2', { w: 0 })).toBe(false);
    expect(ed.state().doc).toBe(after);
    expect(ed.state().message?.kind).toBe('error');
    checkUndoRedo(ed, before, after);
  });

  it('opening a design replaces the sheet as one undoable step', () => {
    const ed = inverterEditor();
    const before = ed.state().doc;
    loadDesign(STARTERS.find((x) => x.id === 'nor2')!.design);
    expect(ed.state().design.netlist.devices.map((d) => d.kind)).toEqual(['pmos', 'pmos', 'nmos', 'nmos']);
    const after = ed.state().doc;
    checkUndoRedo(ed, before, after);
  });
});

describe('the key map', () => {
  const key = (k: string, ctrl = false, shift = false) =>
    commandForKey({ key: k, ctrlKey: ctrl, metaKey: false, shiftKey: shift })?.id ?? null;

  it('places parts by number in shelf order, and names its own keys for the rest', () => {
    expect(['1', '2', '3', '4', '5', '6', '7', '8', '9'].map((k) => key(k))).toEqual([
      'place-nmos',
      'place-pmos',
      'place-resistor',
      'place-capacitor',
      'place-vdd',
      'place-gnd',
      'place-input',
      'place-output',
      'place-label',
    ]);
    expect([key('q'), key('f'), key('j'), key('v'), key('h')]).toEqual([
      'rotate',
      'mirror',
      'wire',
      'fit',
      'help',
    ]);
  });

  it('finds any part with /, and has a place command for every kind, numbered for the first nine', () => {
    expect(key('/')).toBe('find-part');
    const place = COMMANDS.filter((c) => c.id.startsWith('place-'));
    expect(place.map((c) => c.id)).toEqual(SHELF_KINDS.map((k) => `place-${k}`));
    place.forEach((c, i) => expect(c.keys).toEqual(i < 9 ? [{ key: String(i + 1) }] : []));
    expect(SHELF_KINDS.map(placeKeyOf).filter((k) => k !== null)).toHaveLength(
      Math.min(9, SHELF_KINDS.length),
    );
  });

  it('tells Ctrl+Z from Ctrl+Shift+Z and V from Ctrl+V', () => {
    expect(key('z', true)).toBe('undo');
    expect(key('Z', true, true)).toBe('redo');
    expect(key('v', true)).toBe('paste');
    expect(key('v')).toBe('fit');
    expect(key('k')).toBeNull();
  });

  it('gives no two commands the same key', () => {
    const combos = COMMANDS.flatMap((c) =>
      c.keys.map((k) => `${k.ctrl ? 'C-' : ''}${k.shift ? 'S-' : ''}${k.key.toLowerCase()}`),
    );
    expect(new Set(combos).size).toBe(combos.length);
  });
});
