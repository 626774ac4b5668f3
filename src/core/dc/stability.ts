import { EigenvalueDecomposition, Matrix } from 'ml-matrix';

/** Capacitance given to a net that has none, farads, so that C⁻¹ exists. */
const MIN_CAP = 1e-18;

/**
 * Whether an operating point of a loop is an unstable equilibrium. Near the point the nets obey
 * C·dv/dt = −J·δv (J the Jacobian of the currents leaving each net, C each net's capacitance), so the
 * point is stable only if every eigenvalue of C⁻¹·J has a positive real part. A cross-coupled pair
 * balanced at its metastable point has one negative eigenvalue: the DC equations hold there, but the
 * latch never stays, and which state it falls into depends on history.
 */
export function isUnstable(jacobian: Matrix, caps: readonly number[]): boolean {
  const n = jacobian.rows;
  if (n === 0) return false;
  const scaled = new Matrix(n, n);
  for (let i = 0; i < n; i++) {
    const inv = 1 / Math.max(caps[i] ?? 0, MIN_CAP);
    for (let j = 0; j < n; j++) scaled.set(i, j, jacobian.get(i, j) * inv);
  }
  const eigen = new EigenvalueDecomposition(scaled);
  const real = eigen.realEigenvalues;
  const largest = Math.max(...real.map(Math.abs), ...eigen.imaginaryEigenvalues.map(Math.abs));
  return real.some((r) => r < -1e-9 * largest);
}
