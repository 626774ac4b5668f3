/**
 * The select tool: click selects (shift toggles), dragging a selected item moves the selection
 * (one undo step; wires follow), dragging on empty sheet draws a selection box, dragging from a pin
 * starts a wire, the middle button (or dragging with Alt) pans.
 * States: idle → pointing → dragging | idle → boxing | idle → panning.
 */
import type { Point } from '../../core/sheet/types.ts';
import type { ItemIds } from '../../core/sheet/selection.ts';
import { normalizeRect } from '../../core/sheet/geometry.ts';
import { hitTest, itemsInRect, type Hit } from '../../core/sheet/hitTest.ts';
import { indexFor } from './sheetIndex.ts';
import { moveItems } from '../../core/sheet/transform.ts';
import { toggleItems } from '../../state/selection.ts';
import type { SheetDocument } from '../../state/document.ts';
import { finishMove } from '../arrange.ts';
import {
  beginGesture,
  cancelGesture,
  previewDoc,
  setGesture,
  setSelection,
  setViewport,
  store,
} from '../../state/store.ts';
import type { ToolMachine, ToolPointer } from './types.ts';

type State =
  | { readonly name: 'idle' }
  | { readonly name: 'pointing'; readonly start: Point; readonly ids: ItemIds }
  | { readonly name: 'dragging'; readonly start: Point; readonly ids: ItemIds; readonly base: SheetDocument }
  | { readonly name: 'boxing'; readonly start: Point; readonly additive: boolean }
  | { readonly name: 'panning'; readonly screen: Point; readonly origin: Point };

/** Moves shorter than this (grid units) are clicks, not drags. */
const DRAG_THRESHOLD = 0.4;

function hitIds(hit: Hit): ItemIds {
  if (hit.type === 'wire') return { parts: [], wires: [hit.wireId] };
  return { parts: [hit.partId], wires: [] };
}

function isSelected(ids: ItemIds): boolean {
  const sel = store.getState().selection.selected;
  return ids.parts.every((id) => sel.parts.includes(id)) && ids.wires.every((id) => sel.wires.includes(id));
}

/** An unfinished wire end within reach: pressing there carries the wire on. */
function openEndNear(p: Point): Point | null {
  const ends = store.getState().geometry.openEnds;
  return ends.find((q) => Math.hypot(q.x - p.x, q.y - p.y) <= 0.45) ?? null;
}

/** Rings the pin under an idle pointer: the cue that a drag from here draws a wire. */
function showPinUnder(e: ToolPointer): void {
  const hit = hitTest(indexFor(store.getState().doc.sheet), e.at);
  const current = store.getState().gesture;
  if (hit?.type === 'pin') {
    if (current?.type !== 'pin' || current.at.x !== hit.at.x || current.at.y !== hit.at.y)
      setGesture({ type: 'pin', at: hit.at });
  } else if (current?.type === 'pin') setGesture(null);
}

export function createSelectTool(startWire: (at: Point) => void): ToolMachine {
  let s: State = { name: 'idle' };
  const pointAt = (e: ToolPointer, hit: Hit | null): void => {
    if (hit === null) {
      if (!e.shift) setSelection({ parts: [], wires: [] });
      s = { name: 'boxing', start: e.at, additive: e.shift };
      return;
    }
    const ids = hitIds(hit);
    if (e.shift) setSelection(toggleItems(store.getState().selection.selected, ids));
    else if (!isSelected(ids)) setSelection(ids);
    s = { name: 'pointing', start: e.at, ids: store.getState().selection.selected };
  };
  return {
    name: 'select',
    state: () => s.name,
    down(e) {
      const { viewport, doc } = store.getState();
      if (e.button === 1 || e.button === 2) {
        s = { name: 'panning', screen: e.screen, origin: { x: viewport.x, y: viewport.y } };
        return;
      }
      const hit = hitTest(indexFor(doc.sheet), e.at);
      if (store.getState().gesture?.type === 'pin') setGesture(null);
      if (hit?.type === 'pin' && !e.shift) {
        startWire(hit.at);
        return;
      }
      const end = openEndNear(e.at);
      if (end && !e.shift) {
        startWire(end);
        return;
      }
      pointAt(e, hit);
    },
    move(e) {
      if (s.name === 'idle') return showPinUnder(e);
      if (s.name === 'panning') {
        const v = store.getState().viewport;
        setViewport({
          ...v,
          x: s.origin.x + e.screen.x - s.screen.x,
          y: s.origin.y + e.screen.y - s.screen.y,
        });
      } else if (s.name === 'boxing') {
        setGesture({ type: 'box', from: s.start, to: e.at });
      } else if (
        s.name === 'pointing' &&
        Math.hypot(e.at.x - s.start.x, e.at.y - s.start.y) > DRAG_THRESHOLD
      ) {
        beginGesture();
        s = { name: 'dragging', start: s.start, ids: s.ids, base: store.getState().doc };
      }
      if (s.name === 'dragging') {
        const dx = Math.round(e.at.x - s.start.x);
        const dy = Math.round(e.at.y - s.start.y);
        // Each frame is computed from where the drag began, so bends never pile up.
        previewDoc({ ...s.base, sheet: moveItems(s.base.sheet, s.ids, dx, dy) });
      }
    },
    up(e) {
      if (s.name === 'dragging') finishMove(s.ids);
      if (s.name === 'boxing') {
        const found = itemsInRect(store.getState().doc.sheet, normalizeRect(s.start, e.at));
        const sel = store.getState().selection.selected;
        setSelection(
          s.additive
            ? {
                parts: [...new Set([...sel.parts, ...found.parts])],
                wires: [...new Set([...sel.wires, ...found.wires])],
              }
            : found,
        );
        setGesture(null);
      }
      s = { name: 'idle' };
    },
    cancel() {
      const was = s.name;
      if (was === 'dragging') cancelGesture();
      if (was === 'boxing') setGesture(null);
      s = { name: 'idle' };
      return was !== 'idle' && was !== 'pointing';
    },
  };
}
