/**
 * A bitmap of part of the sheet, kept between frames so panning and zooming copy pixels instead of
 * drawing thousands of shapes. The bitmap covers the screen plus half a screen all round (clipped to
 * the drawing), at the scale it was drawn at:
 * - a pan that stays inside it is one image copy;
 * - a zoom shows the bitmap scaled at once and draws it afresh when the wheel rests (SETTLE_MS);
 *   zooming out past its edges leaves them empty meanwhile while it still shows most of the view;
 * - a change of content repaints only the areas given to `invalidate` (cleared, then drawn again
 *   clipped to them), or everything when told so.
 * Drawing is delegated to a painter that draws whatever meets an area, in sheet units.
 */
import type { Rect } from '../../core/sheet/geometry.ts';

export interface View {
  readonly x: number;
  readonly y: number;
  readonly scale: number;
}

export interface Screen {
  readonly width: number;
  readonly height: number;
}

/** Draws everything that meets `area` (sheet units); the context maps sheet units to pixels. */
export type AreaPainter = (ctx: CanvasRenderingContext2D, area: Rect, scale: number) => void;

/** Milliseconds without a change of zoom before the bitmap is drawn afresh at the new scale. */
export const SETTLE_MS = 140;
/** How far the bitmap reaches past each screen edge, as a fraction of the screen. */
const REACH = 0.5;
/** Dirty areas beyond this many are merged into a full repaint. */
const MAX_AREAS = 48;

/** Where the bitmap is: the screen rectangle (CSS px) it was drawn as, in the view of that time. */
interface Placement {
  readonly view: View;
  readonly left: number;
  readonly top: number;
  readonly width: number;
  readonly height: number;
  readonly ratio: number;
}

const intersect = (a: Rect, b: Rect): Rect | null => {
  const r = {
    x0: Math.max(a.x0, b.x0),
    y0: Math.max(a.y0, b.y0),
    x1: Math.min(a.x1, b.x1),
    y1: Math.min(a.y1, b.y1),
  };
  return r.x0 <= r.x1 && r.y0 <= r.y1 ? r : null;
};

/** During a zoom, a bitmap showing at least this share of the view is enough until the wheel rests. */
const MOSTLY = 0.6;

/** The share of `view`'s area that `held` covers. */
function coverage(held: Rect, view: Rect): number {
  const both = intersect(held, view);
  const area = (r: Rect): number => Math.max(0, r.x1 - r.x0) * Math.max(0, r.y1 - r.y0);
  return both === null || area(view) === 0 ? 0 : area(both) / area(view);
}

const contains = (outer: Rect, inner: Rect): boolean =>
  inner.x0 >= outer.x0 && inner.y0 >= outer.y0 && inner.x1 <= outer.x1 && inner.y1 <= outer.y1;

/** The sheet rectangle a screen rectangle shows in a view. */
function sheetRect(view: View, left: number, top: number, width: number, height: number): Rect {
  return {
    x0: (left - view.x) / view.scale,
    y0: (top - view.y) / view.scale,
    x1: (left + width - view.x) / view.scale,
    y1: (top + height - view.y) / view.scale,
  };
}

export class ViewCache {
  private canvas: HTMLCanvasElement | null = null;
  private placement: Placement | null = null;
  private pending: 'all' | Rect[] = 'all';
  private settleTimer: ReturnType<typeof setTimeout> | null = null;

  /**
   * `redraw` asks the canvas for another frame (the bitmap was drawn afresh after a zoom);
   * `makeCanvas` makes the bitmap (tests give one of their own).
   */
  constructor(
    private readonly redraw: () => void,
    private readonly makeCanvas: () => HTMLCanvasElement = () => document.createElement('canvas'),
  ) {}

  /** Marks areas (sheet units) to draw again at the next frame, or everything. */
  invalidate(areas: 'all' | readonly Rect[]): void {
    if (areas === 'all' || this.pending === 'all') this.pending = 'all';
    else this.pending = [...this.pending, ...areas];
    if (this.pending !== 'all' && this.pending.length > MAX_AREAS) this.pending = 'all';
  }

  dispose(): void {
    if (this.settleTimer !== null) clearTimeout(this.settleTimer);
    this.canvas = null;
  }

  /**
   * Draws the view onto `ctx` (a screen canvas of `ratio` pixels per CSS pixel), bringing the bitmap
   * up to date first. `bounds` is the drawing's extent: nothing outside it needs a bitmap.
   */
  draw(
    ctx: CanvasRenderingContext2D,
    view: View,
    screen: Screen,
    ratio: number,
    paint: AreaPainter,
    bounds: Rect | null,
  ): void {
    if (bounds === null || screen.width <= 0 || screen.height <= 0) return;
    const wanted = intersect(sheetRect(view, 0, 0, screen.width, screen.height), bounds);
    if (wanted === null) return;
    const p = this.placement;
    const held = p && sheetRect(p.view, p.left, p.top, p.width, p.height);
    const zooming = p !== null && p.view.scale !== view.scale;
    // While the wheel turns, a bitmap that still shows most of the view is shown scaled, its edges
    // left for the fresh one drawn when the wheel rests: every zoom frame stays a copy.
    const enough = held !== null && (contains(held, wanted) || (zooming && coverage(held, wanted) >= MOSTLY));
    if (this.pending === 'all' || !p || p.ratio !== ratio || !enough) {
      this.render(view, screen, ratio, paint, bounds);
    } else {
      if (this.pending.length > 0) this.repaint(this.pending, paint);
      if (p.view.scale !== view.scale) this.settleLater();
    }
    this.blit(ctx, view, screen, ratio);
  }

