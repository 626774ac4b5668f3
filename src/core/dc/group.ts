// Indexes here are in range by construction (compiled-netlist and per-net arrays), so `!` marks them (no run-time cost).
import type { NodalSystem } from './assemble.ts';
import type { DcGroup, DcNetwork } from './network.ts';
import { isUnstable } from './stability.ts';
import { converge } from './strategies.ts';

/**
 * How one group came out:
 * - `solved`: every net has a voltage, except floating ones with unknown charge;
 * - `blocked`: a gate, bulk or source it depends on has no known voltage, or a floating net with
 *   unknown charge gates a device of the group itself, so nothing in it can be known;
 * - `not-converged`: every strategy failed (see `tried`, `moving`);
 * - `unstable`: the point found is an unstable equilibrium of a loop (a bistable latch between its
 *   states), which depends on history, not on the inputs.
 */
export type GroupStatus = 'solved' | 'blocked' | 'not-converged' | 'unstable';

export interface GroupOutcome {
  readonly status: GroupStatus;
  readonly tried: readonly string[];
  readonly iterations: number;
  /** Nets with no conducting path to a fixed voltage: NaN unless held at a stored voltage. */
  readonly floating: readonly number[];
  /** Floating nets given the stored voltage of the switch-level state. */
  readonly held: readonly number[];
  /** Not converged: the nets still moving. Blocked: the nets whose voltage was missing. */
  readonly nets: readonly number[];
}

/** Working state shared by all groups of one solve, indexed by global net or element. */
export interface SolveState {
  readonly volts: Float64Array;
  /** The numbers Newton settled on, floating nets included: for continuation and slopes only. */
  readonly raw: Float64Array;
  readonly current: Float64Array;
  readonly start: ArrayLike<number>;
  readonly stored: ArrayLike<number>;
  /** Newton iterations per attempt (tests lower it to exercise the fallbacks). */
  readonly maxIterations?: number;
}

/** Rounds of "hold the floating nets at their stored charge and solve again" before giving up. */
const HOLD_ROUNDS = 3;

export function solveGroup(network: DcNetwork, k: number, state: SolveState): GroupOutcome {
  const group = network.groups[k] as DcGroup;
  const missing = missingInputs(network, group, state.volts);
  if (missing.length > 0) return fail(group, state, 'blocked', [], 0, missing);
  const held = new Set<number>();
  let pass = solveOnce(network, k, state, held);
  let iterations = pass.iterations;
  for (let round = 1; round < HOLD_ROUNDS && pass.converged; round++) {
    // A floating net that gates the group itself decides the rest: hold it at its stored charge.
    const storable = pass.floating.filter((n) => storedAt(state, n) && controlsGroup(network, group, n));
    if (storable.length === 0) break;
    storable.forEach((n) => held.add(n));
    pass = solveOnce(network, k, state, held);
    iterations += pass.iterations;
  }
  if (!pass.converged) return fail(group, state, 'not-converged', pass.tried, iterations, pass.moving);
  for (const n of pass.floating) state.volts[n] = storedAt(state, n) ? state.stored[n]! : NaN;
  const unknownControl = pass.floating.filter((n) => !storedAt(state, n) && controlsGroup(network, group, n));
  if (unknownControl.length > 0) return fail(group, state, 'blocked', pass.tried, iterations, unknownControl);
  if (pass.unstable) return fail(group, state, 'unstable', pass.tried, iterations, []);
  for (const e of group.elements) state.current[e] = pass.current[e]!;
  const floating = [...held, ...pass.floating];
  return {
    status: 'solved',
    tried: pass.tried,
    iterations,
    floating,
    held: floating.filter((n) => storedAt(state, n)),
    nets: [],
  };
}

interface Pass {
  readonly converged: boolean;
  readonly tried: readonly string[];
  readonly iterations: number;
  /** Global nets still moving when it gave up. */
  readonly moving: readonly number[];
  /** Global nets left floating (not counting held ones). */
  readonly floating: readonly number[];
  readonly unstable: boolean;
  readonly current: Float64Array;
}

