import type { CompiledNetlist } from '../compile/compile.ts';
import { deviceTerminals, type Device } from '../model/netlist.ts';
import type { Finding, Severity } from './report.ts';

function rule(rule: string, severity: Severity, nets: string[], devices: string[], message: string): Finding {
  return { kind: 'rule', severity, vector: null, nets, devices, path: null, rule, message };
}

/**
 * Structural checks (docs/semantics.md §3 "rule"): they read the netlist only, not any vector. Bulk rules follow
 * common practice (no source): an NMOS body belongs at ground and a PMOS body at the supply; a body
 * tied to the opposite rail forward-biases a junction (error); tied anywhere else it adds body effect
 * and latch-up risk (warning).
 */
export function structuralFindings(c: CompiledNetlist): Finding[] {
  const { netlist } = c;
  const findings: Finding[] = [];
  const touches = new Map<string, { device: string; terminal: string }[]>();
  for (const d of netlist.devices) {
    for (const t of deviceTerminals(d))
      touches.set(t.net, [...(touches.get(t.net) ?? []), { device: d.name, terminal: t.terminal }]);
  }
  const railRole = new Map<string, Set<string>>();
  for (const r of netlist.rails) {
    const v = r.role === 'ground' ? 0 : (r.volts ?? c.tech.vdd);
    railRole.set(r.net, new Set([...(railRole.get(r.net) ?? []), `${r.role}@${v}`]));
  }
  const isRail = (net: string): boolean => railRole.has(net);
  const isPin = (net: string): boolean => netlist.inputs.includes(net) || netlist.outputs.includes(net);
  const railOf = (net: string, role: 'supply' | 'ground'): boolean =>
    netlist.rails.some((r) => r.net === net && r.role === role);

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
  const driverTerminals = new Set(['drain', 'source', 'a', 'b', 'anode', 'cathode']);
  for (const d of netlist.devices) {
    if (d.kind !== 'nmos' && d.kind !== 'pmos') continue;
    const drivers = (touches.get(d.gate) ?? []).filter((t) => driverTerminals.has(t.terminal));
    if (!isRail(d.gate) && !netlist.inputs.includes(d.gate) && drivers.length === 0) {
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
  for (const [net, list] of touches) {
    if (list.length === 1 && !isRail(net) && !isPin(net)) {
      findings.push(
        rule(
          'dangling-net',
          'warning',
          [net],
          [list[0].device],
          `net ${net} reaches only ${list[0].device} (${list[0].terminal})`,
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
