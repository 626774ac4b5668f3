// Indexes here are in range by construction (compiled-netlist and per-net arrays), so `!` marks them (no run-time cost).
import type { Loading, NodalSystem } from './assemble.ts';

/** A Newton step smaller than this on every net ends the iteration, volts. */
export const STEP_TOLERANCE = 1e-9;
/** Iterations allowed to one Newton run before it counts as not converging. */
export const MAX_ITERATIONS = 100;

export interface NewtonRun extends Loading {
  /** Voltages are kept inside [lo, hi]: no net of a network of channels can leave its sources' range. */
  readonly lo: number;
  readonly hi: number;
  /** Iterations before this run counts as not converging (default MAX_ITERATIONS). */
  readonly maxIterations?: number;
}

export interface NewtonOutcome {
  readonly converged: boolean;
  readonly iterations: number;
  /** Largest change per unknown in the last step (which nets were still moving), volts. */
  readonly lastStep: Float64Array;
}

/**
 * Damped Newton–Raphson on one nodal system, updating `x` in place. Damping: a step whose largest
 * change exceeds a fifth of the voltage range is scaled down to it (so a device jumping between
 * cut-off and conduction cannot throw the iterate far), and every net is clamped to [lo, hi].
 */
export function newton(sys: NodalSystem, x: Float64Array, run: NewtonRun): NewtonOutcome {
  const limit = Math.max(0.05, 0.2 * (run.hi - run.lo));
  const { lastStep, rhs, step } = sys;
  lastStep.fill(0);
  const most = run.maxIterations ?? MAX_ITERATIONS;
  for (let iteration = 1; iteration <= most; iteration++) {
    sys.assemble(x, run);
    for (let i = 0; i < sys.n; i++) rhs[i] = -sys.residual[i]!;
    if (!sys.solveLinear(rhs, step)) return { converged: false, iterations: iteration, lastStep };
    let largest = 0;
    for (let i = 0; i < sys.n; i++) largest = Math.max(largest, Math.abs(step[i]!));
    const damping = largest > limit ? limit / largest : 1;
    for (let i = 0; i < sys.n; i++) {
      const next = Math.min(run.hi, Math.max(run.lo, x[i]! + damping * step[i]!));
      lastStep[i] = Math.abs(next - x[i]!);
      x[i] = next;
    }
    if (largest <= STEP_TOLERANCE) {
      sys.assemble(x, run);
      return { converged: true, iterations: iteration, lastStep };
    }
  }
  return { converged: false, iterations: most, lastStep };
}
