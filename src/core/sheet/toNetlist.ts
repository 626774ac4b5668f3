/**
 * Derives the electrical netlist from the drawing. Nets are named, strongest first, by a rail,
 * an input pin, an output pin, then a net label; unnamed nets get `net1`, `net2`, … in the order
 * of the parts that touch them. Equal names join nets, so two labels `BL` are one net.
 */
import type { Device, Netlist, Rail } from '../model/netlist.ts';
import type { Instance } from '../model/design.ts';
import type { Sheet, SheetPart } from './types.ts';
import { isDevicePart, isNamedOnce, partShape, partSpec, type NetRole } from './parts/index.ts';
import type { InstancePart } from './parts/instance.ts';
import { sheetConnectivity, type SheetConnectivity } from './connectivity.ts';
import { nameRecord, recordOf } from '../model/records.ts';

export interface SheetIssue {
  readonly kind: 'name-conflict' | 'duplicate-device' | 'shorted-pins' | 'hierarchy';
  readonly parts: readonly string[];
  readonly message: string;
}

export interface DerivedNetlist {
  readonly netlist: Netlist;
  /** Net of every wire, by wire id. */
  readonly wireNets: Readonly<Record<string, string>>;
  /** Net of every pin, keyed `partId.pin` (a map: a big sheet has tens of thousands of pins). */
  readonly pinNets: ReadonlyMap<string, string>;
  /** Device name of every device part, by part id. */
  readonly partDevices: Readonly<Record<string, string>>;
  /** The instances drawn as symbols, each pin wired to the net its lead touches (unwired: absent). */
  readonly instances: readonly Instance[];
  readonly junctions: readonly { readonly x: number; readonly y: number }[];
  readonly openEnds: readonly { readonly x: number; readonly y: number }[];
  readonly issues: readonly SheetIssue[];
}

const ROLE_RANK: Record<NetRole, number> = { supply: 0, ground: 0, input: 1, output: 2, label: 3 };

interface NameClaim {
  readonly name: string;
  readonly role: NetRole;
  readonly partId: string;
}

function namingRole(part: SheetPart): NetRole | null {
  const role = partSpec(part.kind).role;
  return role.type === 'net-name' ? role.role : null;
}

/** Joins every group that carries the same name: equal labels, pins and rails are one net. */
function joinEqualNames(sheet: Sheet, c: SheetConnectivity): void {
  const firstWithName = new Map<string, number>();
  sheet.parts.forEach((part, i) => {
    if (namingRole(part) === null || part.name === '') return;
    // A naming part has the one pin `net`.
    const item = c.firstPin[i]!;
    const first = firstWithName.get(part.name);
    if (first === undefined) firstWithName.set(part.name, item);
    else c.groups.union(first, item);
  });
}

function collectClaims(sheet: Sheet, c: SheetConnectivity): Map<number, NameClaim[]> {
  const claims = new Map<number, NameClaim[]>();
  for (let i = 0; i < sheet.parts.length; i++) {
    const part = sheet.parts[i]!;
    const role = namingRole(part);
    if (role === null || part.name === '') continue;
    const root = c.groups.find(c.firstPin[i]!);
    const claim = { name: part.name, role, partId: part.id };
    const list = claims.get(root);
    if (list) list.push(claim);
    else claims.set(root, [claim]);
  }
  return claims;
}

function pickName(claims: readonly NameClaim[], issues: SheetIssue[]): NameClaim {
  const sorted = [...claims].sort(
    (a, b) => ROLE_RANK[a.role] - ROLE_RANK[b.role] || a.name.localeCompare(b.name),
  );
  const best = sorted[0]!;
  const others = [...new Set(sorted.map((c) => c.name))].filter((n) => n !== best.name);
  if (others.length > 0) {
    const kind = sorted.some((c) => c.name !== best.name && c.role !== 'label')
      ? 'shorted-pins'
      : 'name-conflict';
    issues.push({
      kind,
      parts: sorted.map((c) => c.partId),
      message: `one net carries the names ${[best.name, ...others].join(', ')}; it is called ${best.name}`,
    });
  }
  return best;
}

/** Names every group: a function from group root to net name, numbering unnamed nets lazily. */
function nameGroups(sheet: Sheet, c: SheetConnectivity, issues: SheetIssue[]): (root: number) => string {
  const claims = collectClaims(sheet, c);
  const names = new Map<number, string>();
  for (const [root, list] of claims) names.set(root, pickName(list, issues).name);
  const taken = new Set(names.values());
  let counter = 0;
  const nameOf = (root: number): string => {
    let n = names.get(root);
    if (n === undefined) {
      do n = `net${++counter}`;
      while (taken.has(n));
      names.set(root, n);
    }
    return n;
  };
  return nameOf;
}

