// Indexes read here are in range by construction, so `!` marks them (no run-time cost).
import type { ExpectedValue } from '../expect/evaluate.ts';
import {
  FLAG_BOUND,
  FLAG_CHARGE_SHARED,
  FLAG_CONTENTION,
  FLAG_ILL_CONDITIONED,
  FLAG_OSCILLATING,
  FLAG_STATES,
  LEVEL_X,
  LEVEL_Z,
  MAYBE,
} from '../solver/levels.ts';
import type { SolveResult } from '../solver/simulator.ts';
import { channelDevices, finding, Namer } from './findingParts.ts';
import { observationOf } from './observation.ts';
import type { Finding, Severity } from './report.ts';

/** How far the explanation walks back through unknown gates before it stops. */
const MAX_TRACED_NETS = 24;

/**
 * `unknown` findings (docs/semantics.md §3): every output at X gets one, so a checker never passes
 * what it could not decide. Severity: error when every input of the vector is 0 or 1 and the expected
 * function does not allow X there; a warning when it does (a held value in a sweep) or when the vector
 * drives an input to X or leaves it undriven (the X may simply follow from that input). None where an
 * error finding of the same vector already names the output: the vector fails anyway.
 */
export function unknownFindings(
  r: SolveResult,
  vector: number,
  label: () => string,
  expected: ReadonlyMap<number, ExpectedValue>,
  found: readonly Finding[],
): Finding[] {
  const c = r.compiled;
  const out: Finding[] = [];
  for (const n of c.outputNets) {
    if (r.levels[n] !== LEVEL_X) continue;
    const name = c.netNames[n]!;
    if (found.some((f) => f.severity === 'error' && f.nets.includes(name))) continue;
    const allowed = expected.get(n) === 'X';
    const definite = Object.values(r.inputs).every((v) => v === '0' || v === '1');
    const severity: Severity = definite && !allowed ? 'error' : 'warning';
    const why = explain(r, n);
    const note = allowed
      ? ', as its expected function allows'
      : definite
        ? ''
        : ' (an input is X or undriven)';
    const hint = why.stored && !allowed ? `; ${STORED_HINT}` : '';
    const message = `unknown at ${label()}: ${name} is X${note}: ${why.text}${hint}`;
    out.push(finding('unknown', severity, vector, [name, ...why.nets], why.devices, message));
  }
  return out;
}

const STORED_HINT =
  'a sweep starts every vector from an unknown state: name the output in its expected function to say it holds (e.g. Q = S | !R & Q), or check it with a sequence';

interface Explanation {
  readonly text: string;
  /** Nets named as causes (the output itself excluded). */
  readonly nets: string[];
  readonly devices: string[];
  /** Some cause is stored state (several steady states). */
  readonly stored: boolean;
}

/**
 * Why net `out` is X, as far as the result tells: walks back from it, a level at a time, through
 * maybe-conducting devices to their unknown gates until it meets nets whose flags name a cause. Each
 * level is taken in name order, so what is named never depends on the order of devices.
 */
function explain(r: SolveResult, out: number): Explanation {
  const name = new Namer(r);
  const byName = (a: number, b: number): number => (name.net(a) < name.net(b) ? -1 : 1);
  const { causes, devices } = traceCauses(r, out, byName);
  const listed = [...causes].map(([cause, nets]) => [cause, [...nets].sort(byName)] as const);
  listed.sort(([a], [b]) => (a < b ? -1 : 1));
  const parts = listed.map(([cause, nets]) => cause.replace('%', nets.map((n) => name.net(n)).join(', ')));
  const through = [...devices].map((e) => name.element(e)).sort();
  const text =
    (parts.length > 0 ? parts.join('; ') : 'its value depends on devices whose gates are unknown') +
    (through.length > 0 ? ` (through ${through.join(', ')})` : '');
  const causeNets = [...new Set(listed.flatMap(([, nets]) => nets))].filter((n) => n !== out);
  return {
    text,
    nets: causeNets.map((n) => name.net(n)),
    devices: through.length > 0 ? through : channelDevices(r, [out, ...causeNets], true),
    stored: causes.has(STORED_STATE),
  };
}

