import { GMIN, type NodalSystem } from './assemble.ts';
import { newton, STEP_TOLERANCE, type NewtonOutcome } from './newton.ts';

/** What was tried on a group that did not converge, in order (docs/semantics.md §2, DC levels). */
export const NEWTON = 'damped Newton from the switch-level start';
export const GMIN_STEPPING = 'gmin stepping (1 mS to 1 pS to ground, a decade at a time)';
export const SOURCE_STEPPING = 'source stepping (every fixed voltage ramped from 0)';

/** Smallest fraction of the supply ramp source stepping may take before giving up. */
const MIN_SOURCE_STEP = 1e-3;

export interface Convergence {
  readonly converged: boolean;
  readonly tried: readonly string[];
  readonly iterations: number;
  /** Unknown positions still moving when the last attempt gave up, largest step first (at most 5). */
  readonly moving: readonly number[];
}

/**
 * Finds the operating point of one nodal system from `x` (the start, updated in place): Newton
 * first; if it fails, gmin stepping from the same start; then source stepping from all zeros. Each
 * continuation step starts from the last one's answer.
 */
export function converge(sys: NodalSystem, x: Float64Array, lo: number, hi: number): Convergence {
  const start = x.slice();
  const tried: string[] = [NEWTON];
  let iterations = 0;
  let last: NewtonOutcome = newton(sys, x, { scale: 1, shunt: 0, lo, hi });
  iterations += last.iterations;
  if (last.converged) return { converged: true, tried, iterations, moving: [] };

  tried.push(GMIN_STEPPING);
  x.set(start);
  for (let shunt = 1e-3; ; shunt /= 10) {
    const atEnd = shunt < GMIN;
    last = newton(sys, x, { scale: 1, shunt: atEnd ? 0 : shunt, lo, hi });
    iterations += last.iterations;
    if (!last.converged) break;
    if (atEnd) return { converged: true, tried, iterations, moving: [] };
  }

  tried.push(SOURCE_STEPPING);
  x.fill(0);
  let scale = 0;
  let step = 0.1;
  while (scale < 1 && step >= MIN_SOURCE_STEP) {
    const next = Math.min(1, scale + step);
    const before = x.slice();
    last = newton(sys, x, { scale: next, shunt: 0, lo, hi });
    iterations += last.iterations;
    if (last.converged) {
      scale = next;
      step = Math.min(0.25, step * 1.5);
    } else {
      x.set(before);
      step /= 2;
    }
  }
  if (scale === 1) return { converged: true, tried, iterations, moving: [] };
  return { converged: false, tried, iterations, moving: stillMoving(last.lastStep) };
}

function stillMoving(lastStep: Float64Array): number[] {
  const order = Array.from(lastStep.keys()).sort((a, b) => lastStep[b] - lastStep[a]);
  const moving = order.filter((i) => lastStep[i] > STEP_TOLERANCE);
  return (moving.length > 0 ? moving : order).slice(0, 5);
}
