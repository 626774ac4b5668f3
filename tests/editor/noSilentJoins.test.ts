import { describe, expect, it } from 'vitest';
import { headlessEditor } from './headless.ts';
import { starterById } from '../../src/core/starters/index.ts';
import { documentFromDesign, type SheetDocument } from '../../src/state/document.ts';
import { setSelection } from '../../src/state/store.ts';
import { editPart } from '../../src/editor/actions.ts';
import { partBounds, type Rect } from '../../src/core/sheet/geometry.ts';
import type { Sheet } from '../../src/core/sheet/types.ts';
import { part } from '../sheet/fixtures.ts';
import { pinGroups, sameGroupsOnCommonPins } from './netGroups.ts';

/**
 * The rule of docs/semantics.md §1 ("No silent connections"), command by command: only a wire, a
 * net name, or a pin dropped on a pin or a wire end connects; Turn, Flip, nudges and drags keep
 * every connection and make none; duplicate and paste land where they touch nothing. A refused
 * command changes nothing, names the nets in a warning, and marks the place on the sheet.
 * The circuits are the starter NAND2 and small hand-drawn sheets; the expected connectivity is
 * read off the drawing (common practice, no source).
 */

const nand2 = (): SheetDocument => documentFromDesign(starterById('nand2')!.design);

/** NMOS N1 at (0,0) — gate (-2,0), drain (0,-2), source (0,2) — wired to input A; a wire Q at x = qx. */
function besideWire(qx = 1): SheetDocument {
  const sheet: Sheet = {
    parts: [
      part('p1', 'nmos', 'N1', 0, 0),
      part('p2', 'input', 'A', -6, 0),
      part('p3', 'label', 'Q', qx, -6),
    ],
    wires: [
      {
        id: 'w1',
        points: [
          { x: -6, y: 0 },
          { x: -2, y: 0 },
        ],
      },
      {
        id: 'w2',
        points: [
          { x: qx, y: -6 },
          { x: qx, y: 6 },
        ],
      },
    ],
  };
  return { ...nand2(), name: 'beside', sheet };
}

function expectRefused(ed: ReturnType<typeof headlessEditor>, before: SheetDocument, nets: string[]): void {
  const s = ed.state();
  expect(s.doc).toBe(before);
  expect(s.history.past).toHaveLength(0);
  expect(s.message?.kind).toBe('warning');
  for (const net of nets) expect(s.message?.text).toContain(net);
  expect(s.contactMarks?.kind).toBe('refused');
  expect(s.contactMarks?.at.length).toBeGreaterThan(0);
}

const overlaps = (a: Rect, b: Rect): boolean => a.x0 <= b.x1 && b.x0 <= a.x1 && a.y0 <= b.y1 && b.y0 <= a.y1;

describe('Turn (Q)', () => {
  it('refuses to turn the starter NAND2 PA onto VDD and Y, naming both nets', () => {
    const ed = headlessEditor(nand2());
    const before = ed.state().doc;
    setSelection({ parts: ['p1'], wires: [] }); // PA
    ed.key('q');
    expectRefused(ed, before, ['VDD', 'Y']);
  });

  it('turns a part whose turn keeps every connection, and the circuit stays the same', () => {
    const ed = headlessEditor(besideWire());
    const groups = pinGroups(ed.state());
    setSelection({ parts: ['p2'], wires: [] }); // input pin A: its wire follows
    ed.key('q');
    expect(ed.state().history.past).toHaveLength(1);
    expect(sameGroupsOnCommonPins(groups, pinGroups(ed.state()))).toBe(true);
  });
});

describe('Flip (F)', () => {
  it('refuses a flip that lays the gate on the Q wire', () => {
    const ed = headlessEditor(besideWire(2));
    const before = ed.state().doc;
    setSelection({ parts: ['p1'], wires: [] });
    ed.key('f'); // gate (-2,0) → (2,0), on the Q wire at x = 2
    expectRefused(ed, before, ['A', 'Q']);
  });
});

