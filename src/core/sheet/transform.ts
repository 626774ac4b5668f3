/**
 * Moving, rotating and mirroring a selection, keeping every connection (docs/semantics.md §1).
 * Wires that are not selected but end on a moved pin, or along a moved wire, follow: their end
 * moves and the path stays orthogonal. Rails, pins and labels sitting directly on a moved part's
 * pin travel with it. A staying pin, or the middle of a staying wire, that touched something moved
 * gets a short wire from the old spot to the new one (keepContacts.ts). Whether the result makes a
 * new contact is for the caller to judge (netChanges.ts).
 */
import type { Point, Sheet, SheetPart, SheetWire } from './types.ts';
import type { ItemIds } from './selection.ts';
import { nextRotation, partBounds, pinPositions, pointKey, pointsBounds, unionRects } from './geometry.ts';
import { elbowRoute, normalizePath } from './routing.ts';
import { isDevicePart } from './parts/index.ts';
import { stayingContacts } from './keepContacts.ts';
import { nextWireId } from './naming.ts';

type PointMap = (p: Point) => Point;

/** Applies `mapPart` to selected parts and `mapPoint` to selected wires, then lets attached wires follow. */
function transformItems(
  sheet: Sheet,
  ids: ItemIds,
  mapPart: (p: SheetPart) => SheetPart,
  mapPoint: PointMap,
): Sheet {
  const partSet = movingParts(sheet, ids);
  const wireSet = new Set(ids.wires);
  const contacts = stayingContacts(sheet, partSet, wireSet);
  const moves = new Map<string, Point>();
  for (const p of contacts.follow) moves.set(pointKey(p), mapPoint(p));
  const parts = sheet.parts.map((part) => {
    if (!partSet.has(part.id)) return part;
    const next = mapPart(part);
    const before = pinPositions(part);
    pinPositions(next).forEach((pin, i) => moves.set(pointKey(before[i]!), { x: pin.x, y: pin.y }));
    return next;
  });
  const wires = sheet.wires.map((wire) => {
    if (!wireSet.has(wire.id)) return wire;
    const points = wire.points.map(mapPoint);
    for (const i of [0, wire.points.length - 1]) moves.set(pointKey(wire.points[i]!), points[i]!);
    return { ...wire, points };
  });
  const followed = wires.map((w) => (wireSet.has(w.id) ? w : followEnds(w, moves)));
  return { parts, wires: [...followed, ...tethers(sheet, contacts.tether, mapPoint)] };
}

/** A short wire from each spot that stays to where it moved, so the contact holds. */
function tethers(sheet: Sheet, spots: readonly Point[], mapPoint: PointMap): SheetWire[] {
  return spots
    .flatMap((p) => {
      const q = mapPoint(p);
      return p.x === q.x && p.y === q.y ? [] : [elbowRoute(p, q, true)];
    })
    .map((points, i) => ({ id: nextWireId(sheet, i), points }));
}

/** What a selection moves: its parts plus the names that sit on their pins (see withAttachedNames). */
export function movingParts(sheet: Sheet, ids: ItemIds): ReadonlySet<string> {
  return withAttachedNames(sheet, ids.parts);
}

/** The selected parts plus every single-pin naming part whose pin sits on one of their pins. */
function withAttachedNames(sheet: Sheet, selected: readonly string[]): Set<string> {
  const set = new Set(selected);
  const pins = new Set(
    sheet.parts.filter((p) => set.has(p.id)).flatMap((p) => pinPositions(p).map(pointKey)),
  );
  for (const part of sheet.parts) {
    if (set.has(part.id) || isDevicePart(part.kind)) continue;
    if (pinPositions(part).some((pin) => pins.has(pointKey(pin)))) set.add(part.id);
  }
  return set;
}

