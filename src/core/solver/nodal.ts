// Hot loop: indexes here are in range by construction, so `!` marks them (no run-time cost).
import { Matrix, solve } from 'ml-matrix';
import type { Frame } from './frame.ts';

/**
 * Conductances in one group spanning more than this ratio make the solve untrustworthy in double
 * precision (relative rounding about 1e-16 times the spread): such a group is reported, not solved.
 */
export const MAX_CONDUCTANCE_SPREAD = 1e15;

/**
 * Nodal analysis of one component whose sources sit at different voltages (docs/semantics.md §2.3): every
 * conducting element is its on-resistance, sources are fixed voltages, and Kirchhoff's current law at
 * each net gives G·v = b. Writes frame.volts for the component's nets and frame.current (A→B) for its
 * conducting elements. A single unknown is solved directly; larger systems go to ml-matrix's LU solve.
 *
 * Returns false, writing nothing, when the system is ill-conditioned (docs/semantics.md §2): the
 * conductances spread beyond MAX_CONDUCTANCE_SPREAD in a system of two or more unknowns, a singular
 * or non-finite solve, or a voltage outside the range of the sources (impossible for a resistive
 * network, so a sign of rounding).
 */
export function solveNodal(frame: Frame, root: number): boolean {
  const { c } = frame;
  const order: number[] = [];
  const position = new Map<number, number>();
  for (let i = frame.head[root]!; i >= 0; i = frame.next[i]!) {
    position.set(i, order.length);
    order.push(i);
  }
  const n = order.length;
  const g = Matrix.zeros(n, n);
  const b = Matrix.zeros(n, 1);
  let least = Infinity;
  let most = 0;
  let lo = Infinity;
  let hi = -Infinity;
  forEachConducting(frame, root, (j, e, a, bb) => {
    const conductance = 1 / c.chOhms[e]!;
    least = Math.min(least, conductance);
    most = Math.max(most, conductance);
    if (a >= 0 && bb >= 0) {
      const pa = position.get(a) as number;
      const pb = position.get(bb) as number;
      g.set(pa, pa, g.get(pa, pa) + conductance);
      g.set(pb, pb, g.get(pb, pb) + conductance);
      g.set(pa, pb, g.get(pa, pb) - conductance);
      g.set(pb, pa, g.get(pb, pa) - conductance);
    } else {
      const p = position.get(a >= 0 ? a : bb) as number;
      g.set(p, p, g.get(p, p) + conductance);
      b.set(p, 0, b.get(p, 0) + conductance * frame.sourceEndVolts[j]!);
      lo = Math.min(lo, frame.sourceEndVolts[j]!);
      hi = Math.max(hi, frame.sourceEndVolts[j]!);
    }
  });
  // One unknown is a plain division, exact to rounding whatever the spread.
  if (n > 1 && !(most / least <= MAX_CONDUCTANCE_SPREAD)) return false;
  const v = linearSolve(g, b, n);
  const slack = 1e-9 * Math.max(1, Math.abs(hi), Math.abs(lo));
  if (v === null || v.some((x) => !(x >= lo - slack && x <= hi + slack))) return false;
  order.forEach((i, p) => (frame.volts[i] = v[p]!));
  forEachConducting(frame, root, (j, e, a, bb) => {
    const va = a >= 0 ? frame.volts[a]! : frame.sourceEndVolts[j]!;
    const vb = bb >= 0 ? frame.volts[bb]! : frame.sourceEndVolts[j]!;
    frame.current[j] = (va - vb) / c.chOhms[e]!;
  });
  return true;
}

/** Solves G·v = b; null when the LU solve finds the matrix singular. */
function linearSolve(g: Matrix, b: Matrix, n: number): number[] | null {
  if (n === 1) return [b.get(0, 0) / g.get(0, 0)];
  try {
    return solve(g, b).getColumn(0);
  } catch {
    return null;
  }
}

/**
 * Visits each conducting element of the component once: (local element, global element, local A or
 * -1, local B or -1). Elements tying the component to a source come from the source list.
 */
function forEachConducting(
  frame: Frame,
  root: number,
  visit: (j: number, e: number, a: number, b: number) => void,
): void {
  const { topo } = frame;
  for (let j = 0; j < frame.elemCount; j++) {
    if (!frame.on[j]) continue;
    const e = frame.element(j);
    const a = topo.elemLocalA[e]!;
    const b = topo.elemLocalB[e]!;
    if (a < 0 && b < 0) continue;
    const inside = a >= 0 ? frame.root(a) === root : frame.root(b) === root;
    if (!inside || a === b) continue;
    visit(j, e, a, b);
  }
}
