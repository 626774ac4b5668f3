/**
 * Drawing a wire: from a start point, each click adds a bend (an elbow route to the click);
 * clicking a pin or a wire, double-clicking the same point, or releasing a drag on a pin ends it.
 * States: idle → routing → idle. Escape drops the unfinished wire.
 */
import type { Point } from '../../core/sheet/types.ts';
import { samePoint, snapPoint } from '../../core/sheet/geometry.ts';
import { hitTest } from '../../core/sheet/hitTest.ts';
import { indexFor } from './sheetIndex.ts';
import { elbowRoute, normalizePath } from '../../core/sheet/routing.ts';
import { addWire } from '../../core/sheet/edits.ts';
import { commitDoc, setGesture, store } from '../../state/store.ts';
import type { ToolMachine } from './types.ts';

type State =
  | { readonly name: 'idle' }
  | { readonly name: 'routing'; readonly points: readonly Point[]; readonly horizontalFirst: boolean | null };

export interface WireTool extends ToolMachine {
  /** Starts routing at a point (a pin, typically) — the select tool hands over here. */
  start(at: Point): void;
}

/** The path the wire would take if the user clicked at `cursor`. */
function previewPath(s: Extract<State, { name: 'routing' }>, cursor: Point): Point[] {
  const last = s.points[s.points.length - 1]!;
  const hFirst = s.horizontalFirst ?? Math.abs(cursor.x - last.x) >= Math.abs(cursor.y - last.y);
  return normalizePath([...s.points, ...elbowRoute(last, cursor, hFirst).slice(1)]);
}

/** Whether a wire ending at p lands on something it connects to. */
function landsOnConnection(p: Point, start: Point): boolean {
  if (samePoint(p, start)) return false;
  const hit = hitTest(indexFor(store.getState().doc.sheet), p, { pinRadius: 0.1, wireRadius: 0.1 });
  return hit !== null && hit.type !== 'part';
}

export function createWireTool(onDone: () => void): WireTool {
  let s: State = { name: 'idle' };
  const show = (cursor: Point): void => {
    if (s.name === 'routing') setGesture({ type: 'wiring', points: previewPath(s, cursor), cursor });
  };
  const finish = (points: readonly Point[]): void => {
    s = { name: 'idle' };
    setGesture(null);
    if (normalizePath(points).length >= 2)
      commitDoc((doc) => ({ ...doc, sheet: addWire(doc.sheet, points) }));
    onDone();
  };
  return {
    name: 'wire',
    state: () => s.name,
    start(at) {
      s = { name: 'routing', points: [snapPoint(at)], horizontalFirst: null };
      show(snapPoint(at));
    },
    down(e) {
      if (s.name === 'idle') this.start(e.at);
    },
    move(e) {
      if (s.name !== 'routing') return;
      const cursor = snapPoint(e.at);
      const last = s.points[s.points.length - 1]!;
      // The first move away from the last point fixes which way the elbow turns.
      if (s.horizontalFirst === null && !samePoint(cursor, last)) {
        s = { ...s, horizontalFirst: Math.abs(cursor.x - last.x) >= Math.abs(cursor.y - last.y) };
      }
      show(cursor);
    },
    up(e) {
      if (s.name !== 'routing') return;
      const at = snapPoint(e.at);
      const last = s.points[s.points.length - 1]!;
      if (samePoint(at, last)) {
        // A click on the last point: the start click itself, or a double click that ends the wire.
        if (s.points.length > 1) finish(s.points);
        return;
      }
      const points = previewPath(s, at);
      if (landsOnConnection(at, s.points[0]!)) finish(points);
      else s = { name: 'routing', points, horizontalFirst: null };
    },
    cancel() {
      if (s.name === 'idle') return false;
      s = { name: 'idle' };
      setGesture(null);
      onDone();
      return true;
    },
  };
}
