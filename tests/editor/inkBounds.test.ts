// Geometry of our own drawing and repainting, not published values: no source applies.
import { describe, expect, it } from 'vitest';
import { changedAreas, itemsMeeting, partInk, sheetInk } from '../../src/editor/canvas/inkBounds.ts';
import { textDetail } from '../../src/editor/devices/symbolPainter.ts';
import { moveItems } from '../../src/core/sheet/transform.ts';
import { drawnInverter, part } from '../sheet/fixtures.ts';

describe('what a repaint draws and where', () => {
  it('keeps what meets an area and drops what is far off', () => {
    const sheet = {
      ...drawnInverter(),
      parts: [...drawnInverter().parts, part('far', 'nmos', 'N9', 500, 500)],
    };
    const shown = itemsMeeting(sheet, { x0: -20, y0: -15, x1: 20, y1: 15 });
    expect(shown.parts.map((p) => p.id)).toEqual(['p1', 'p2', 'p3', 'p4', 'p5', 'p6']);
    expect(shown.wires).toHaveLength(4);
    expect(sheetInk(sheet)!.x1).toBeGreaterThan(500);
  });

  it('counts a part’s text in its ink', () => {
    const label = part('l', 'label', 'A_VERY_LONG_NET_NAME', 0, 0);
    expect(partInk(label).x1 - partInk(label).x0).toBeGreaterThan(8);
  });

  it('drops values, then names, as the zoom makes text too small to read', () => {
    expect([textDetail(20), textDetail(8), textDetail(4)]).toEqual(['full', 'names', 'none']);
  });

  it('repaints only the old and new places of what an edit moved', () => {
    const sheet = drawnInverter();
    const moved = moveItems(sheet, { parts: ['p6'], wires: [] }, 0, 3); // output pin Y and its wire
    const areas = changedAreas({ sheet, marks: [] }, { sheet: moved, marks: [] });
    expect(areas).not.toBe('all');
    // Y's part and w2 changed: two areas each (before and after).
    expect((areas as unknown[]).length).toBe(4);
    expect(changedAreas({ sheet, marks: [] }, { sheet, marks: [] })).toEqual([]);
  });
});