/** The breadth-first walk of `explain`: causes with their nets, and the maybe devices passed. */
function traceCauses(
  r: SolveResult,
  out: number,
  byName: (a: number, b: number) => number,
): { causes: Map<string, Set<number>>; devices: Set<number> } {
  const causes = new Map<string, Set<number>>();
  const devices = new Set<number>();
  const seen = new Set<number>([out]);
  for (let level = [out]; level.length > 0 && seen.size <= MAX_TRACED_NETS;) {
    const next: number[] = [];
    for (const n of level) {
      const cause = causeOf(r, n);
      if (cause !== null) {
        const set = causes.get(cause) ?? new Set<number>();
        for (const m of (r.flags[n]! & FLAG_STATES) !== 0 ? statesPartners(r, n) : [n]) set.add(m);
        causes.set(cause, set);
        continue;
      }
      for (const [e, gate] of maybeDevices(r, n)) {
        devices.add(e);
        if (gate >= 0 && !seen.has(gate)) next.push(gate);
      }
    }
    level = [...new Set(next)].sort(byName).slice(0, MAX_TRACED_NETS + 1 - seen.size);
    for (const n of level) seen.add(n);
  }
  return { causes, devices };
}

const STORED_STATE = 'several steady states on % (stored state: a latch or memory holding its value)';

/**
 * The nets of n's feedback group that its steady states disagree on and that feed a gate or are
 * outputs (the group's memory), n among them.
 */
function statesPartners(r: SolveResult, n: number): number[] {
  const { sccOrder, cccOfNet, cccNets } = r.topology;
  const k = cccOfNet[n]!;
  const s = sccOrder.items.indexOf(k);
  let row = 0;
  while (sccOrder.start[row + 1]! <= s) row++;
  const { observed } = observationOf(r.compiled);
  const nets: number[] = [];
  for (let i = sccOrder.start[row]!; i < sccOrder.start[row + 1]!; i++) {
    const member = sccOrder.items[i]!;
    for (let q = cccNets.start[member]!; q < cccNets.start[member + 1]!; q++) {
      const m = cccNets.items[q]!;
      if (r.flags[m]! & FLAG_STATES && (observed[m] === 1 || m === n)) nets.push(m);
    }
  }
  return nets.sort((a, b) => (r.compiled.netNames[a]! < r.compiled.netNames[b]! ? -1 : 1));
}

/** What a net's own flags and level say about its X, or null when it is only X through maybe devices. */
function causeOf(r: SolveResult, n: number): string | null {
  const f = r.flags[n]!;
  if (r.topology.isSource[n]) return Number.isNaN(r.volts[n]) ? 'input % at X' : null;
  if (f & FLAG_STATES) return f & FLAG_OSCILLATING ? 'a race between steady states on %' : STORED_STATE;
  if (f & FLAG_OSCILLATING) return 'no steady state on %';
  if (f & FLAG_BOUND) return '% past an exact-enumeration bound';
  if (f & FLAG_ILL_CONDITIONED) return 'an ill-conditioned nodal solve on %';
  if (f & FLAG_CONTENTION) return 'contention on %';
  if (f & FLAG_CHARGE_SHARED) return 'charge sharing on %';
  if (r.levels[n] === LEVEL_Z) return Number.isNaN(r.volts[n]) ? '% floating with no known charge' : null;
  if (!Number.isNaN(r.volts[n]) && r.levels[n] === LEVEL_X) return '% between the input thresholds';
  return null;
}

/** Maybe-conducting elements of net n's channel-connected component, with their gate nets. */
function maybeDevices(r: SolveResult, n: number): [number, number][] {
  const { cccOfNet, cccElements } = r.topology;
  const k = cccOfNet[n]!;
  if (k < 0) return [];
  const out: [number, number][] = [];
  for (let i = cccElements.start[k]!; i < cccElements.start[k + 1]!; i++) {
    const e = cccElements.items[i]!;
    if (r.conduction[e] === MAYBE) out.push([e, r.compiled.chGate[e]!]);
    const c = r.compiled;
    for (const end of [c.chA[e]!, c.chB[e]!]) {
      if (r.topology.isSource[end] && Number.isNaN(r.volts[end])) out.push([e, end]);
    }
  }
  return out;
}
