/**
 * Where the sheet is on screen, as actions over the store: view the whole cell, zoom, and bring
 * items into view. The editor's commands and the panels' jumps both call these, so the panels
 * never reach into the editor.
 */
import { partBounds, pointsBounds, unionRects, type Rect } from '../core/sheet/geometry.ts';
import type { ItemIds } from '../core/sheet/selection.ts';
import { setViewport, store } from './store.ts';
import { fitRect, minScaleFor, zoomAt } from './viewport.ts';
import type { Sheet, SheetPart, SheetWire } from '../core/sheet/types.ts';

/** The whole sheet's box, remembered per sheet object: zooming asks for it on every wheel step. */
const wholeSheetBounds = new WeakMap<Sheet, Rect | null>();

/** The box around the given items, or around the whole sheet; null when there is nothing. */
export function sheetBounds(ids?: ItemIds): Rect | null {
  const sheet = store.getState().doc.sheet;
  if (!ids) {
    if (!wholeSheetBounds.has(sheet)) wholeSheetBounds.set(sheet, boundsOf(sheet.parts, sheet.wires));
    return wholeSheetBounds.get(sheet) ?? null;
  }
  const parts = new Set(ids.parts);
  const wires = new Set(ids.wires);
  return boundsOf(
    sheet.parts.filter((p) => parts.has(p.id)),
    sheet.wires.filter((w) => wires.has(w.id)),
  );
}

function boundsOf(parts: readonly SheetPart[], wires: readonly SheetWire[]): Rect | null {
  return unionRects([...parts.map(partBounds), ...wires.flatMap((w) => pointsBounds(w.points) ?? [])]);
}

/** How far out the wheel and the zoom buttons may go: far enough to see the whole cell. */
export function zoomFloor(): number {
  const { screen } = store.getState();
  return minScaleFor(sheetBounds(), screen.width, screen.height);
}

export function fitToView(): void {
  const { screen } = store.getState();
  setViewport(fitRect(sheetBounds(), screen.width, screen.height));
}

/** Centres the items (zooming out only if they do not fit), for jumps from the panels. */
export function revealItems(ids: ItemIds): void {
  const box = sheetBounds(ids);
  if (!box) return;
  const { screen, viewport } = store.getState();
  const fitted = fitRect(box, screen.width, screen.height, 120);
  const scale = Math.min(fitted.scale, viewport.scale);
  const cx = (box.x0 + box.x1) / 2;
  const cy = (box.y0 + box.y1) / 2;
  setViewport({ scale, x: screen.width / 2 - cx * scale, y: screen.height / 2 - cy * scale });
}

export function zoomBy(factor: number): void {
  const { screen, viewport } = store.getState();
  setViewport(zoomAt(viewport, { x: screen.width / 2, y: screen.height / 2 }, factor, zoomFloor()));
}
