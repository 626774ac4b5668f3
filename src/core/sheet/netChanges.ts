/**
 * What an edit did to the circuit's connectivity, found by comparing the nets of every pin and wire
 * before and after it (docs/semantics.md §1, "No silent connections"). A join is two nets that became
 * one; a cut is one net that fell apart. Each change is located at the touch that caused it (a new
 * contact for a join, a lost one for a cut), so the sheet can mark the place.
 */
import type { Point, Sheet } from './types.ts';
import { sheetConnectivity, type SheetConnectivity } from './connectivity.ts';

/** Net names by pin (`partId.pin`) and by wire id, as `sheetToNetlist` reports them. */
export interface NetsOfItems {
  readonly pinNets: ReadonlyMap<string, string>;
  readonly wireNets: Readonly<Record<string, string>>;
}

/** A pin of a part or a wire, named as in NetsOfItems. */
export type ItemRef =
  | { readonly type: 'pin'; readonly key: string; readonly partId: string; readonly pin: string }
  | { readonly type: 'wire'; readonly key: string; readonly wireId: string };

export interface NetChange {
  readonly kind: 'join' | 'cut';
  /** Before the edit: for a join, the nets that became one; for a cut, the net that fell apart. */
  readonly nets: readonly string[];
  readonly at: Point;
  /** The two items whose contact was made (join) or lost (cut). */
  readonly items: readonly [ItemRef, ItemRef];
}

/** True for a contact the designer made on purpose (a pin dropped on a pin or a wire end). */
export type DeliberateContact = (a: ItemRef, b: ItemRef, at: Point) => boolean;

export interface NetVerdict {
  /** Joins and cuts nobody asked for. */
  readonly unasked: readonly NetChange[];
  /** Joins made on purpose (allowed by the `deliberate` test). */
  readonly made: readonly NetChange[];
}

const itemKey = (ref: ItemRef): string => `${ref.type}:${ref.key}`;

function netOf(nets: NetsOfItems, ref: ItemRef): string | undefined {
  return ref.type === 'pin' ? nets.pinNets.get(ref.key) : nets.wireNets[ref.key];
}

/** For every item present on both sides: which nets each old net maps to, and back. */
function partitionShift(
  before: NetsOfItems,
  after: NetsOfItems,
): { joined: Set<string>; split: Set<string> } {
  const forward = new Map<string, Set<string>>();
  const backward = new Map<string, Set<string>>();
  const pair = (b: string | undefined, a: string | undefined): void => {
    if (b === undefined || a === undefined) return;
    (forward.get(b) ?? forward.set(b, new Set()).get(b)!).add(a);
    (backward.get(a) ?? backward.set(a, new Set()).get(a)!).add(b);
  };
  for (const [key, net] of before.pinNets) pair(net, after.pinNets.get(key));
  for (const key in before.wireNets) pair(before.wireNets[key], after.wireNets[key]);
  const joined = new Set([...backward].filter(([, s]) => s.size > 1).map(([a]) => a));
  const split = new Set([...forward].filter(([, s]) => s.size > 1).map(([b]) => b));
  return { joined, split };
}

function refOf(sheet: Sheet, c: SheetConnectivity, item: number): ItemRef {
  if (item >= c.wireBase) {
    const wireId = sheet.wires[item - c.wireBase]!.id;
    return { type: 'wire', key: wireId, wireId };
  }
  const pin = c.pins[item]!;
  return { type: 'pin', key: `${pin.partId}.${pin.pin}`, partId: pin.partId, pin: pin.pin };
}

/**
 * The new contacts of `after` that join nets of `before`. Items new in `after` (a wire added to keep
 * a contact) take the old net of what they touch first, so a new wire between two nets is found.
 */
function newContacts(
  before: NetsOfItems,
  afterSheet: Sheet,
  after: NetsOfItems,
  joined: Set<string>,
): NetChange[] {
  const c = sheetConnectivity(afterSheet, { touches: true });
  const touches = c.touches.map((t) => ({
    a: refOf(afterSheet, c, t.a),
    b: refOf(afterSheet, c, t.b),
    at: t.at,
  }));
  const label = new Map<string, string>();
  for (const t of touches) {
    for (const ref of [t.a, t.b]) {
      const net = netOf(before, ref);
      if (net !== undefined) label.set(itemKey(ref), net);
    }
  }
  // New items inherit the old net of the first labelled item they touch, until nothing changes.
  for (let changed = true; changed;) {
    changed = false;
    for (const t of touches) {
      const [la, lb] = [label.get(itemKey(t.a)), label.get(itemKey(t.b))];
      if (la === undefined && lb !== undefined) changed = !!label.set(itemKey(t.a), lb);
      else if (lb === undefined && la !== undefined) changed = !!label.set(itemKey(t.b), la);
    }
  }
  return touches.flatMap((t): NetChange[] => {
    const [la, lb] = [label.get(itemKey(t.a)), label.get(itemKey(t.b))];
    const now = netOf(after, t.a);
    if (la === undefined || lb === undefined || la === lb || now === undefined || !joined.has(now)) return [];
    return [{ kind: 'join', nets: [la, lb], at: t.at, items: [t.a, t.b] }];
  });
}

/** The contacts of `before` whose two items are on different nets in `after`. */
function lostContacts(
  beforeSheet: Sheet,
  before: NetsOfItems,
  after: NetsOfItems,
  split: Set<string>,
): NetChange[] {
  const c = sheetConnectivity(beforeSheet, { touches: true });
  return c.touches.flatMap((t): NetChange[] => {
    const a = refOf(beforeSheet, c, t.a);
    const b = refOf(beforeSheet, c, t.b);
    const [na, nb] = [netOf(after, a), netOf(after, b)];
    const was = netOf(before, a);
    if (na === undefined || nb === undefined || na === nb || was === undefined || !split.has(was)) return [];
    return [{ kind: 'cut', nets: [was], at: t.at, items: [a, b] }];
  });
}

/**
 * Every change of connectivity between two versions of a sheet, split into those made on purpose
 * (joins that `deliberate` accepts) and the rest. An edit with no change costs one pass over the
 * pins and wires; only a changed one is located, with a connectivity pass over each version.
 */
export function judgeNetChanges(
  beforeSheet: Sheet,
  before: NetsOfItems,
  afterSheet: Sheet,
  after: NetsOfItems,
  deliberate: DeliberateContact = () => false,
): NetVerdict {
  const { joined, split } = partitionShift(before, after);
  if (joined.size === 0 && split.size === 0) return { unasked: [], made: [] };
  const joins = joined.size === 0 ? [] : newContacts(before, afterSheet, after, joined);
  const cuts = split.size === 0 ? [] : lostContacts(beforeSheet, before, after, split);
  const made = joins.filter((j) => deliberate(j.items[0], j.items[1], j.at));
  return { unasked: [...joins.filter((j) => !made.includes(j)), ...cuts], made };
}
