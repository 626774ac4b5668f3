// Geometry of our own viewport culling, not published values: no source applies.
import { describe, expect, it } from 'vitest';
import { textDetail, visibleItems, visibleRect } from '../../src/editor/visible.ts';
import { drawnInverter, part } from '../sheet/fixtures.ts';

describe('scene culling', () => {
  it('keeps what overlaps the screen (with a margin) and drops what is far off', () => {
    const sheet = {
      ...drawnInverter(),
      parts: [...drawnInverter().parts, part('far', 'nmos', 'N9', 500, 500)],
    };
    // 800 × 600 px at 20 px per unit with (0,0) at the screen centre: x −20…20, y −15…15.
    const view = visibleRect({ x: 400, y: 300, scale: 20 }, { width: 800, height: 600 });
    const shown = visibleItems(sheet, view);
    expect(shown.parts.map((p) => p.id)).toEqual(['p1', 'p2', 'p3', 'p4', 'p5', 'p6']);
    expect(shown.wires).toHaveLength(4);
  });

  it('drops values, then names, as the zoom makes text too small to read', () => {
    expect([textDetail(20), textDetail(8), textDetail(4)]).toEqual(['full', 'names', 'none']);
  });
});