/** Moves the ends of a wire that sit on moved points, keeping every segment orthogonal. */
export function followEnds(wire: SheetWire, moves: ReadonlyMap<string, Point>): SheetWire {
  const pts = wire.points;
  const first = moves.get(pointKey(pts[0]!));
  const last = moves.get(pointKey(pts[pts.length - 1]!));
  if (!first && !last) return wire;
  if (first && last) {
    const dx = first.x - pts[0]!.x;
    const dy = first.y - pts[0]!.y;
    // Both ends moved alike: the wire moves whole.
    if (last.x - pts[pts.length - 1]!.x === dx && last.y - pts[pts.length - 1]!.y === dy) {
      return { ...wire, points: pts.map((p) => ({ x: p.x + dx, y: p.y + dy })) };
    }
  }
  let path = [...pts];
  if (first) path = moveStart(path, first);
  if (last) path = moveStart(path.reverse(), last).reverse();
  return { ...wire, points: normalizePath(path) };
}

/**
 * New start point `to`: when the first two segments form an L, slide the bend so the first segment
 * keeps its direction; otherwise add an elbow from `to` back to the old start.
 */
function moveStart(path: Point[], to: Point): Point[] {
  const [a, b, c] = path;
  if (a && b && c) {
    const firstHorizontal = a.y === b.y && a.x !== b.x;
    const secondVertical = b.x === c.x && b.y !== c.y;
    if (firstHorizontal && secondVertical) return [to, { x: b.x, y: to.y }, ...path.slice(2)];
    const firstVertical = a.x === b.x && a.y !== b.y;
    const secondHorizontal = b.y === c.y && b.x !== c.x;
    if (firstVertical && secondHorizontal) return [to, { x: to.x, y: b.y }, ...path.slice(2)];
  }
  return [to, { x: path[0]!.x, y: to.y }, ...path];
}

export function moveItems(sheet: Sheet, ids: ItemIds, dx: number, dy: number): Sheet {
  if (dx === 0 && dy === 0) return sheet;
  const shift = (p: Point): Point => ({ x: p.x + dx, y: p.y + dy });
  return transformItems(sheet, ids, (part) => ({ ...part, ...shift(part) }), shift);
}

/** Centre of the selection, on the grid, so that turned parts stay on the grid. */
export function selectionPivot(sheet: Sheet, ids: ItemIds): Point | null {
  const partSet = withAttachedNames(sheet, ids.parts);
  const wireSet = new Set(ids.wires);
  const parts = sheet.parts.filter((p) => partSet.has(p.id));
  if (parts.length === 1 && ids.wires.length === 0) return { x: parts[0]!.x, y: parts[0]!.y };
  const boxes = [
    ...parts.map(partBounds),
    ...sheet.wires.filter((w) => wireSet.has(w.id)).flatMap((w) => pointsBounds(w.points) ?? []),
  ];
  const box = unionRects(boxes);
  return box ? { x: Math.round((box.x0 + box.x1) / 2), y: Math.round((box.y0 + box.y1) / 2) } : null;
}

/** A quarter turn clockwise about the selection's centre. */
export function rotateItems(sheet: Sheet, ids: ItemIds): Sheet {
  const c = selectionPivot(sheet, ids);
  if (!c) return sheet;
  const turn = (p: Point): Point => ({ x: c.x - (p.y - c.y) + 0, y: c.y + (p.x - c.x) + 0 });
  return transformItems(
    sheet,
    ids,
    (part) => ({ ...part, ...turn(part), rotation: nextRotation(part.rotation) }),
    turn,
  );
}

/** Mirror left–right about the selection's centre line. */
export function mirrorItems(sheet: Sheet, ids: ItemIds): Sheet {
  const c = selectionPivot(sheet, ids);
  if (!c) return sheet;
  const flip = (p: Point): Point => ({ x: 2 * c.x - p.x + 0, y: p.y });
  // A world flip of a turned part equals the opposite turn of the mirrored part: F·R^r = R^-r·F.
  return transformItems(
    sheet,
    ids,
    (part) => ({ ...part, ...flip(part), rotation: nextRotation(0, -part.rotation), mirror: !part.mirror }),
    flip,
  );
}
