import { LuDecomposition, Matrix } from 'ml-matrix';
import { NMOS, PMOS } from '../compile/compile.ts';
import { OFF } from '../solver/levels.ts';
import type { SolveResult } from '../solver/simulator.ts';

export const LEAKAGE_MODEL =
  'Each off transistor leaks I = ioffPerWidth · W · V_DS / VDD: linear in width, proportional to its ' +
  'drain-source voltage (so ioffPerWidth · W at V_DS = VDD), length and temperature ignored; undriven ' +
  'nodes between off transistors settle where these leakage currents balance (common practice, no source).';

export interface Leakage {
  /** Equivalent supply current, watts / VDD, amperes (a stack's current counted once). */
  readonly current: number;
  /** Watts dissipated in off transistors: Σ g · V_DS². */
  readonly watts: number;
}

/**
 * Subthreshold leakage of one solved vector. An off transistor is a conductance g = ioff·W / VDD.
 * Driven nets keep their solved voltage; nets that are not driven (floating, unknown, between two
 * off transistors) are solved by nodal analysis of the leakage conductances, which gives the stack
 * effect of series off transistors in its linear form (two in series leak half of one; real stacks
 * leak less still, so this overestimates them).
 */
export function leakageOf(result: SolveResult): Leakage {
  const { compiled: c, conduction } = result;
  const perVolt = c.tech.ioffPerWidth / c.tech.vdd;
  const offElements: number[] = [];
  for (let e = 0; e < c.chCount; e++) {
    if (conduction[e] === OFF && (c.chKind[e] === NMOS || c.chKind[e] === PMOS)) offElements.push(e);
  }
  if (offElements.length === 0 || perVolt === 0) return { current: 0, watts: 0 };
  const conductance = (e: number): number => {
    const d = c.netlist.devices[c.chDevice[e]];
    return d.kind === 'nmos' || d.kind === 'pmos' ? perVolt * d.w : 0;
  };
  const volts = settleUndriven(result, offElements, conductance);
  let watts = 0;
  for (const e of offElements) {
    const vds = Math.abs(volts[c.chA[e]] - volts[c.chB[e]]);
    if (Number.isFinite(vds)) watts += conductance(e) * vds * vds;
  }
  return { current: watts / c.tech.vdd, watts };
}

function isFixed(result: SolveResult, net: number): boolean {
  return result.driven[net] === 1 && !Number.isNaN(result.volts[net]);
}

/** Voltages with every undriven net that touches an off transistor solved from the leakage network. */
function settleUndriven(
  result: SolveResult,
  offElements: readonly number[],
  conductance: (e: number) => number,
): Float64Array {
  const { compiled: c } = result;
  const volts = result.volts.slice();
  const free = new Map<number, number>();
  for (const e of offElements) {
    for (const n of [c.chA[e], c.chB[e]]) if (!isFixed(result, n) && !free.has(n)) free.set(n, free.size);
  }
  if (free.size === 0) return volts;
  const g = Matrix.zeros(free.size, free.size);
  const b = Matrix.zeros(free.size, 1);
  for (const e of offElements) stampLeakage(g, b, free, volts, c.chA[e], c.chB[e], conductance(e));
  // Undriven nets joined by a conducting device share one voltage: stamp its on-conductance.
  for (let e = 0; e < c.chCount; e++) {
    if (result.conduction[e] === OFF || !free.has(c.chA[e]) || !free.has(c.chB[e])) continue;
    stampLeakage(g, b, free, volts, c.chA[e], c.chB[e], 1 / c.chOhms[e]);
  }
  // A free net tied to nothing fixed would make G singular; a tiny conductance to 0 V keeps the
  // solve defined and leaves such an island without current.
  for (let i = 0; i < free.size; i++) g.set(i, i, g.get(i, i) + 1e-30);
  const x = new LuDecomposition(g).solve(b);
  for (const [net, p] of free) volts[net] = x.get(p, 0);
  return volts;
}

function stampLeakage(
  g: Matrix,
  b: Matrix,
  free: ReadonlyMap<number, number>,
  volts: Float64Array,
  a: number,
  bb: number,
  conductance: number,
): void {
  const pa = free.get(a);
  const pb = free.get(bb);
  if (pa !== undefined) g.set(pa, pa, g.get(pa, pa) + conductance);
  if (pb !== undefined) g.set(pb, pb, g.get(pb, pb) + conductance);
  if (pa !== undefined && pb !== undefined) {
    g.set(pa, pb, g.get(pa, pb) - conductance);
    g.set(pb, pa, g.get(pb, pa) - conductance);
  } else if (pa !== undefined) {
    b.set(pa, 0, b.get(pa, 0) + conductance * volts[bb]);
  } else if (pb !== undefined) {
    b.set(pb, 0, b.get(pb, 0) + conductance * volts[a]);
  }
}