function uniqueInOrder(values: readonly string[]): string[] {
  return [...new Set(values)];
}

/** What the parts contribute, in sheet order: devices, rails and pins. */
interface Contributions {
  readonly devices: Device[];
  readonly rails: Rail[];
  readonly inputs: string[];
  readonly outputs: string[];
  readonly instances: Instance[];
}

function contribute(part: SheetPart, netOf: (pin: string) => string, into: Contributions): void {
  const role = partSpec(part.kind).role;
  if (role.type === 'device') {
    into.devices.push(role.toDevice(part, netOf));
    return;
  }
  if (role.type === 'instance') {
    into.instances.push(drawnInstance(part as InstancePart, netOf));
    return;
  }
  const net = netOf('net');
  switch (role.role) {
    case 'supply':
    case 'ground':
      into.rails.push({ net, role: role.role });
      break;
    case 'input':
      into.inputs.push(net);
      break;
    case 'output':
      into.outputs.push(net);
      break;
    case 'label':
      break;
  }
}

export function sheetToNetlist(sheet: Sheet, name = 'cell'): DerivedNetlist {
  const issues: SheetIssue[] = [];
  const c = sheetConnectivity(sheet);
  const { groups, junctions, openEnds } = c;
  joinEqualNames(sheet, c);
  const nameOf = nameGroups(sheet, c, issues);
  const pinNets = new Map<string, string>();
  const partDevices = nameRecord<string>();
  const found: Contributions = { devices: [], rails: [], inputs: [], outputs: [], instances: [] };
  let wired: Set<number> | null = null; // found only for a sheet with instances
  const isWired = (item: number): boolean => (wired ??= wiredPins(sheet, c)).has(item);
  sheet.parts.forEach((part, i) => {
    const pins = partShape(part).pins;
    const first = c.firstPin[i]!;
    for (let k = 0; k < pins.length; k++)
      pinNets.set(`${part.id}.${pins[k]!.name}`, nameOf(groups.find(first + k)));
    if (isDevicePart(part.kind)) partDevices[part.id] = part.name;
    const netOf = (pin: string): string => {
      const k = pins.findIndex((p) => p.name === pin);
      if (k < 0) return unknownPin(part, pin);
      // An instance's pin that touches nothing is left unwired, not given a net of its own.
      return part.kind === 'instance' && !isWired(first + k) ? '' : nameOf(groups.find(first + k));
    };
    contribute(part, netOf, found);
  });
  reportDuplicateDevices(sheet, issues);
  const wireNets = nameRecord<string>();
  sheet.wires.forEach((wire, w) => (wireNets[wire.id] = nameOf(groups.find(c.wireBase + w))));
  const railNets = new Set(found.rails.map((r) => r.net));
  const netlist: Netlist = {
    name,
    devices: found.devices,
    rails: [...new Map(found.rails.map((r) => [r.net, r])).values()],
    inputs: uniqueInOrder(found.inputs).filter((n) => !railNets.has(n)),
    outputs: uniqueInOrder(found.outputs),
  };
  return { netlist, wireNets, pinNets, partDevices, instances: found.instances, junctions, openEnds, issues };
}

/** An instance part's connections: each pin to its net, a pin that touches nothing left out. */
function drawnInstance(part: InstancePart, netOf: (pin: string) => string): Instance {
  const pins = partShape(part).pins.flatMap((p) => {
    const net = netOf(p.name);
    return net === '' ? [] : [[p.name, net] as const];
  });
  return { name: part.name, cell: part.cell, pins: recordOf(pins) };
}

/** Item numbers of the pins that touch another pin or a wire (the others are open). */
function wiredPins(sheet: Sheet, c: SheetConnectivity): Set<number> {
  const size = new Map<number, number>();
  const count = c.wireBase + sheet.wires.length;
  for (let i = 0; i < count; i++) {
    const root = c.groups.find(i);
    size.set(root, (size.get(root) ?? 0) + 1);
  }
  const wired = new Set<number>();
  for (let i = 0; i < c.wireBase; i++) if ((size.get(c.groups.find(i)) ?? 0) > 1) wired.add(i);
  return wired;
}

function unknownPin(part: SheetPart, pin: string): never {
  throw new Error(`a ${part.kind} has no pin ${pin}`);
}

function reportDuplicateDevices(sheet: Sheet, issues: SheetIssue[]): void {
  const byName = new Map<string, string[]>();
  for (const p of sheet.parts) {
    if (!isNamedOnce(p.kind)) continue;
    const ids = byName.get(p.name);
    if (ids) ids.push(p.id);
    else byName.set(p.name, [p.id]);
  }
  for (const [name, ids] of byName) {
    if (ids.length > 1)
      issues.push({
        kind: 'duplicate-device',
        parts: ids,
        message: `${ids.length} devices are named ${name}`,
      });
  }
}
