/**
 * The one rule for editing commands that move things (docs/semantics.md §1, "No silent
 * connections"): Turn, Flip, the arrow nudges and drags keep every connection and make no new one.
 * An arrangement that would join or cut nets is refused: nothing changes, the message names the
 * nets, and the places are marked on the sheet. Only wiring actions connect: a wire, a net name, or
 * a pin dropped on a pin or a wire end (placing a part, or a drag that ends there); those contacts
 * are marked on the sheet and the edit is one undo away.
 */
import type { Point, Sheet } from '../core/sheet/types.ts';
import type { ItemIds } from '../core/sheet/selection.ts';
import {
  judgeNetChanges,
  type DeliberateContact,
  type NetChange,
  type NetVerdict,
} from '../core/sheet/netChanges.ts';
import { movingParts } from '../core/sheet/transform.ts';
import { pinPositions } from '../core/sheet/geometry.ts';
import { derivedSheet } from '../state/document.ts';
import { cancelGesture, commitDoc, endGesture, setContactMarks, showMessage, store } from '../state/store.ts';

/** Names in a list: "VDD and Y", "A, B and C". */
function nameList(names: readonly string[]): string {
  return names.length <= 1 ? (names[0] ?? '') : `${names.slice(0, -1).join(', ')} and ${names.at(-1)}`;
}

/** "join VDD and Y", "join A and B; Y and x1", "cut net Q apart". */
function changesText(changes: readonly NetChange[]): string {
  const joins = [
    ...new Set(changes.filter((c) => c.kind === 'join').map((c) => nameList([...new Set(c.nets)]))),
  ];
  const cuts = [...new Set(changes.filter((c) => c.kind === 'cut').map((c) => c.nets[0]!))];
  const parts = [
    ...(joins.length > 0 ? [`join ${joins.join('; ')}`] : []),
    ...(cuts.length > 0 ? [`cut ${cuts.length === 1 ? 'net' : 'nets'} ${nameList(cuts)} apart`] : []),
  ];
  return parts.join(', and ');
}

const ARRANGE_ADVICE = 'Moving parts never connects or cuts nets: draw a wire, or give the nets one name.';
const PLACE_ADVICE = 'A pin there would touch two nets at once: place the part elsewhere and draw wires.';

/** "Turn not done: it would join VDD and Y (the place is marked on the sheet). …" */
export function refusalText(verb: string, changes: readonly NetChange[], advice = ARRANGE_ADVICE): string {
  const places = changes.length === 1 ? 'the place is marked' : `${changes.length} places are marked`;
  return `${verb} not done: it would ${changesText(changes)} (${places} on the sheet). ${advice}`;
}

/** Judges `next` against the document's current sheet, whose nets the store already holds. */
export function judgeSheet(next: Sheet, deliberate?: DeliberateContact): NetVerdict {
  const { doc, geometry } = store.getState();
  return judgeNetChanges(doc.sheet, geometry, next, derivedSheet(next, doc.name), deliberate);
}

/** As judgeSheet, for the sheet a running gesture started from. */
export function judgeGesture(start: Sheet, next: Sheet, deliberate?: DeliberateContact): NetVerdict {
  const { doc, geometry } = store.getState();
  return judgeNetChanges(start, geometry, next, derivedSheet(next, doc.name), deliberate);
}

const points = (changes: readonly NetChange[]): Point[] => changes.map((c) => c.at);

/** Refusal: the message and the marks. */
export function refuse(verb: string, verdict: NetVerdict, advice?: string): void {
  showMessage('warning', refusalText(verb, verdict.unasked, advice));
  setContactMarks({ kind: 'refused', at: points(verdict.unasked) });
}

/** After a committed edit: where it connected on purpose. */
export function markMade(verdict: NetVerdict): void {
  if (verdict.made.length > 0) setContactMarks({ kind: 'made', at: points(verdict.made) });
}

/**
 * A contact a designer makes on purpose by dropping: a pin of something that moved lands on a pin,
 * or on the end of a wire, that did not move.
 */
export function dropContact(moved: ReadonlySet<string>, sheet: Sheet): DeliberateContact {
  const movedPin = (ref: Parameters<DeliberateContact>[0]): boolean =>
    ref.type === 'pin' && moved.has(ref.partId);
  const landing = (ref: Parameters<DeliberateContact>[0], at: Point): boolean => {
    if (ref.type === 'pin') return !moved.has(ref.partId);
    const wire = sheet.wires.find((w) => w.id === ref.wireId);
    const ends = wire === undefined ? [] : [wire.points[0], wire.points[wire.points.length - 1]];
    return ends.some((e) => e !== undefined && e.x === at.x && e.y === at.y);
  };
  return (a, b, at) => (movedPin(a) && landing(b, at)) || (movedPin(b) && landing(a, at));
}

/**
 * The end of a drag: committed as one undo step when it keeps the circuit (or only drops pins on
 * pins or wire ends, which connects them on purpose); otherwise rolled back and refused.
 */
export function finishMove(ids: ItemIds): void {
  const s = store.getState();
  const start = s.history.gestureStart;
  if (start === null || start.sheet === s.doc.sheet) return endGesture();
  const verdict = judgeGesture(
    start.sheet,
    s.doc.sheet,
    dropContact(movingParts(start.sheet, ids), s.doc.sheet),
  );
  if (verdict.unasked.length > 0) {
    cancelGesture();
    refuse('Move', verdict);
    return;
  }
  endGesture();
  markMade(verdict);
}

/** Places a new part, connecting each pin to what it lands on, unless that joins two nets. */
export function placePart(next: Sheet, partId: string): boolean {
  const verdict = judgeSheet(next);
  if (verdict.unasked.length > 0) {
    refuse('Placing', verdict, PLACE_ADVICE);
    return false;
  }
  commitDoc((doc) => ({ ...doc, sheet: next }));
  const touching = pinsTouching(partId);
  if (touching.length > 0) setContactMarks({ kind: 'made', at: touching });
  return true;
}

/** Pins of a part whose net has anything else on it (another pin or a wire). */
function pinsTouching(partId: string): Point[] {
  const { doc, geometry } = store.getState();
  const part = doc.sheet.parts.find((p) => p.id === partId);
  if (part === undefined) return [];
  const count = new Map<string, number>();
  for (const net of [...geometry.pinNets.values(), ...Object.values(geometry.wireNets)])
    count.set(net, (count.get(net) ?? 0) + 1);
  return pinPositions(part)
    .filter((pin) => (count.get(geometry.pinNets.get(`${partId}.${pin.pin}`) ?? '') ?? 0) > 1)
    .map((pin) => ({ x: pin.x, y: pin.y }));
}
