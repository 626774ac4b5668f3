import { describe, expect, it } from 'vitest';
import { judgeNetChanges } from '../../src/core/sheet/netChanges.ts';
import { sheetToNetlist } from '../../src/core/sheet/toNetlist.ts';
import { moveItems } from '../../src/core/sheet/transform.ts';
import type { Sheet } from '../../src/core/sheet/types.ts';
import { drawnInverter, part } from './fixtures.ts';

/**
 * Joins and cuts between two drawings, located where they happen (docs/semantics.md §1). The
 * inverter fixture's nets are read off the drawing: A (gates), Y (drains), VDD, GND.
 */
const judge = (a: Sheet, b: Sheet, deliberate?: Parameters<typeof judgeNetChanges>[4]) =>
  judgeNetChanges(a, sheetToNetlist(a), b, sheetToNetlist(b), deliberate);

describe('judging a change of connectivity', () => {
  it('finds nothing when only positions change', () => {
    const sheet = drawnInverter();
    expect(judge(sheet, moveItems(sheet, { parts: ['p6'], wires: [] }, 0, 3))).toEqual({
      unasked: [],
      made: [],
    });
  });

  it('locates a join at the new contact and names the nets as they were', () => {
    const sheet = drawnInverter();
    // The output pin Y moved onto the gate wire's bend at (-4, 3): Y and A become one.
    const moved: Sheet = {
      ...sheet,
      parts: sheet.parts.map((p) => (p.id === 'p6' ? { ...p, x: -4, y: 3 } : p)),
      wires: sheet.wires.filter((w) => w.id !== 'w2'),
    };
    const verdict = judge({ ...sheet, wires: moved.wires }, moved);
    expect(verdict.unasked).toHaveLength(1);
    expect(verdict.unasked[0]).toMatchObject({ kind: 'join', at: { x: -4, y: 3 } });
    expect([...verdict.unasked[0]!.nets].sort()).toEqual(['A', 'Y']);
  });

  it('locates a cut at the lost contact', () => {
    const sheet = drawnInverter();
    // The VDD rail pulled off the PMOS source without a wire: the source loses its supply.
    const pulled: Sheet = {
      ...sheet,
      parts: sheet.parts.map((p) => (p.id === 'p3' ? { ...p, x: 6, y: -8 } : p)),
    };
    const verdict = judge(sheet, pulled);
    expect(verdict.unasked).toEqual([
      expect.objectContaining({ kind: 'cut', nets: ['VDD'], at: { x: 0, y: -5 } }),
    ]);
  });

  it('sets a contact the caller calls deliberate apart from the rest', () => {
    const sheet: Sheet = { parts: [part('a', 'label', 'P', 0, 0), part('b', 'label', 'Q', 3, 0)], wires: [] };
    const moved: Sheet = { ...sheet, parts: [sheet.parts[0]!, { ...sheet.parts[1]!, x: 0 }] };
    const verdict = judge(sheet, moved, (a, b) => a.type === 'pin' && b.type === 'pin');
    expect(verdict.unasked).toEqual([]);
    expect(verdict.made).toEqual([expect.objectContaining({ kind: 'join', at: { x: 0, y: 0 } })]);
  });
});
