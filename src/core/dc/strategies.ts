// Indexes here are in range by construction (compiled-netlist and per-net arrays), so `!` marks them (no run-time cost).
import { GMIN, type NodalSystem } from './assemble.ts';
import { newton, STEP_TOLERANCE, type NewtonOutcome } from './newton.ts';

/** What is tried on a group, in order, until one converges (docs/semantics.md §2, DC levels). */
export const NEWTON = 'damped Newton from the switch-level start';
export const PSEUDO_TRANSIENT =
  'pseudo-transient stepping (each net tied by C/Δt to its last value, Δt growing)';
export const GMIN_STEPPING = 'gmin stepping (1 mS to 1 pS to ground, a decade at a time)';
export const SOURCE_STEPPING = 'source stepping (every fixed voltage ramped from 0)';

/** Smallest fraction of the supply ramp source stepping may take before giving up. */
const MIN_SOURCE_STEP = 1e-3;
/** Pseudo-transient steps before giving up; Δt grows fourfold per step that converges. */
const MAX_TIME_STEPS = 200;
/** Capacitance given to a net with none in pseudo-transient stepping, farads. */
const MIN_CAP = 1e-18;

export interface Bounds {
  readonly lo: number;
  readonly hi: number;
  /** Capacitance of each unknown, farads (pseudo-transient stepping). */
  readonly caps: Float64Array;
  readonly maxIterations?: number;
}

export interface Convergence {
  readonly converged: boolean;
  readonly tried: readonly string[];
  readonly iterations: number;
  /** Unknown positions still moving when the last attempt gave up, largest step first (at most 5). */
  readonly moving: readonly number[];
}

interface Attempt {
  readonly converged: boolean;
  readonly iterations: number;
  readonly last: NewtonOutcome;
}

type Strategy = (sys: NodalSystem, x: Float64Array, bounds: Bounds) => Attempt;

const STRATEGIES: readonly (readonly [string, Strategy])[] = [
  [NEWTON, (sys, x, b) => single(newton(sys, x, { ...b, scale: 1, shunt: 0 }))],
  [PSEUDO_TRANSIENT, pseudoTransient],
  [GMIN_STEPPING, gminStepping],
  [SOURCE_STEPPING, sourceStepping],
];

/**
 * Finds the operating point of one nodal system from `x` (the start; updated in place). Each
 * strategy starts again from the start (source stepping from all zeros) and each of its steps from
 * the last step's answer.
 */
export function converge(sys: NodalSystem, x: Float64Array, bounds: Bounds): Convergence {
  const start = x.slice();
  const tried: string[] = [];
  let iterations = 0;
  let last: NewtonOutcome | null = null;
  for (const [name, strategy] of STRATEGIES) {
    tried.push(name);
    x.set(start);
    const attempt = strategy(sys, x, bounds);
    iterations += attempt.iterations;
    last = attempt.last;
    if (attempt.converged) return { converged: true, tried, iterations, moving: [] };
  }
  return { converged: false, tried, iterations, moving: last === null ? [] : stillMoving(last.lastStep) };
}

function single(outcome: NewtonOutcome): Attempt {
  return { converged: outcome.converged, iterations: outcome.iterations, last: outcome };
}

/**
 * The circuit left to settle in time from the start: backward-Euler steps, each a Newton solve with
 * every unknown tied to its previous value by C/Δt, Δt growing until the ties are far weaker than
 * GMIN; then the bare circuit. A loop falls into the state its start leans towards, as on silicon.
 */
function pseudoTransient(sys: NodalSystem, x: Float64Array, bounds: Bounds): Attempt {
  const caps = bounds.caps.map((c) => Math.max(c, MIN_CAP));
  const g = new Float64Array(sys.n);
  let dt = 1e-15;
  let iterations = 0;
  let last = notYet(sys);
  for (let step = 0; step < MAX_TIME_STEPS; step++) {
    for (let i = 0; i < sys.n; i++) g[i] = caps[i]! / dt;
    if (g.every((gi) => gi < GMIN * 1e-3)) {
      last = newtonOn(sys, x, bounds, 0);
      return { converged: last.converged, iterations: iterations + last.iterations, last };
    }
    const before = x.slice();
    last = newton(sys, x, { ...bounds, scale: 1, shunt: 0, tie: { g, toward: before } });
    iterations += last.iterations;
    if (last.converged) dt *= 4;
    else {
      x.set(before);
      dt /= 8;
    }
  }
  return { converged: false, iterations, last };
}

function notYet(sys: NodalSystem): NewtonOutcome {
  return { converged: false, iterations: 0, lastStep: new Float64Array(sys.n) };
}

function newtonOn(sys: NodalSystem, x: Float64Array, bounds: Bounds, shunt: number): NewtonOutcome {
  return newton(sys, x, { ...bounds, scale: 1, shunt });
}

/** A large conductance to ground on every net, lowered a decade at a time to nothing. */
function gminStepping(sys: NodalSystem, x: Float64Array, bounds: Bounds): Attempt {
  let iterations = 0;
  for (let shunt = 1e-3; ; shunt /= 10) {
    const atEnd = shunt < GMIN;
    const last = newtonOn(sys, x, bounds, atEnd ? 0 : shunt);
    iterations += last.iterations;
    if (!last.converged || atEnd) return { converged: last.converged, iterations, last };
  }
}

/** Every fixed voltage ramped from 0 (where all nets sit at 0 V) to its value. */
function sourceStepping(sys: NodalSystem, x: Float64Array, bounds: Bounds): Attempt {
  x.fill(0);
  let scale = 0;
  let step = 0.1;
  let iterations = 0;
  let last = notYet(sys);
  while (scale < 1 && step >= MIN_SOURCE_STEP) {
    const next = Math.min(1, scale + step);
    const before = x.slice();
    last = newton(sys, x, { ...bounds, scale: next, shunt: 0 });
    iterations += last.iterations;
    if (last.converged) {
      scale = next;
      step = Math.min(0.25, step * 1.5);
    } else {
      x.set(before);
      step /= 2;
    }
  }
  return { converged: scale === 1, iterations, last };
}

function stillMoving(lastStep: Float64Array): number[] {
  const order = Array.from(lastStep.keys()).sort((a, b) => lastStep[b]! - lastStep[a]!);
  const moving = order.filter((i) => lastStep[i]! > STEP_TOLERANCE);
  return (moving.length > 0 ? moving : order).slice(0, 5);
}
