// Indexes read here are in range by construction, so `!` marks them (no run-time cost).
/** Pieces every kind of finding is built from: names for messages, the record, devices on nets. */
import type { PathIndices } from '../solver/currentPaths.ts';
import type { SolveResult } from '../solver/simulator.ts';
import type { CurrentPath, Finding, FindingKind, Severity } from './report.ts';

/** Names of a result's nets and devices, for messages. */
export class Namer {
  constructor(private readonly r: SolveResult) {}
  net(n: number): string {
    return this.r.compiled.netNames[n]!;
  }
  element(e: number): string {
    const c = this.r.compiled;
    return c.netlist.devices[c.chDevice[e]!]!.name;
  }
  chain(p: PathIndices): string[] {
    return p.nets.flatMap((n, i) =>
      i < p.elements.length ? [this.net(n), this.element(p.elements[i]!)] : [this.net(n)],
    );
  }
}

export function finding(
  kind: FindingKind,
  severity: Severity,
  vector: number,
  nets: string[],
  devices: string[],
  message: string,
): Finding {
  return { kind, severity, vector, nets, devices, path: null, message };
}

/** Devices whose channel ends on any of the nets, sorted by name; only conducting ones if asked. */
export function channelDevices(r: SolveResult, nets: readonly number[], conductingOnly: boolean): string[] {
  const c = r.compiled;
  const name = new Namer(r);
  const devices = new Set<string>();
  for (const n of nets) {
    for (let p = c.netChannels.start[n]!; p < c.netChannels.start[n + 1]!; p++) {
      const e = c.netChannels.items[p]!;
      if (!conductingOnly || r.conduction[e] !== 0) devices.add(name.element(e));
    }
  }
  return [...devices].sort();
}

/** The result's static current paths with their nets and devices named, as a report lists them. */
export function currentPathsOf(r: SolveResult): CurrentPath[] {
  if (r.paths.length === 0) return [];
  const name = new Namer(r);
  return r.paths.map((p) => ({ chain: name.chain(p), current: p.current }));
}