describe('nudges (arrows)', () => {
  it('refuses a nudge that puts the drain and source on the Q wire', () => {
    const ed = headlessEditor(besideWire());
    const before = ed.state().doc;
    setSelection({ parts: ['p1'], wires: [] });
    ed.key('ArrowRight');
    expectRefused(ed, before, ['Q']);
  });

  it('carries out a nudge away, with the gate wire following', () => {
    const ed = headlessEditor(besideWire());
    const groups = pinGroups(ed.state());
    setSelection({ parts: ['p1'], wires: [] });
    ed.key('ArrowLeft');
    ed.key('ArrowUp');
    expect(ed.state().history.past).toHaveLength(2);
    expect(sameGroupsOnCommonPins(groups, pinGroups(ed.state()))).toBe(true);
    expect(ed.state().design.netlist.devices[0]).toMatchObject({ gate: 'A' });
  });

  it('keeps a contact made by touching pins with a short wire', () => {
    const doc = besideWire();
    // A label B sitting on the drain: nudging N1 alone carries it (a name on a pin travels).
    const withDevice = {
      ...doc,
      sheet: { ...doc.sheet, parts: [...doc.sheet.parts, part('p4', 'nmos', 'N2', 0, -4)] },
    };
    const ed = headlessEditor(withDevice); // N2's source (0,-2) sits on N1's drain
    const groups = pinGroups(ed.state());
    setSelection({ parts: ['p1'], wires: [] });
    ed.key('ArrowDown');
    expect(ed.state().history.past).toHaveLength(1);
    expect(sameGroupsOnCommonPins(groups, pinGroups(ed.state()))).toBe(true);
    expect(ed.state().doc.sheet.wires).toHaveLength(3); // the tether from (0,-2) to (0,-1)
  });
});

describe('dragging', () => {
  it('refuses a drop of the drain onto the middle of the Q wire, and puts the part back', () => {
    const ed = headlessEditor(besideWire());
    const before = ed.state().doc;
    setSelection({ parts: ['p1'], wires: [] });
    ed.drag({ x: 0, y: 0 }, { x: 1, y: 1 }); // drain to (1,-1), source to (1,3): middle of Q
    expectRefused(ed, before, ['Q']);
  });

  it('connects a pin dropped on a wire end, marks it, and one undo takes it back', () => {
    const ed = headlessEditor(besideWire());
    const before = ed.state().doc;
    setSelection({ parts: ['p1'], wires: [] });
    ed.drag({ x: 0, y: 0 }, { x: 1, y: 8 }); // drain lands on (1,6), the Q wire's lower end
    const s = ed.state();
    expect(s.design.netlist.devices[0]).toMatchObject({ drain: 'Q' });
    expect(s.contactMarks).toEqual({ kind: 'made', at: [{ x: 1, y: 6 }] });
    ed.key('z', { ctrl: true });
    expect(ed.state().doc).toBe(before);
  });
});

