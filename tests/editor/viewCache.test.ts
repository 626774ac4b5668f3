// When the sheet's bitmaps are drawn again: behaviour of our own drawing; no source applies.
import { afterEach, describe, expect, it, vi } from 'vitest';
import { SETTLE_MS, ViewCache, type AreaPainter } from '../../src/editor/canvas/viewCache.ts';
import type { Rect } from '../../src/core/sheet/geometry.ts';

/** A canvas that records nothing but accepts every call the cache makes. */
function fakeCanvas(): HTMLCanvasElement {
  const ctx = new Proxy({}, { get: (_t, k) => (k === 'canvas' ? undefined : () => {}), set: () => true });
  return { width: 0, height: 0, getContext: () => ctx } as unknown as HTMLCanvasElement;
}

const screen = { width: 800, height: 600 };
const bounds: Rect = { x0: -1000, y0: -1000, x1: 1000, y1: 1000 };
const screenCtx = fakeCanvas().getContext('2d') as CanvasRenderingContext2D;

function setUp() {
  const areas: Rect[] = [];
  const paint: AreaPainter = (_ctx, area) => void areas.push(area);
  const redraw = vi.fn();
  const cache = new ViewCache(redraw, fakeCanvas);
  const draw = (view: { x: number; y: number; scale: number }) =>
    cache.draw(screenCtx, view, screen, 1, paint, bounds);
  return { areas, redraw, cache, draw };
}

afterEach(() => vi.useRealTimers());

describe('the bitmap of a view', () => {
  it('is drawn once, then only copied while a pan stays within half a screen', () => {
    const { areas, draw } = setUp();
    draw({ x: 400, y: 300, scale: 20 });
    expect(areas).toHaveLength(1);
    for (let dx = 0; dx <= 360; dx += 40) draw({ x: 400 - dx, y: 300, scale: 20 });
    expect(areas).toHaveLength(1);
    draw({ x: 400 - 500, y: 300, scale: 20 }); // past the reach
    expect(areas).toHaveLength(2);
  });

  it('is shown scaled while zooming and drawn afresh once the wheel rests', () => {
    vi.useFakeTimers();
    const { areas, redraw, draw } = setUp();
    draw({ x: 400, y: 300, scale: 20 });
    for (let k = 1; k <= 5; k++) draw({ x: 400, y: 300, scale: 20 * 1.08 ** k });
    for (let k = 4; k >= -4; k--) draw({ x: 400, y: 300, scale: 20 * 1.08 ** k });
    expect(areas).toHaveLength(1);
    vi.advanceTimersByTime(SETTLE_MS + 1);
    expect(redraw).toHaveBeenCalledTimes(1);
    draw({ x: 400, y: 300, scale: 20 * 1.08 ** -4 });
    expect(areas).toHaveLength(2);
  });

  it('is drawn at once when zooming out leaves too little of the view covered', () => {
    const { areas, draw } = setUp();
    draw({ x: 400, y: 300, scale: 20 });
    draw({ x: 400, y: 300, scale: 5 });
    expect(areas).toHaveLength(2);
  });

  it('repaints only the areas a change touched', () => {
    const { areas, cache, draw } = setUp();
    draw({ x: 400, y: 300, scale: 20 });
    cache.invalidate([{ x0: 1, y0: 1, x1: 2, y1: 2 }]);
    draw({ x: 400, y: 300, scale: 20 });
    expect(areas).toHaveLength(2);
    // The repaint covers the changed area with a pixel's margin, not the screen.
    expect(areas[1]!.x1 - areas[1]!.x0).toBeLessThan(2);
  });

  it('repaints whole pixels of the bitmap, so no clip edge blends old and new', () => {
    const { areas, cache, draw } = setUp();
    const view = { x: 400.3, y: 300.7, scale: 17.3 };
    draw(view);
    cache.invalidate([{ x0: 1.01, y0: 1.37, x1: 2.21, y1: 2.9 }]);
    draw(view);
    // The bitmap starts at whole screen pixels, so whole pixels of it sit at whole screen pixels.
    const { x0, y0, x1, y1 } = areas[1]!;
    for (const [at, offset] of [
      [x0, view.x],
      [x1, view.x],
      [y0, view.y],
      [y1, view.y],
    ] as const) {
      const pixel = at * view.scale + offset;
      expect(Math.abs(pixel - Math.round(pixel))).toBeLessThan(1e-6);
    }
    expect(x0).toBeLessThanOrEqual(1.01 - 1.5 / view.scale);
    expect(x1).toBeGreaterThanOrEqual(2.21 + 1.5 / view.scale);
  });
});
