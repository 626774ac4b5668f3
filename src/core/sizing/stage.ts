// Indexes read here are in range by construction, so `!` marks them (no run-time cost).
import type { Netlist } from '../model/netlist.ts';
import type { Technology } from '../model/technology.ts';

/** A channel element (transistor or resistor) of a stage, in the stage's local numbering. */
export interface StageElement {
  readonly name: string;
  readonly kind: 'nmos' | 'pmos' | 'resistor';
  /** Local net indices of the two channel ends. */
  readonly a: number;
  readonly b: number;
  /** On-resistance, ohms: R_unit · L / W for transistors. */
  readonly ohms: number;
  /** Index into the stage's controls, or -1 when the element always conducts (resistor, gate on a rail). */
  readonly control: number;
  /** Whether the element conducts when its control is 1 (NMOS) or 0 (PMOS). */
  readonly onWhenHigh: boolean;
}

/** Where a net of the stage stands: a source that can pull up, down, or both (a driven input pin). */
export type SourceRole = 'up' | 'down' | 'both' | 'none';

/**
 * The channel-connected stage that drives one output: every net reachable from the output through
 * transistor or resistor channels without crossing a rail or a driven input pin. Gate signals of
 * its transistors are its controls; a gate tied to a rail is a constant, not a control.
 */
export interface Stage {
  readonly output: number;
  readonly nets: readonly string[];
  readonly roles: readonly SourceRole[];
  readonly elements: readonly StageElement[];
  /** Gate nets: each an independent signal unless it is a local inverter's output (below). */
  readonly controls: readonly string[];
  /**
   * Per control, the index of the control it is the complement of (its net is driven only by a plain
   * inverter from that control), or −1. Such pairs never take equal values in the worst-case search,
   * so a transmission gate's two devices switch together as they do in the cell.
   */
  readonly complementOf: readonly number[];
}

interface Channel {
  readonly name: string;
  readonly kind: StageElement['kind'];
  readonly a: string;
  readonly b: string;
  readonly ohms: number;
  readonly gate: string | null;
}

/** Resistances do not matter where only connections are read. */
const DEFAULT_UNITS = { rn: 1, rp: 1 };

function channels(netlist: Netlist, tech: Pick<Technology, 'rn' | 'rp'>): Channel[] {
  const out: Channel[] = [];
  for (const d of netlist.devices) {
    if (d.kind === 'nmos' || d.kind === 'pmos') {
      const unit = d.kind === 'nmos' ? tech.rn : tech.rp;
      out.push({
        name: d.name,
        kind: d.kind,
        a: d.drain,
        b: d.source,
        ohms: (unit * d.l) / d.w,
        gate: d.gate,
      });
    } else if (d.kind === 'resistor') {
      out.push({ name: d.name, kind: 'resistor', a: d.a, b: d.b, ohms: d.ohms, gate: null });
    }
  }
  return out;
}

function sourceRoles(netlist: Netlist): Map<string, SourceRole> {
  const roles = new Map<string, SourceRole>();
  for (const r of netlist.rails) roles.set(r.net, r.role === 'supply' ? 'up' : 'down');
  for (const i of netlist.inputs) if (!roles.has(i)) roles.set(i, 'both');
  return roles;
}

/** Channels reachable from the output without passing through a source net. */
function reach(output: string, all: readonly Channel[], roles: ReadonlyMap<string, SourceRole>): Channel[] {
  const seen = new Set<string>([output]);
  const queue = [output];
  const found = new Set<Channel>();
  while (queue.length > 0) {
    const net = queue.pop() as string;
    for (const ch of all) {
      if (found.has(ch) || (ch.a !== net && ch.b !== net)) continue;
      found.add(ch);
      for (const end of [ch.a, ch.b]) {
        if (seen.has(end)) continue;
        seen.add(end);
        if (!roles.has(end)) queue.push(end);
      }
    }
  }
  return all.filter((ch) => found.has(ch));
}

export function extractStage(netlist: Netlist, tech: Technology, output: string): Stage {
  const roles = sourceRoles(netlist);
  // Sorted by name so ties between equal paths resolve the same way whatever the device order.
  const members = reach(output, channels(netlist, tech), roles).sort((x, y) => compareNames(x.name, y.name));
  const nets = [output];
  const local = new Map<string, number>([[output, 0]]);
  const at = (n: string): number => {
    if (!local.has(n)) {
      local.set(n, nets.length);
      nets.push(n);
    }
    return local.get(n) as number;
  };
  const isControl = (ch: Channel): boolean => ch.gate !== null && !isRail(roles.get(ch.gate));
  const controls = [...new Set(members.filter(isControl).map((ch) => ch.gate as string))].sort(compareNames);
  const elements = members.map((ch): StageElement => ({
    name: ch.name,
    kind: ch.kind,
    a: at(ch.a),
    b: at(ch.b),
    ohms: ch.ohms,
    control: isControl(ch) ? controls.indexOf(ch.gate as string) : -1,
    onWhenHigh: ch.kind !== 'pmos',
  }));
  // A transistor whose gate sits on a rail that turns it off never conducts: drop it.
  const live = elements.filter((e, i) => e.control >= 0 || conductsConstantly(members[i]!, roles));
  const inverters = inverterInputs(netlist);
  const complementOf = controls.map((net) => controls.indexOf(inverters.get(net) ?? ''));
  return {
    output: 0,
    nets,
    roles: nets.map((n) => roles.get(n) ?? 'none'),
    elements: live,
    controls,
    complementOf,
  };
}

/**
 * Nets driven by nothing but a plain inverter, mapped to that inverter's input: exactly one PMOS to
 * a supply and one NMOS to a ground on the net's channel side, sharing one gate.
 */
export function inverterInputs(netlist: Netlist): Map<string, string> {
  const roles = sourceRoles(netlist);
  const byNet = new Map<string, Channel[]>();
  for (const ch of channels(netlist, DEFAULT_UNITS)) {
    for (const n of ch.a === ch.b ? [ch.a] : [ch.a, ch.b]) {
      const list = byNet.get(n);
      if (list === undefined) byNet.set(n, [ch]);
      else list.push(ch);
    }
  }
  const result = new Map<string, string>();
  for (const [net, chs] of byNet) {
    if (roles.has(net) || chs.length !== 2) continue;
    const p = chs.find((ch) => ch.kind === 'pmos');
    const n = chs.find((ch) => ch.kind === 'nmos');
    if (!p || !n || p.gate !== n.gate || p.gate === null || p.gate === net) continue;
    const far = (ch: Channel): SourceRole | undefined => roles.get(ch.a === net ? ch.b : ch.a);
    if (far(p) === 'up' && far(n) === 'down') result.set(net, p.gate);
  }
  return result;
}

function conductsConstantly(ch: Channel, roles: ReadonlyMap<string, SourceRole>): boolean {
  if (ch.gate === null) return true;
  const level = roles.get(ch.gate);
  return ch.kind === 'nmos' ? level === 'up' : level === 'down';
}

function isRail(role: SourceRole | undefined): boolean {
  return role === 'up' || role === 'down';
}

function compareNames(x: string, y: string): number {
  return x < y ? -1 : x > y ? 1 : 0;
}
