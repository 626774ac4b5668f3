// Indexes read here are in range by construction, so `!` marks them (no run-time cost).
import type { CompiledNetlist } from '../compile/compile.ts';
import { deviceTerminals, type Device } from '../model/netlist.ts';
import type { Finding, Severity } from './report.ts';

function rule(rule: string, severity: Severity, nets: string[], devices: string[], message: string): Finding {
  return { kind: 'rule', severity, vector: null, nets, devices, path: null, rule, message };
}

/** Terminals through which a device can drive the net they sit on (a gate only listens). */
const DRIVER_TERMINALS: ReadonlySet<string> = new Set(['drain', 'source', 'a', 'b', 'anode', 'cathode']);

/**
 * Structural checks (docs/semantics.md §3 "rule"): they read the netlist only, not any vector. Bulk rules follow
 * common practice (no source): an NMOS body belongs at ground and a PMOS body at the supply; a body
 * tied to the opposite rail forward-biases a junction (error); tied anywhere else it adds body effect
 * and latch-up risk (warning).
 */
export function structuralFindings(c: CompiledNetlist): Finding[] {
  const { netlist } = c;
  const findings: Finding[] = [];
  // One pass over the terminals: rail nets touch nearly every transistor, so nothing here may copy a
  // net's list per terminal (that was quadratic in the cell's size), and only a count and the first
  // terminal are kept per net (a record per terminal was hundreds of megabytes at a million devices).
  const touches = new Map<string, number>();
  const firstTouch = new Map<string, { device: string; terminal: string }>();
  const drivenBy = new Map<string, number>();
  for (const d of netlist.devices) {
    for (const t of deviceTerminals(d)) {
      const count = touches.get(t.net) ?? 0;
      if (count === 0) firstTouch.set(t.net, { device: d.name, terminal: t.terminal });
      touches.set(t.net, count + 1);
      if (DRIVER_TERMINALS.has(t.terminal)) drivenBy.set(t.net, (drivenBy.get(t.net) ?? 0) + 1);
    }
  }
  const railRole = new Map<string, Set<string>>();
  for (const r of netlist.rails) {
    const v = r.role === 'ground' ? 0 : (r.volts ?? c.tech.vdd);
    const roles = railRole.get(r.net) ?? new Set<string>();
    roles.add(`${r.role}@${v}`);
    railRole.set(r.net, roles);
  }
  const inputs = new Set(netlist.inputs);
  const pins = new Set([...netlist.inputs, ...netlist.outputs]);
  const railNets = { supply: new Set<string>(), ground: new Set<string>() };
  for (const r of netlist.rails) railNets[r.role].add(r.net);
  const isRail = (net: string): boolean => railRole.has(net);
  const railOf = (net: string, role: 'supply' | 'ground'): boolean => railNets[role].has(net);

  const names = new Map<string, number>();
  for (const d of netlist.devices) names.set(d.name, (names.get(d.name) ?? 0) + 1);
  for (const [name, count] of names) {
    if (count > 1)
      findings.push(rule('duplicate-name', 'error', [], [name], `${count} devices are named ${name}`));
  }
  for (const [net, roles] of railRole) {
    if (roles.size > 1)
      findings.push(
        rule('rails-joined', 'error', [net], [], `rails of different voltage are joined on net ${net}`),
      );
  }
  for (const d of netlist.devices) {
    if (d.kind !== 'nmos' && d.kind !== 'pmos') continue;
    if (!isRail(d.gate) && !inputs.has(d.gate) && !drivenBy.has(d.gate)) {
      findings.push(
        rule(
          'gate-undriven',
          'error',
          [d.gate],
          [d.name],
          `the gate of ${d.name} (net ${d.gate}) is driven by nothing`,
        ),
      );
    }
    if (d.drain === d.source) {
      findings.push(
        rule(
          'drain-is-source',
          'warning',
          [d.drain],
          [d.name],
          `${d.name} has drain and source on the same net ${d.drain}`,
        ),
      );
    }
    findings.push(...bulkFindings(d, railOf));
  }
  for (const pin of [...netlist.inputs, ...netlist.outputs]) {
    if (!touches.has(pin))
      findings.push(rule('pin-unconnected', 'error', [pin], [], `pin ${pin} is connected to nothing`));
  }
  for (const [net, count] of touches) {
    const only = firstTouch.get(net)!;
    if (count === 1 && !isRail(net) && !pins.has(net)) {
      findings.push(
        rule(
          'dangling-net',
          'warning',
          [net],
          [only.device],
          `net ${net} reaches only ${only.device} (${only.terminal})`,
        ),
      );
    }
  }
  return findings;
}

function bulkFindings(
  d: Device & { kind: 'nmos' | 'pmos' },
  railOf: (net: string, role: 'supply' | 'ground') => boolean,
): Finding[] {
  if (d.bulk === undefined) return [];
  const own = d.kind === 'nmos' ? 'ground' : 'supply';
  const opposite = d.kind === 'nmos' ? 'supply' : 'ground';
  if (railOf(d.bulk, own)) return [];
  const kindName = d.kind.toUpperCase();
  if (railOf(d.bulk, opposite)) {
    return [
      rule(
        'bulk-connection',
        'error',
        [d.bulk],
        [d.name],
        `${kindName} ${d.name} has its bulk on ${d.bulk}, the opposite rail: a forward-biased junction`,
      ),
    ];
  }
  return [
    rule(
      'bulk-connection',
      'warning',
      [d.bulk],
      [d.name],
      `${kindName} ${d.name} has its bulk on ${d.bulk}, not at ${own}: body effect and latch-up risk`,
    ),
  ];
}
