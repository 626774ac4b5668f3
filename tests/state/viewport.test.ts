import { describe, expect, it } from 'vitest';
import {
  fitRect,
  MAX_SCALE,
  MIN_SCALE,
  minScaleFor,
  screenToSheet,
  sheetToScreen,
  zoomAt,
} from '../../src/state/viewport.ts';

describe('viewport maths', () => {
  const v = { x: 120, y: -40, scale: 20 };

  it('converts screen to sheet and back', () => {
    const p = { x: 333, y: 71 };
    const back = sheetToScreen(v, screenToSheet(v, p));
    expect(back.x).toBeCloseTo(p.x, 9);
    expect(back.y).toBeCloseTo(p.y, 9);
  });

  it('zooms about the cursor: the sheet point under it stays under it', () => {
    const cursor = { x: 410, y: 260 };
    const before = screenToSheet(v, cursor);
    const after = screenToSheet(zoomAt(v, cursor, 1.7), cursor);
    expect(after.x).toBeCloseTo(before.x, 9);
    expect(after.y).toBeCloseTo(before.y, 9);
  });

  it('stops at the zoom limits', () => {
    expect(zoomAt(v, { x: 0, y: 0 }, 1000).scale).toBe(MAX_SCALE);
  });

  it('fits a cell of any size: 200 inverter stages 8 units apart in an 800-pixel screen', () => {
    // 1,600 units wide: (800 − 80) / 1600 = 0.45 px per unit, well under the usual floor of 4.
    const wide = { x0: 0, y0: -10, x1: 1600, y1: 10 };
    expect(fitRect(wide, 800, 600, 40).scale).toBeCloseTo(0.45, 9);
    expect(minScaleFor(wide, 800, 600)).toBeCloseTo(0.45, 9);
    // Zooming out stops at the scale that shows the whole cell, not at 4.
    expect(
      zoomAt({ x: 0, y: 0, scale: 1 }, { x: 0, y: 0 }, 0.01, minScaleFor(wide, 800, 600)).scale,
    ).toBeCloseTo(0.45, 9);
    expect(minScaleFor({ x0: 0, y0: 0, x1: 10, y1: 10 }, 800, 600)).toBe(MIN_SCALE);
  });

  it('fits a box centred in the screen with its margin', () => {
    const f = fitRect({ x0: -10, y0: -5, x1: 10, y1: 5 }, 800, 600, 40);
    // Width limits: (800 − 80) / 20 = 36 px per unit; height would allow (600 − 80) / 10 = 52.
    expect(f.scale).toBe(36);
    expect(sheetToScreen(f, { x: 0, y: 0 })).toEqual({ x: 400, y: 300 });
  });
});