/** One Newton solve of the group with `held` nets fixed at their stored voltage; writes state.volts. */
function solveOnce(network: DcNetwork, k: number, state: SolveState, held: ReadonlySet<number>): Pass {
  const group = network.groups[k] as DcGroup;
  const unknowns = Array.from(group.nets).filter((n) => !held.has(n));
  for (const n of held) state.volts[n] = state.raw[n] = state.stored[n]!;
  const sys = network.system(k, unknowns.length, state.volts);
  unknowns.forEach((n, i) => (network.pos[n] = i));
  const [lo, hi] = range(network, group, state, held);
  const x = Float64Array.from(unknowns, (n) => {
    const v = state.start[n]!;
    return Number.isFinite(v) ? Math.min(hi, Math.max(lo, v)) : (lo + hi) / 2;
  });
  const bounds = {
    lo,
    hi,
    caps: Float64Array.from(unknowns, (n) => network.compiled.netCap[n]!),
    ...(state.maxIterations === undefined ? {} : { maxIterations: state.maxIterations }),
  };
  const result = converge(sys, x, bounds);
  const floating = result.converged ? floatingNets(network, group, sys, unknowns, held) : [];
  const unstable =
    result.converged &&
    group.feedback &&
    isUnstable(
      sys.jacobian,
      unknowns.map((n) => network.compiled.netCap[n]!),
    );
  unknowns.forEach((n, i) => {
    network.pos[n] = -1;
    state.volts[n] = state.raw[n] = x[i]!;
  });
  return {
    converged: result.converged,
    tried: result.tried,
    iterations: result.iterations,
    moving: result.moving.map((i) => unknowns[i] as number),
    floating,
    unstable,
    current: sys.current,
  };
}

function storedAt(state: SolveState, net: number): boolean {
  return Number.isFinite(state.stored[net]);
}

function fail(
  group: DcGroup,
  state: SolveState,
  status: GroupStatus,
  tried: readonly string[],
  iterations: number,
  nets: readonly number[],
): GroupOutcome {
  for (const n of group.nets) state.volts[n] = state.raw[n] = NaN;
  for (const e of group.elements) state.current[e] = NaN;
  return { status, tried, iterations, floating: [], held: [], nets };
}

/** Fixed nets the group reads (gates, bulks, channel ends outside it) that have no known voltage. */
function missingInputs(network: DcNetwork, group: DcGroup, volts: Float64Array): number[] {
  const c = network.compiled;
  const missing = new Set<number>();
  const check = (net: number): void => {
    if (net >= 0 && network.groupOf[net] !== network.groupOf[group.nets[0]!] && Number.isNaN(volts[net]))
      missing.add(net);
  };
  for (const e of group.elements) {
    check(c.chA[e]!);
    check(c.chB[e]!);
    check(c.chGate[e]!);
    check(network.bulk[e]!);
  }
  return [...missing];
}

/** A net is a gate or bulk of some element of the group. */
function controlsGroup(network: DcNetwork, group: DcGroup, net: number): boolean {
  const c = network.compiled;
  return group.elements.some((e) => c.chGate[e] === net || network.bulk[e] === net);
}

/**
 * Where the group's voltages can lie: every current flows from the higher to the lower end of a
 * channel, so no net rises above the highest fixed voltage at a channel end, nor below the lowest
 * (nor away from 0 V, where GMIN pulls).
 */
function range(
  network: DcNetwork,
  group: DcGroup,
  state: SolveState,
  held: ReadonlySet<number>,
): [number, number] {
  const c = network.compiled;
  let lo = 0;
  let hi = 0;
  const see = (net: number): void => {
    if (network.groupOf[net] === network.groupOf[group.nets[0]!] && !held.has(net)) return;
    lo = Math.min(lo, state.volts[net]!);
    hi = Math.max(hi, state.volts[net]!);
  };
  for (const e of group.elements) {
    see(c.chA[e]!);
    see(c.chB[e]!);
  }
  return [lo, hi];
}

/** Unknowns with no path of conducting elements to a fixed, non-held net (global net numbers). */
function floatingNets(
  network: DcNetwork,
  group: DcGroup,
  sys: NodalSystem,
  unknowns: readonly number[],
  held: ReadonlySet<number>,
): number[] {
  const c = network.compiled;
  const anchored = new Uint8Array(unknowns.length);
  const neighbours: number[][] = unknowns.map(() => []);
  for (const e of group.elements) {
    if (!sys.conducting[e]) continue;
    const pa = sys.pos[c.chA[e]!]!;
    const pb = sys.pos[c.chB[e]!]!;
    if (pa >= 0 && pb >= 0) {
      neighbours[pa]?.push(pb);
      neighbours[pb]?.push(pa);
    } else if (pa >= 0 && !held.has(c.chB[e]!)) anchored[pa] = 1;
    else if (pb >= 0 && !held.has(c.chA[e]!)) anchored[pb] = 1;
  }
  const queue = unknowns.flatMap((_n, i) => (anchored[i] ? [i] : []));
  while (queue.length > 0) {
    const i = queue.pop() as number;
    for (const j of neighbours[i] ?? []) {
      if (anchored[j]) continue;
      anchored[j] = 1;
      queue.push(j);
    }
  }
  return unknowns.filter((_n, i) => !anchored[i]);
}
