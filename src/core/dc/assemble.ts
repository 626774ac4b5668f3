// Indexes here are in range by construction (compiled-netlist and per-net arrays), so `!` marks them (no run-time cost).
import { LuDecomposition, Matrix } from 'ml-matrix';
import { evaluateMos, G_BULK, G_DRAIN, G_GATE, G_SOURCE, ID, mosOutput } from './level1.ts';
import type { DcNetwork } from './network.ts';

/**
 * Conductance to ground on every unknown net, siemens: keeps the nodal matrix regular where a net is
 * held by nothing (cut-off devices all round). 1 pS is the usual circuit-simulator default (common
 * practice, no source); it moves a driven net by picovolts. Nets held only by it are reported as
 * floating, never given its 0 V.
 */
export const GMIN = 1e-12;

/**
 * What is added to the bare circuit while searching for its operating point: fixed voltages scaled
 * by `scale` (source stepping), a conductance `shunt` from every unknown to ground (gmin stepping),
 * and per-unknown conductances `tie.g` towards `tie.toward` (pseudo-transient stepping: C/Δt to the
 * previous voltages).
 */
export interface Loading {
  readonly scale: number;
  readonly shunt: number;
  readonly tie?: { readonly g: Float64Array; readonly toward: Float64Array };
}

/** The bare circuit. */
export const BARE: Loading = { scale: 1, shunt: 0 };

/** The right-hand side of J·dx = rhs for the unknowns' slope, given d volts / d parameter of fixed nets. */
export interface SlopeRequest {
  readonly boundary: Float64Array;
  readonly rhs: Float64Array;
}

/**
 * The nodal equations of one group: unknown nets are those with `pos[net] >= 0` (their index in `x`);
 * every other net reads `volts[net]` (times `loading.scale`).
 * F_i = Σ currents leaving net i through channel elements + GMIN·x_i (+ the loading's terms) = 0.
 */
export class NodalSystem {
  readonly n: number;
  /** ∂F_i/∂x_j. */
  readonly jacobian: Matrix;
  readonly residual: Float64Array;
  /** Scratch for Newton: the right-hand side, the step, and how far each unknown last moved. */
  readonly rhs: Float64Array;
  readonly step: Float64Array;
  readonly lastStep: Float64Array;
  /** Per element, after `assemble`: current from drain (A) to source (B), amperes. */
  readonly current: Float64Array;
  /** Per element, after `assemble`: 1 when the channel conducts (not in cut-off). */
  readonly conducting: Uint8Array;
  private readonly mos = mosOutput();

  /**
   * `volts` holds every fixed net's voltage; point it at the solve's array before assembling (a
   * system is reused from solve to solve).
   */
  constructor(
    readonly network: DcNetwork,
    readonly elements: Int32Array,
    readonly pos: Int32Array,
    public volts: Float64Array,
    n: number,
  ) {
    this.n = n;
    this.jacobian = new Matrix(n, n);
    this.residual = new Float64Array(n);
    this.rhs = new Float64Array(n);
    this.step = new Float64Array(n);
    this.lastStep = new Float64Array(n);
    this.current = new Float64Array(network.compiled.chCount);
    this.conducting = new Uint8Array(network.compiled.chCount);
  }

  /**
   * Solves J·out = rhs: one unknown directly, more through ml-matrix's LU. False when J is singular
   * or the answer is not finite.
   */
  solveLinear(rhs: Float64Array, out: Float64Array): boolean {
    if (this.n === 1) {
      out[0] = rhs[0]! / this.jacobian.get(0, 0);
      return Number.isFinite(out[0]);
    }
    const lu = new LuDecomposition(this.jacobian);
    if (lu.isSingular()) return false;
    const column = lu.solve(Matrix.columnVector(rhs));
    for (let i = 0; i < this.n; i++) out[i] = column.get(i, 0);
    return out.every(Number.isFinite);
  }

  private read(net: number, x: Float64Array, scale: number): number {
    const p = this.pos[net]!;
    return p >= 0 ? x[p]! : scale * this.volts[net]!;
  }

  /** Fills the Jacobian and the residual at `x` (and the slope's right-hand side when asked). */
  assemble(x: Float64Array, loading: Loading = BARE, slope?: SlopeRequest): void {
    const { residual: res, network: net, mos: m } = this;
    const { scale } = loading;
    const c = net.compiled;
    this.jacobian.fill(0);
    res.fill(0);
    slope?.rhs.fill(0);
    this.slopeBoundary = slope?.boundary ?? null;
    this.slopeRhs = slope?.rhs ?? null;
    for (const e of this.elements) {
      const a = c.chA[e]!;
      const b = c.chB[e]!;
      const va = this.read(a, x, scale);
      const vb = this.read(b, x, scale);
      const device = net.devices[e]!;
      if (device === null) {
        const g = net.conductance[e]!;
        this.current[e] = g * (va - vb);
        this.conducting[e] = 1;
        this.stampBoth(a, b, this.current[e], a, g);
        this.stampBoth(a, b, 0, b, -g);
        continue;
      }
      const gate = c.chGate[e]!;
      const bulkNet = net.bulk[e]!;
      const vbulk = bulkNet >= 0 ? this.read(bulkNet, x, scale) : scale * net.bulkDefault[e]!;
      evaluateMos(device, va, this.read(gate, x, scale), vb, vbulk, m);
      this.current[e] = m[ID]!;
      this.conducting[e] = m[G_DRAIN] !== 0 || m[G_GATE] !== 0 ? 1 : 0;
      this.stampBoth(a, b, m[ID]!, a, m[G_DRAIN]!);
      this.stampBoth(a, b, 0, gate, m[G_GATE]!);
      this.stampBoth(a, b, 0, b, m[G_SOURCE]!);
      if (bulkNet >= 0) this.stampBoth(a, b, 0, bulkNet, m[G_BULK]!);
    }
    const g0 = GMIN + loading.shunt;
    const jac = this.jacobian;
    const tie = loading.tie;
    for (let i = 0; i < this.n; i++) {
      const g = g0 + (tie === undefined ? 0 : tie.g[i]!);
      res[i]! += g0 * x[i]! + (tie === undefined ? 0 : tie.g[i]! * (x[i]! - tie.toward[i]!));
      jac.set(i, i, jac.get(i, i) + g);
    }
  }

  private slopeBoundary: Float64Array | null = null;
  private slopeRhs: Float64Array | null = null;

  /**
   * A current i leaving net a and entering net b, and its derivative g with respect to net `col`:
   * +g in a's row, −g in b's row (for unknown rows); a fixed `col` goes to the slope's right-hand side.
   */
  private stampBoth(a: number, b: number, i: number, col: number, g: number): void {
    const ra = this.pos[a]!;
    const rb = this.pos[b]!;
    if (ra >= 0) this.residual[ra]! += i;
    if (rb >= 0) this.residual[rb]! -= i;
    if (g === 0) return;
    const p = this.pos[col]!;
    const jac = this.jacobian;
    if (p >= 0) {
      if (ra >= 0) jac.set(ra, p, jac.get(ra, p) + g);
      if (rb >= 0) jac.set(rb, p, jac.get(rb, p) - g);
    } else if (this.slopeRhs !== null && this.slopeBoundary !== null) {
      const d = g * this.slopeBoundary[col]!;
      if (ra >= 0) this.slopeRhs[ra]! -= d;
      if (rb >= 0) this.slopeRhs[rb]! += d;
    }
  }
}
