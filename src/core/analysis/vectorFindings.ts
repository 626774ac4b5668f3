// Indexes read here are in range by construction, so `!` marks them (no run-time cost).
import { RESISTOR } from '../compile/compile.ts';
import type { ExpectedValue } from '../expect/evaluate.ts';
import {
  FLAG_BOUND,
  FLAG_CHARGE_SHARED,
  FLAG_CONTENTION,
  FLAG_DEGRADED,
  FLAG_ILL_CONDITIONED,
  FLAG_OSCILLATING,
  FLAG_STATES,
  LEVEL_0,
  LEVEL_X,
  LEVEL_Z,
  levelName,
} from '../solver/levels.ts';
import type { SolveResult } from '../solver/simulator.ts';
import { engineering } from '../units/engineering.ts';
import { channelDevices, finding, Namer } from './findingParts.ts';
import { observationOf } from './observation.ts';
import type { Finding, FindingKind, Severity } from './report.ts';
import { unknownFindings } from './unknownFindings.ts';

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
  const found = [
    ...currentFindings(r, vector, label),
    ...flaggedFindings(r, vector, label),
    ...floatingFindings(r, vector, label, expected),
    ...mismatchFindings(r, vector, label, expected),
  ];
  return [...found, ...unknownFindings(r, vector, label, expected, found)];
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
    const watts = r.volts[p.nets[0]!]! * p.current - r.volts[p.nets[p.nets.length - 1]!]! * p.current;
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

/** Nets flagged in one result, and the finding helpers that read them. */
class Flagged {
  readonly name: Namer;
  private readonly flagged: number[] = [];

  constructor(
    readonly r: SolveResult,
    readonly vector: number,
    readonly label: () => string,
  ) {
    this.name = new Namer(r);
    // One pass over the nets; most vectors flag none, so this is the whole cost of a clean vector.
    for (let n = 0; n < r.compiled.netCount; n++)
      if (r.flags[n] !== 0 && !r.topology.isSource[n]) this.flagged.push(n);
  }

  nets(flag: number, onlyObserved = false): number[] {
    const { observed } = observationOf(this.r.compiled);
    return this.flagged.filter(
      (n) => (this.r.flags[n]! & flag) !== 0 && (!onlyObserved || observed[n] === 1),
    );
  }

  /** One finding over a list of nets (none when the list is empty); `say` writes the message. */
  group(kind: FindingKind, severity: Severity, nets: number[], say: (names: string) => string): Finding[] {
    if (nets.length === 0) return [];
    const names = nets.map((n) => this.name.net(n));
    const devices = channelDevices(this.r, nets, true);
    return [finding(kind, severity, this.vector, names, devices, say(names.join(', ')))];
  }
}

function flaggedFindings(r: SolveResult, vector: number, label: () => string): Finding[] {
  const f = new Flagged(r, vector, label);
  const at = label;
  const racing = f.nets(FLAG_OSCILLATING);
  const race = racing.length > 0 && racing.every((n) => (r.flags[n]! & FLAG_STATES) !== 0);
  return [
    ...contentionFindings(f),
    ...degradedFindings(f),
    ...f.group('charge-sharing', 'warning', f.nets(FLAG_CHARGE_SHARED), () => {
      const list = f.nets(FLAG_CHARGE_SHARED).map((n) => {
        const v = r.volts[n]!;
        return `${f.name.net(n)} ${Number.isNaN(v) ? 'unknown' : `${v.toFixed(2)} V`}`;
      });
      return `charge sharing at ${at()}: ${list.join(', ')}`;
    }),
    ...f.group('no-steady-state', 'error', racing, (names) =>
      race
        ? `no steady state at ${at()}: ${names} kept changing between several steady states (a race) and are shown as X`
        : `no steady state at ${at()}: ${names} kept changing, or no definite level on them is a steady state (an oscillator, or a level held between the thresholds); shown as X`,
    ),
    ...f.group(
      'limit',
      'warning',
      f.nets(FLAG_BOUND),
      (names) =>
        `too many unknowns to enumerate exactly at ${at()} (devices with gates at X, or undecided feedback nets): ${names} set to X conservatively`,
    ),
    ...f.group(
      'limit',
      'warning',
      f.nets(FLAG_ILL_CONDITIONED),
      (names) =>
        `ill-conditioned nodal solve at ${at()}: the resistances joining ${names} span too many orders of magnitude for a trustworthy result; set to X`,
    ),
  ];
}

function contentionFindings(f: Flagged): Finding[] {
  return f
    .nets(FLAG_CONTENTION)
    .map((n) =>
      finding(
        'contention',
        'error',
        f.vector,
        [f.name.net(n)],
        channelDevices(f.r, [n], true),
        `contention at ${f.label()}: ${f.name.net(n)} sits at ${f.r.volts[n]!.toFixed(2)} V, between the input thresholds, fought over by drivers of both levels`,
      ),
    );
}

function degradedFindings(f: Flagged): Finding[] {
  const { r, name } = f;
  return f.nets(FLAG_DEGRADED, true).map((n) => {
    const by = r.limiter[n]! >= 0 ? [name.element(r.limiter[n]!)] : [];
    const verb = r.levels[n] === LEVEL_0 ? 'falls only to' : 'reaches only';
    const through = by.length ? ` through ${by[0]}` : '';
    return finding(
      'degraded',
      'warning',
      f.vector,
      [name.net(n)],
      by,
      `degraded level at ${f.label()}: ${name.net(n)} ${verb} ${r.volts[n]!.toFixed(2)} V (a threshold drop${through})`,
    );
  });
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
  const { observed, isOutput: outputs } = observationOf(c);
  const out: Finding[] = [];
  for (let n = 0; n < c.netCount; n++) {
    if (r.levels[n] !== LEVEL_Z || r.topology.isSource[n] || observed[n] === 0) continue;
    const isOutput = outputs[n] === 1;
    if (isOutput && expected.get(n) === 'Z') continue;
    const known = !Number.isNaN(r.volts[n]);
    const severity: Severity = isOutput || !known ? 'error' : 'warning';
    const charge = known ? `holding ${r.volts[n]!.toFixed(2)} V of stored charge` : 'with no known charge';
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
    const got = levelName(r.levels[n]!);
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
