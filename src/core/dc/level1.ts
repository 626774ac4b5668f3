// Indexes here are in range by construction (compiled-netlist and per-net arrays), so `!` marks them (no run-time cost).
/**
 * The Shichman–Hodges (level 1) MOSFET drain current and its partial derivatives, for the Newton
 * solver of `operatingPoint.ts` (docs/semantics.md §2, DC levels).
 *
 * Source: H. Shichman, D. A. Hodges, "Modeling and simulation of insulated-gate field-effect transistor
 * switching circuits", IEEE J. Solid-State Circuits 3(3), 1968. With β = k'·W/L, VOV = VGS − VT:
 *   cut-off     VOV ≤ 0:        ID = 0
 *   linear      VDS < VOV:      ID = β (VOV·VDS − VDS²/2) (1 + λ·VDS)
 *   saturation  VDS ≥ VOV:      ID = (β/2) VOV² (1 + λ·VDS)
 *   threshold   VT = VT0 + γ (√(2φF + VSB) − √(2φF))
 * (1 + λ·VDS) multiplies both regions so the current is continuous where they meet.
 *
 * The device is symmetric: the terminal at the lower potential (higher, for PMOS) acts as the source,
 * so drain and source swap when the current reverses. A PMOS is the NMOS equations on negated voltages
 * with the current negated. With the bulk forward-biased (VSB < 0) the square root is continued along
 * its tangent at VSB = 0 and held at 0 below −4φF; the structural rules flag such bulks anyway.
 */

export interface Level1Device {
  /** +1 for NMOS, −1 for PMOS. */
  readonly polarity: 1 | -1;
  /** β = k'·W/L, A/V². */
  readonly beta: number;
  /** Zero-bias threshold magnitude VT0, volts. */
  readonly vt0: number;
  /** Body-effect coefficient γ, V^½. */
  readonly gamma: number;
  /** Surface potential 2φF, volts. */
  readonly phi: number;
  /** Channel-length modulation λ, 1/V. */
  readonly lambda: number;
}

/** Indices into the evaluation output: current from drain to source, then ∂I/∂V of each terminal. */
export const ID = 0;
export const G_DRAIN = 1;
export const G_GATE = 2;
export const G_SOURCE = 3;
export const G_BULK = 4;

/** Output array for `evaluateMos`: [ID, ∂I/∂Vd, ∂I/∂Vg, ∂I/∂Vs, ∂I/∂Vb]. */
export function mosOutput(): Float64Array {
  return new Float64Array(5);
}

/** Scratch for the forward evaluation: [ID, ∂I/∂VGS, ∂I/∂VDS, ∂I/∂VSB]. */
const forward = new Float64Array(4);

/** Threshold voltage VT(VSB) for an NMOS-oriented device, and dVT/dVSB in `slope[0]`. */
export function threshold(d: Level1Device, vsb: number, slope?: Float64Array): number {
  const root = Math.sqrt(d.phi);
  let sq: number;
  let dsq: number;
  if (vsb >= 0) {
    sq = Math.sqrt(d.phi + vsb);
    dsq = 0.5 / sq;
  } else {
    dsq = 0.5 / root;
    sq = root + vsb * dsq;
    if (sq < 0) sq = dsq = 0;
  }
  if (slope) slope[0] = d.gamma * dsq;
  return d.vt0 + d.gamma * (sq - root);
}

const vtSlope = new Float64Array(1);

/** NMOS-oriented current for VDS ≥ 0, with its derivatives with respect to VGS, VDS and VSB. */
function forwardCurrent(d: Level1Device, vgs: number, vds: number, vsb: number, out: Float64Array): void {
  const vov = vgs - threshold(d, vsb, vtSlope);
  if (vov <= 0) {
    out.fill(0);
    return;
  }
  const { beta, lambda } = d;
  const clm = 1 + lambda * vds;
  let core: number;
  let gm: number;
  let gdsCore: number;
  if (vds < vov) {
    core = beta * (vov * vds - 0.5 * vds * vds);
    gm = beta * vds;
    gdsCore = beta * (vov - vds);
  } else {
    core = 0.5 * beta * vov * vov;
    gm = beta * vov;
    gdsCore = 0;
  }
  out[0] = core * clm;
  out[1] = gm * clm;
  out[2] = gdsCore * clm + core * lambda;
  out[3] = -out[1] * vtSlope[0]!;
}

/**
 * Evaluates one device at terminal voltages (volts) into `out` (see `mosOutput`). The current is
 * positive when it flows through the channel from the drain terminal to the source terminal.
 */
export function evaluateMos(
  d: Level1Device,
  vd: number,
  vg: number,
  vs: number,
  vb: number,
  out: Float64Array,
): void {
  const p = d.polarity;
  const nd = p * vd;
  const ng = p * vg;
  const ns = p * vs;
  const nb = p * vb;
  const swapped = nd < ns;
  const hi = swapped ? ns : nd;
  const lo = swapped ? nd : ns;
  forwardCurrent(d, ng - lo, hi - lo, lo - nb, forward);
  const [i, gGs, gDs, gSb] = forward as unknown as readonly [number, number, number, number];
  // Partials in the normalised circuit for (hi, gate, lo, bulk).
  const gHi = gDs;
  const gGate = gGs;
  const gLo = -gGs - gDs + gSb;
  const gBulk = -gSb;
  // Unswap (the current from drain to source reverses), then undo the polarity: I = p·I(p·v) so
  // the partials keep their sign.
  const sign = swapped ? -1 : 1;
  out[ID] = p * sign * i;
  out[G_DRAIN] = sign * (swapped ? gLo : gHi);
  out[G_GATE] = sign * gGate;
  out[G_SOURCE] = sign * (swapped ? gHi : gLo);
  out[G_BULK] = sign * gBulk;
}
