import { RESISTOR } from '../compile/compile.ts';
import type { ExpectedValue } from '../expect/evaluate.ts';
import type { PathIndices } from '../solver/currentPaths.ts';
import {
  FLAG_BOUND,
  FLAG_CHARGE_SHARED,
  FLAG_CONTENTION,
  FLAG_DEGRADED,
  FLAG_OSCILLATING,
  LEVEL_0,
  LEVEL_X,
  LEVEL_Z,
  levelName,
} from '../solver/levels.ts';
import type { SolveResult } from '../solver/simulator.ts';
import { engineering } from '../view/format.ts';
import type { Finding, FindingKind, Severity } from './report.ts';

/** Names of a result's nets and devices, for messages. */
class Namer {
  constructor(private readonly r: SolveResult) {}
  net(n: number): string {
    return this.r.compiled.netNames[n];
  }
  element(e: number): string {
    const c = this.r.compiled;
    return c.netlist.devices[c.chDevice[e]].name;
  }
  chain(p: PathIndices): string[] {
    return p.nets.flatMap((n, i) =>
      i < p.elements.length ? [this.net(n), this.element(p.elements[i])] : [this.net(n)],
    );
  }
}

function finding(
  kind: FindingKind,
  severity: Severity,
  vector: number,
  nets: string[],
  devices: string[],
  message: string,
): Finding {
  return { kind, severity, vector, nets, devices, path: null, message };
}

/**
 * Everything worth warning about in one solved vector (docs/semantics.md §3), except structural rules.
 * `expected` holds each output's expected value for this vector (absent when none is given).
 */
export function vectorFindings(
  r: SolveResult,
  vector: number,
  labelOf: () => string,
  expected: ReadonlyMap<number, ExpectedValue>,
): Finding[] {
  // The label is only needed when there is something to report, which most vectors do not have.
  let cached: string | null = null;
  const label = (): string => (cached ??= labelOf());
  return [
    ...currentFindings(r, vector, label),
    ...flaggedFindings(r, vector, label),
    ...floatingFindings(r, vector, label, expected),
    ...mismatchFindings(r, vector, label, expected),
  ];
}

/**
 * Static current paths. A path of transistors only that crosses a net at X is a short (error);
 * any other path is static current (warning: ratioed loads draw it by design).
 */
function currentFindings(r: SolveResult, vector: number, label: () => string): Finding[] {
  const name = new Namer(r);
  const c = r.compiled;
  return r.paths.map((p) => {
    const chain = name.chain(p);
    const watts = r.volts[p.nets[0]] * p.current - r.volts[p.nets[p.nets.length - 1]] * p.current;
    const transistorsOnly = p.elements.every((e) => c.chKind[e] !== RESISTOR);
    const crossesX = p.nets.some((n) => r.levels[n] === LEVEL_X && !r.topology.isSource[n]);
    const short = transistorsOnly && crossesX;
    const message = `${short ? 'short' : 'static current'} at ${label()}: ${chain.join(' → ')}, ${engineering(p.current, 'A')}, ${engineering(watts, 'W')}`;
    return {
      kind: short ? 'short' : 'static-current',
      severity: short ? 'error' : 'warning',
      vector,
      nets: p.nets.map((n) => name.net(n)),
      devices: p.elements.map((e) => name.element(e)),
      path: chain,
      current: p.current,
      watts,
      message,
    };
  });
}

/** Devices whose channel ends on any of the nets, sorted by name; only conducting ones if asked. */
function channelDevices(r: SolveResult, nets: readonly number[], conductingOnly: boolean): string[] {
  const c = r.compiled;
  const name = new Namer(r);
  const devices = new Set<string>();
  for (const n of nets) {
    for (let p = c.netChannels.start[n]; p < c.netChannels.start[n + 1]; p++) {
      const e = c.netChannels.items[p];
      if (!conductingOnly || r.conduction[e] !== 0) devices.add(name.element(e));
    }
  }
  return [...devices].sort();
}

/** Nets that feed a gate or are outputs: the ones whose level matters to the cell. */
function observed(r: SolveResult, n: number): boolean {
  const c = r.compiled;
  return c.netGates.start[n + 1] > c.netGates.start[n] || c.outputNets.includes(n);
}