describe('Duplicate (Ctrl+D) and paste (Ctrl+C, Ctrl+V)', () => {
  it('lays a copy of PA where it touches nothing (not with its gate on the Y wire)', () => {
    const ed = headlessEditor(nand2());
    const before = ed.state().design.netlist.devices;
    setSelection({ parts: ['p1'], wires: [] });
    ed.key('d', { ctrl: true });
    const s = ed.state();
    const copy = s.doc.sheet.parts.at(-1)!;
    expect(copy.name).toBe('P1');
    expect(s.doc.sheet.parts.slice(0, -1).some((p) => overlaps(partBounds(p), partBounds(copy)))).toBe(false);
    const ownNets = ['gate', 'drain', 'source'].map((pin) => s.geometry.pinNets.get(`${copy.id}.${pin}`));
    const elsewhere = [...s.geometry.pinNets].filter(([k]) => !k.startsWith(`${copy.id}.`));
    for (const net of ownNets) expect(elsewhere.some(([, n]) => n === net)).toBe(false);
    expect(s.design.netlist.devices.slice(0, before.length)).toEqual(before);
  });

  it('pastes a whole cell twice, each copy clear of everything drawn before it', () => {
    const ed = headlessEditor(nand2());
    const devices = ed.state().design.netlist.devices;
    ed.key('a', { ctrl: true });
    ed.key('c', { ctrl: true });
    const boxes = (from: number, to?: number) => ed.state().doc.sheet.parts.slice(from, to).map(partBounds);
    const original = boxes(0).length;
    ed.key('v', { ctrl: true });
    ed.key('v', { ctrl: true });
    const first = boxes(original, 2 * original);
    const second = boxes(2 * original);
    for (const b of second)
      for (const a of [...boxes(0, original), ...first]) expect(overlaps(a, b)).toBe(false);
    for (const b of first) for (const a of boxes(0, original)) expect(overlaps(a, b)).toBe(false);
    // Each paste is one step, and the original's devices keep their nets.
    expect(ed.state().history.past).toHaveLength(2);
    expect(ed.state().design.netlist.devices.slice(0, devices.length)).toEqual(devices);
  });
});

describe('placing, wiring, naming, cutting and deleting', () => {
  it('places a label on the middle of a wire: it names that net, and the contact is marked', () => {
    const ed = headlessEditor(besideWire());
    ed.key('9');
    ed.click(1, 2);
    const s = ed.state();
    const label = s.doc.sheet.parts.at(-1)!;
    expect(s.contactMarks).toEqual({ kind: 'made', at: [{ x: 1, y: 2 }] });
    expect(s.geometry.pinNets.get(`${label.id}.net`)).toBe(s.geometry.wireNets.w2);
    // Two labels now name one net: the sheet says so (a drawing problem shown under the sheet).
    expect(s.issues.some((i) => i.message.includes(label.name) && i.message.includes('Q'))).toBe(true);
  });

  it('refuses a part whose pin would land where two nets cross', () => {
    const doc = besideWire();
    const crossing = {
      ...doc,
      sheet: {
        ...doc.sheet,
        wires: [
          ...doc.sheet.wires,
          {
            id: 'w3',
            points: [
              { x: -3, y: 4 },
              { x: 5, y: 4 },
            ],
          },
        ],
      },
    };
    const ed = headlessEditor(crossing); // Q (x = 1) and w3 (y = 4) cross at (1,4) without a join
    const before = ed.state().doc;
    ed.key('9');
    ed.click(1, 4);
    expectRefused(ed, before, ['Q']);
  });

  it('draws a wire: the one action that joins two nets, shown by the wire itself', () => {
    const ed = headlessEditor(besideWire());
    ed.drag({ x: 0, y: -2 }, { x: 1, y: -2 }); // from the drain to the Q wire
    expect(ed.state().doc.sheet.wires).toHaveLength(3);
    expect(ed.state().design.netlist.devices[0]).toMatchObject({ drain: 'Q' });
    expect(ed.state().history.past).toHaveLength(1);
  });

  it('renaming a label joins by name, as a net name does', () => {
    const ed = headlessEditor(besideWire());
    editPart('p3', { name: 'A' });
    expect(ed.state().geometry.wireNets).toEqual({ w1: 'A', w2: 'A' });
  });

  it('cut and delete only take away: no two nets become one', () => {
    const ed = headlessEditor(nand2());
    const groups = pinGroups(ed.state());
    setSelection({ parts: ['p5'], wires: [] }); // the label Y on the drain wire
    ed.key('x', { ctrl: true });
    setSelection({ parts: [], wires: ['w2'] });
    ed.key('Delete');
    expect(ed.state().history.past).toHaveLength(2);
    const after = pinGroups(ed.state());
    // Every pair of pins together now was together before.
    for (const [a, ga] of after)
      for (const [b, gb] of after) if (ga === gb) expect(groups.get(a)).toBe(groups.get(b));
  });
});
