// Indexes read here are in range by construction, so `!` marks them (no run-time cost).
/**
 * Where a static current path runs on the sheet: through each device from the pin on its upstream net
 * to the pin on its downstream net, and along the drawn wires between one device and the next, so
 * the glowing trace follows the copper the designer drew rather than a straight line.
 */
import { pinPosition, pointKey } from '../sheet/geometry.ts';
import type { Point, Sheet, SheetPart } from '../sheet/types.ts';

/** The parts of the editor's derived geometry the route needs. */
export interface RouteGeometry {
  readonly wireNets: Readonly<Record<string, string>>;
  readonly pinNets: ReadonlyMap<string, string>;
  readonly deviceParts: Readonly<Record<string, string>>;
}

/** Channel pins, upstream first when the device is drawn the usual way round. */
const CHANNEL_PINS = ['drain', 'source', 'a', 'b'] as const;
/** Parts that hold a net at a source voltage: where a path starts and ends. */
const SOURCE_KINDS: ReadonlySet<string> = new Set(['vdd', 'gnd', 'input']);

type Adjacency = Map<string, { point: Point; next: Set<string> }>;

function onSegment(p: Point, a: Point, b: Point): boolean {
  const within = (v: number, u: number, w: number) => v >= Math.min(u, w) && v <= Math.max(u, w);
  return (
    (a.x === b.x && p.x === a.x && within(p.y, a.y, b.y)) ||
    (a.y === b.y && p.y === a.y && within(p.x, a.x, b.x))
  );
}

/** A graph of the net's wires: vertices and pin points are nodes; a segment joins the nodes along it. */
function wireGraph(sheet: Sheet, geometry: RouteGeometry, net: string, pins: readonly Point[]): Adjacency {
  const wires = sheet.wires.filter((w) => geometry.wireNets[w.id] === net);
  const graph: Adjacency = new Map();
  const node = (p: Point) => {
    const key = pointKey(p);
    if (!graph.has(key)) graph.set(key, { point: p, next: new Set() });
    return key;
  };
  [...wires.flatMap((w) => w.points), ...pins].forEach(node);
  const points = [...graph.values()].map((n) => n.point);
  for (const wire of wires) {
    for (let i = 0; i + 1 < wire.points.length; i++) {
      const [a, b] = [wire.points[i]!, wire.points[i + 1]!];
      const along = points
        .filter((p) => onSegment(p, a, b))
        .sort(
          (p, q) => Math.abs(p.x - a.x) + Math.abs(p.y - a.y) - (Math.abs(q.x - a.x) + Math.abs(q.y - a.y)),
        );
      for (let k = 0; k + 1 < along.length; k++) {
        const [u, v] = [node(along[k]!), node(along[k + 1]!)];
        graph.get(u)?.next.add(v);
        graph.get(v)?.next.add(u);
      }
    }
  }
  return graph;
}

/** Breadth-first from `from`; the route to the nearest of `targets`, or null when none is reached. */
function nearestRoute(graph: Adjacency, from: Point, targets: readonly Point[]): Point[] | null {
  const wanted = new Set(targets.map(pointKey));
  const parent = new Map<string, string | null>([[pointKey(from), null]]);
  const queue = [pointKey(from)];
  for (let head = 0; head < queue.length; head++) {
    const key = queue[head]!;
    if (wanted.has(key)) {
      const route: Point[] = [];
      for (let k: string | null = key; k !== null; k = parent.get(k) ?? null)
        route.unshift(graph.get(k)?.point ?? from);
      return route;
    }
    for (const next of graph.get(key)?.next ?? []) {
      if (!parent.has(next)) {
        parent.set(next, key);
        queue.push(next);
      }
    }
  }
  return null;
}

function pinOnNet(
  part: SheetPart,
  geometry: RouteGeometry,
  net: string,
  not?: string,
): { pin: string; at: Point } | null {
  for (const pin of CHANNEL_PINS) {
    if (pin === not || geometry.pinNets.get(`${part.id}.${pin}`) !== net) continue;
    const at = pinPosition(part, pin);
    if (at !== null) return { pin, at };
  }
  return null;
}

/** Pins of rail and input parts on a net: the ends a path can be drawn to. */
function sourcePins(sheet: Sheet, geometry: RouteGeometry, net: string): Point[] {
  return sheet.parts.flatMap((p) => {
    const at =
      SOURCE_KINDS.has(p.kind) && geometry.pinNets.get(`${p.id}.net`) === net ? pinPosition(p, 'net') : null;
    return at === null ? [] : [at];
  });
}

/** The device legs of a chain [net, device, net, …]: each device's entry and exit pin positions. */
function deviceLegs(
  sheet: Sheet,
  geometry: RouteGeometry,
  chain: readonly string[],
): [Point, Point][] | null {
  const parts = new Map(sheet.parts.map((p) => [p.id, p]));
  const legs: [Point, Point][] = [];
  for (let i = 1; i + 1 < chain.length; i += 2) {
    const part = parts.get(geometry.deviceParts[chain[i]!] ?? '');
    const entry = part && pinOnNet(part, geometry, chain[i - 1]!);
    const exit = part && entry && pinOnNet(part, geometry, chain[i + 1]!, entry.pin);
    if (!entry || !exit) return null;
    legs.push([entry.at, exit.at]);
  }
  return legs;
}

/**
 * Polylines in flow order for a chain: source pin → wires → device → wires → … → sink pin. Null when
 * a device of the chain is not drawn on the sheet (e.g. a netlist-only design).
 */
export function traceRoute(
  sheet: Sheet,
  geometry: RouteGeometry,
  chain: readonly string[],
): Point[][] | null {
  const legs = deviceLegs(sheet, geometry, chain);
  if (legs === null || legs.length === 0) return null;
  const route: Point[][] = [];
  const wiresTo = (net: string, from: Point, targets: readonly Point[]): Point[] | null =>
    nearestRoute(wireGraph(sheet, geometry, net, [from, ...targets]), from, targets);
  const head = wiresTo(chain[0]!, legs[0]![0], sourcePins(sheet, geometry, chain[0]!));
  if (head !== null && head.length > 1) route.push(head.reverse());
  legs.forEach(([entry, exit], i) => {
    route.push([entry, exit]);
    const next = legs[i + 1];
    const net = chain[2 * i + 2]!;
    const wires =
      next === undefined
        ? wiresTo(net, exit, sourcePins(sheet, geometry, net))
        : wiresTo(net, exit, [next[0]]);
    if (wires !== null && wires.length > 1) route.push(wires);
  });
  return route;
}