  private settleLater(): void {
    if (this.settleTimer !== null) clearTimeout(this.settleTimer);
    this.settleTimer = setTimeout(() => {
      this.settleTimer = null;
      this.pending = 'all';
      this.redraw();
    }, SETTLE_MS);
  }

  /** Draws the bitmap afresh for this view: the screen plus REACH all round, clipped to `bounds`. */
  private render(view: View, screen: Screen, ratio: number, paint: AreaPainter, bounds: Rect): void {
    const reachX = screen.width * REACH;
    const reachY = screen.height * REACH;
    const onScreen = {
      x0: Math.floor(Math.max(-reachX, bounds.x0 * view.scale + view.x - 2)),
      y0: Math.floor(Math.max(-reachY, bounds.y0 * view.scale + view.y - 2)),
      x1: Math.ceil(Math.min(screen.width + reachX, bounds.x1 * view.scale + view.x + 2)),
      y1: Math.ceil(Math.min(screen.height + reachY, bounds.y1 * view.scale + view.y + 2)),
    };
    const width = Math.max(1, onScreen.x1 - onScreen.x0);
    const height = Math.max(1, onScreen.y1 - onScreen.y0);
    this.canvas ??= this.makeCanvas();
    this.canvas.width = Math.ceil(width * ratio);
    this.canvas.height = Math.ceil(height * ratio);
    this.placement = { view, left: onScreen.x0, top: onScreen.y0, width, height, ratio };
    this.pending = [];
    const ctx = this.context();
    if (ctx === null) return;
    paint(ctx, sheetRect(view, onScreen.x0, onScreen.y0, width, height), view.scale);
  }

  /** The bitmap's context with sheet units mapped to its pixels. */
  private context(): CanvasRenderingContext2D | null {
    const p = this.placement;
    const ctx = this.canvas?.getContext('2d') ?? null;
    if (ctx === null || p === null) return null;
    const k = p.ratio * p.view.scale;
    ctx.setTransform(k, 0, 0, k, p.ratio * (p.view.x - p.left), p.ratio * (p.view.y - p.top));
    return ctx;
  }

  /** Clears the given areas and draws them again, clipped, in one pass of the painter. */
  private repaint(areas: readonly Rect[], paint: AreaPainter): void {
    const ctx = this.context();
    const p = this.placement;
    this.pending = [];
    if (ctx === null || p === null) return;
    const pad = 1.5 / p.view.scale; // antialiased edges reach a pixel past a shape
    // Each area grows to whole pixels of the bitmap, so the clip has no soft edge: a pixel is either
    // drawn afresh or left alone, and a repaint leaves exactly what a full render would.
    const k = p.ratio * p.view.scale;
    const ox = p.ratio * (p.view.x - p.left);
    const oy = p.ratio * (p.view.y - p.top);
    const snapped = areas.map((a) => ({
      x0: (Math.floor(k * (a.x0 - pad) + ox) - ox) / k,
      y0: (Math.floor(k * (a.y0 - pad) + oy) - oy) / k,
      x1: (Math.ceil(k * (a.x1 + pad) + ox) - ox) / k,
      y1: (Math.ceil(k * (a.y1 + pad) + oy) - oy) / k,
    }));
    ctx.save();
    ctx.beginPath();
    for (const a of snapped) ctx.rect(a.x0, a.y0, a.x1 - a.x0, a.y1 - a.y0);
    ctx.clip();
    const all = snapped.reduce((u, a) => ({
      x0: Math.min(u.x0, a.x0),
      y0: Math.min(u.y0, a.y0),
      x1: Math.max(u.x1, a.x1),
      y1: Math.max(u.y1, a.y1),
    }));
    ctx.clearRect(all.x0, all.y0, all.x1 - all.x0, all.y1 - all.y0);
    paint(ctx, all, p.view.scale);
    ctx.restore();
  }

  /** Copies the bitmap to the screen, scaled when the zoom has moved on since it was drawn. */
  private blit(ctx: CanvasRenderingContext2D, view: View, screen: Screen, ratio: number): void {
    const p = this.placement;
    if (!this.canvas || !p) return;
    const k = view.scale / p.view.scale;
    const x = ((p.left - p.view.x) / p.view.scale) * view.scale + view.x;
    const y = ((p.top - p.view.y) / p.view.scale) * view.scale + view.y;
    // Only the part of the bitmap that lands on the screen is copied: a zoomed-in copy costs the
    // screen's pixels, not the bitmap's blown up.
    const dx0 = Math.max(0, x);
    const dy0 = Math.max(0, y);
    const dx1 = Math.min(screen.width, x + p.width * k);
    const dy1 = Math.min(screen.height, y + p.height * k);
    if (dx1 <= dx0 || dy1 <= dy0) return;
    ctx.save();
    ctx.setTransform(ratio, 0, 0, ratio, 0, 0);
    ctx.imageSmoothingEnabled = k < 1;
    ctx.drawImage(
      this.canvas,
      ((dx0 - x) / k) * ratio,
      ((dy0 - y) / k) * ratio,
      ((dx1 - dx0) / k) * ratio,
      ((dy1 - dy0) / k) * ratio,
      dx0,
      dy0,
      dx1 - dx0,
      dy1 - dy0,
    );
    ctx.restore();
  }
}
