/**
 * Where the sheet is on screen, as actions over the store: view the whole cell, zoom, and bring
 * items into view. The editor's commands and the panels' jumps both call these, so the panels
 * never reach into the editor.
 */
import { partBounds, pointsBounds, unionRects, type Rect } from '../core/sheet/geometry.ts';
import type { ItemIds } from '../core/sheet/selection.ts';
import { setViewport, store } from './store.ts';
import { fitRect, zoomAt } from './viewport.ts';

/** The box around the given items, or around the whole sheet; null when there is nothing. */
export function sheetBounds(ids?: ItemIds): Rect | null {
  const sheet = store.getState().doc.sheet;
  const parts = ids ? sheet.parts.filter((p) => ids.parts.includes(p.id)) : sheet.parts;
  const wires = ids ? sheet.wires.filter((w) => ids.wires.includes(w.id)) : sheet.wires;
  return unionRects([...parts.map(partBounds), ...wires.flatMap((w) => pointsBounds(w.points) ?? [])]);
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
  setViewport(zoomAt(viewport, { x: screen.width / 2, y: screen.height / 2 }, factor));
}
