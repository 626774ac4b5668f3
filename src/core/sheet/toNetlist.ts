/**
 * Derives the electrical netlist from the drawing. Nets are named, strongest first, by a rail,
 * an input pin, an output pin, then a net label; unnamed nets get `net1`, `net2`, … in the order
 * of the parts that touch them. Equal names join nets, so two labels `BL` are one net.
 */
import type { Device, Netlist, Rail } from '../model/netlist.ts';
import type { Sheet, SheetPart } from './types.ts';
import { isDevicePart, partSpec, type NetRole } from './parts/index.ts';
import { pinKey, sheetConnectivity, wireKey, type UnionFind } from './connectivity.ts';
import { nameRecord } from '../model/records.ts';

export interface SheetIssue {
  readonly kind: 'name-conflict' | 'duplicate-device' | 'shorted-pins' | 'hierarchy';
  readonly parts: readonly string[];
  readonly message: string;
}

export interface DerivedNetlist {
  readonly netlist: Netlist;
  /** Net of every wire, by wire id. */
  readonly wireNets: Readonly<Record<string, string>>;
  /** Net of every pin, keyed `partId.pin`. */
  readonly pinNets: Readonly<Record<string, string>>;
  /** Device name of every device part, by part id. */
  readonly partDevices: Readonly<Record<string, string>>;
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
function joinEqualNames(sheet: Sheet, groups: UnionFind): void {
  const firstWithName = new Map<string, string>();
  for (const part of sheet.parts) {
    if (namingRole(part) === null || part.name === '') continue;
    const key = pinKey(part.id, 'net');
    const first = firstWithName.get(part.name);
    if (first === undefined) firstWithName.set(part.name, key);
    else groups.union(first, key);
  }
}

function collectClaims(sheet: Sheet, groups: UnionFind): Map<string, NameClaim[]> {
  const claims = new Map<string, NameClaim[]>();
  for (const part of sheet.parts) {
    const role = namingRole(part);
    if (role === null || part.name === '') continue;
    const root = groups.find(pinKey(part.id, 'net'));
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
function nameGroups(sheet: Sheet, groups: UnionFind, issues: SheetIssue[]): (root: string) => string {
  const claims = collectClaims(sheet, groups);
  const names = new Map<string, string>();
  for (const [root, list] of claims) names.set(root, pickName(list, issues).name);
  const taken = new Set(names.values());
  let counter = 0;
  const nameOf = (root: string): string => {
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
}

function contribute(part: SheetPart, netOf: (pin: string) => string, into: Contributions): void {
  const role = partSpec(part.kind).role;
  if (role.type === 'device') {
    into.devices.push(role.toDevice(part, netOf));
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
  const { groups, junctions, openEnds } = sheetConnectivity(sheet);
  joinEqualNames(sheet, groups);
  const nameOf = nameGroups(sheet, groups, issues);
  const pinNets = nameRecord<string>();
  const partDevices = nameRecord<string>();
  const found: Contributions = { devices: [], rails: [], inputs: [], outputs: [] };
  for (const part of sheet.parts) {
    const netOf = (pin: string): string => nameOf(groups.find(pinKey(part.id, pin)));
    for (const pin of partSpec(part.kind).pins) pinNets[`${part.id}.${pin.name}`] = netOf(pin.name);
    if (isDevicePart(part.kind)) partDevices[part.id] = part.name;
    contribute(part, netOf, found);
  }
  reportDuplicateDevices(sheet, issues);
  const wireNets = nameRecord<string>();
  for (const wire of sheet.wires) wireNets[wire.id] = nameOf(groups.find(wireKey(wire.id)));
  const railNets = new Set(found.rails.map((r) => r.net));
  const netlist: Netlist = {
    name,
    devices: found.devices,
    rails: [...new Map(found.rails.map((r) => [r.net, r])).values()],
    inputs: uniqueInOrder(found.inputs).filter((n) => !railNets.has(n)),
    outputs: uniqueInOrder(found.outputs),
  };
  return { netlist, wireNets, pinNets, partDevices, junctions, openEnds, issues };
}

function reportDuplicateDevices(sheet: Sheet, issues: SheetIssue[]): void {
  const byName = new Map<string, string[]>();
  for (const p of sheet.parts) {
    if (!isDevicePart(p.kind)) continue;
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
