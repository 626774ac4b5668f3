// Hot loop: indexes here are in range by construction, so `!` marks them (no run-time cost).
import { NMOS, type CompiledNetlist } from '../compile/compile.ts';
import type { Technology } from '../model/technology.ts';
import { MAYBE, OFF, ON } from './levels.ts';

/**
 * Self-gated (diode-connected) transistors (docs/semantics.md §2): a transistor whose gate is tied to
 * one of its own channel nets, the gate end, while that net is not a source. Its conduction cannot be
 * read from its gate before the net is solved, so the solver treats it as a clamp instead:
 *
 * - an NMOS conducts only from its gate end to its other end: it passes a low level into the gate end
 *   raised by Vtn, and a high level out of the gate end lowered by Vtn (a tie-high cell's NMOS to
 *   ground holds its gate net at Vtn);
 * - a PMOS conducts only from its other end to its gate end: it passes a high level into the gate end
 *   lowered by |Vtp|, and a low level out of the gate end raised by |Vtp|.
 *
 * Levels in the other direction are blocked. A self-gated device takes part in a trial as on and is
 * switched off when the solved trial leaves it without forward voltage (see `conductsForward`).
 */
export const GATE_NOT_TIED = 0;
export const GATE_TIED_A = 1;
export const GATE_TIED_B = 2;

/** Per channel element: which channel end its gate is tied to, when that end is not a source. */
export function selfGateEnds(c: CompiledNetlist, isSource: Uint8Array): Uint8Array {
  const ends = new Uint8Array(c.chCount);
  for (let e = 0; e < c.chCount; e++) {
    const g = c.chGate[e]!;
    if (g < 0 || c.chA[e] === c.chB[e] || isSource[g]) continue;
    if (g === c.chA[e]) ends[e] = GATE_TIED_A;
    else if (g === c.chB[e]) ends[e] = GATE_TIED_B;
  }
  return ends;
}

/**
 * The level `v` becomes after passing a self-gated element of `kind`, into its gate end or out of it.
 * `high` is the direction of the threshold-drop search; a blocked direction returns the worst value
 * of that search (−∞ for highs, +∞ for lows), which never wins.
 */
export function clampPass(
  kind: number,
  v: number,
  high: boolean,
  intoGateEnd: boolean,
  tech: Technology,
): number {
  const blocked = high ? -Infinity : Infinity;
  if (kind === NMOS) {
    if (intoGateEnd) return high ? blocked : v + tech.vtn;
    return high ? v - tech.vtn : blocked;
  }
  if (intoGateEnd) return high ? v - tech.vtp : blocked;
  return high ? blocked : v + tech.vtp;
}

/** Smallest forward voltage that counts as forward: below it the clamp is off. */
const FORWARD_VOLTS = 1e-9;

/**
 * Whether a self-gated device is forward-biased: its gate end above its other end for an NMOS, below
 * it for a PMOS. Unknown voltages (NaN) are not forward.
 */
export function conductsForward(kind: number, gateEndVolts: number, otherVolts: number): boolean {
  const forward = kind === NMOS ? gateEndVolts - otherVolts : otherVolts - gateEndVolts;
  return forward > FORWARD_VOLTS;
}

/** Conduction code of a self-gated element for reports: on when forward, maybe when unknown, else off. */
export function clampConduction(kind: number, gateEndVolts: number, otherVolts: number): number {
  if (Number.isNaN(gateEndVolts) || Number.isNaN(otherVolts)) return MAYBE;
  return conductsForward(kind, gateEndVolts, otherVolts) ? ON : OFF;
}