function flaggedFindings(r: SolveResult, vector: number, label: () => string): Finding[] {
  const name = new Namer(r);
  const c = r.compiled;
  const out: Finding[] = [];
  // One pass over the nets; most vectors flag none, so this is the whole cost of a clean vector.
  const flagged: number[] = [];
  for (let n = 0; n < c.netCount; n++) if (r.flags[n] !== 0 && !r.topology.isSource[n]) flagged.push(n);
  const nets = (flag: number, onlyObserved: boolean): number[] =>
    flagged.filter((n) => (r.flags[n] & flag) !== 0 && (!onlyObserved || observed(r, n)));
  const touching = (list: number[]): string[] => channelDevices(r, list, true);
  for (const n of nets(FLAG_CONTENTION, false)) {
    const v = r.volts[n];
    out.push(
      finding(
        'contention',
        'error',
        vector,
        [name.net(n)],
        touching([n]),
        `contention at ${label()}: ${name.net(n)} sits at ${v.toFixed(2)} V, between the input thresholds, fought over by drivers of both levels`,
      ),
    );
  }
  for (const n of nets(FLAG_DEGRADED, true)) {
    const by = r.limiter[n] >= 0 ? [name.element(r.limiter[n])] : [];
    out.push(
      finding(
        'degraded',
        'warning',
        vector,
        [name.net(n)],
        by,
        `degraded level at ${label()}: ${name.net(n)} ${r.levels[n] === LEVEL_0 ? 'falls only to' : 'reaches only'} ${r.volts[n].toFixed(2)} V (a threshold drop${by.length ? ` through ${by[0]}` : ''})`,
      ),
    );
  }
  const shared = nets(FLAG_CHARGE_SHARED, false);
  if (shared.length > 0) {
    const list = shared.map(
      (n) => `${name.net(n)} ${Number.isNaN(r.volts[n]) ? 'unknown' : `${r.volts[n].toFixed(2)} V`}`,
    );
    out.push(
      finding(
        'charge-sharing',
        'warning',
        vector,
        shared.map((n) => name.net(n)),
        touching(shared),
        `charge sharing at ${label()}: ${list.join(', ')}`,
      ),
    );
  }
  const racing = nets(FLAG_OSCILLATING, false);
  if (racing.length > 0) {
    out.push(
      finding(
        'no-steady-state',
        'error',
        vector,
        racing.map((n) => name.net(n)),
        touching(racing),
        `no steady state at ${label()}: ${racing.map((n) => name.net(n)).join(', ')} kept changing (a race or an oscillator) and are shown as X`,
      ),
    );
  }
  const bounded = nets(FLAG_BOUND, false);
  if (bounded.length > 0) {
    out.push(
      finding(
        'limit',
        'warning',
        vector,
        bounded.map((n) => name.net(n)),
        touching(bounded),
        `too many devices with gates at X at ${label()}: ${bounded.map((n) => name.net(n)).join(', ')} set to X conservatively`,
      ),
    );
  }
  return out;
}

/**
 * Floating nets (docs/semantics.md §3), naming the (all off) devices whose channels end on them: an output is an
 * error unless Z is expected; a gate-feeding net is an error without known charge and a warning with
 * it (a dynamic node). Diffusion-only internal nodes
 * (inside transistor stacks) that feed no gate are not reported: they float by design in every
 * static gate.
 */
function floatingFindings(
  r: SolveResult,
  vector: number,
  label: () => string,
  expected: ReadonlyMap<number, ExpectedValue>,
): Finding[] {
  const name = new Namer(r);
  const c = r.compiled;
  const out: Finding[] = [];
  for (let n = 0; n < c.netCount; n++) {
    if (r.levels[n] !== LEVEL_Z || r.topology.isSource[n] || !observed(r, n)) continue;
    const isOutput = c.outputNets.includes(n);
    if (isOutput && expected.get(n) === 'Z') continue;
    const known = !Number.isNaN(r.volts[n]);
    const severity: Severity = isOutput || !known ? 'error' : 'warning';
    const charge = known ? `holding ${r.volts[n].toFixed(2)} V of stored charge` : 'with no known charge';
    out.push(
      finding(
        'floating',
        severity,
        vector,
        [name.net(n)],
        channelDevices(r, [n], false),
        `floating at ${label()}: ${name.net(n)} has no conducting path to any source, ${charge}`,
      ),
    );
  }
  return out;
}

function mismatchFindings(
  r: SolveResult,
  vector: number,
  label: () => string,
  expected: ReadonlyMap<number, ExpectedValue>,
): Finding[] {
  const name = new Namer(r);
  const out: Finding[] = [];
  for (const [n, want] of expected) {
    if (want === 'X') continue;
    const got = levelName(r.levels[n]);
    if (got !== want) {
      out.push(
        finding(
          'mismatch',
          'error',
          vector,
          [name.net(n)],
          channelDevices(r, [n], true),
          `mismatch at ${label()}: ${name.net(n)} is ${got}, expected ${want}`,
        ),
      );
    }
  }
  return out;
}
