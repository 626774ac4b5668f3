import { Matrix } from 'ml-matrix';
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
  /** ∂F_i/∂x_j, row by row. */
  readonly rows: Float64Array[];
  readonly residual: Float64Array;
  /** Per element, after `assemble`: current from drain (A) to source (B), amperes. */
  readonly current: Float64Array;
  /** Per element, after `assemble`: 1 when the channel conducts (not in cut-off). */
  readonly conducting: Uint8Array;
  private readonly mos = mosOutput();

  constructor(
    readonly network: DcNetwork,
    readonly elements: Int32Array,
    readonly pos: Int32Array,
    readonly volts: Float64Array,
    n: number,
  ) {
    this.n = n;
    this.rows = Array.from({ length: n }, () => new Float64Array(n));
    this.residual = new Float64Array(n);
    this.current = new Float64Array(network.compiled.chCount);
    this.conducting = new Uint8Array(network.compiled.chCount);
  }

  /** The Jacobian as an ml-matrix Matrix (a copy). */
  jacobian(): Matrix {
    return new Matrix(this.rows);
  }

  private read(net: number, x: Float64Array, scale: number): number {
    const p = this.pos[net];
    return p >= 0 ? x[p] : scale * this.volts[net];
  }

  /** Fills the Jacobian and the residual at `x` (and the slope's right-hand side when asked). */
  assemble(x: Float64Array, loading: Loading = BARE, slope?: SlopeRequest): void {
    const { residual: res, network: net, mos: m } = this;
    const { scale } = loading;
    const c = net.compiled;
    for (const row of this.rows) row.fill(0);
    res.fill(0);
    slope?.rhs.fill(0);
    this.slope = slope?.boundary ?? null;
    this.rhs = slope?.rhs ?? null;
    for (const e of this.elements) {
      const a = c.chA[e];
      const b = c.chB[e];
      const va = this.read(a, x, scale);
      const vb = this.read(b, x, scale);
      const device = net.devices[e];
      if (device === null) {
        const g = net.conductance[e];
        this.current[e] = g * (va - vb);
        this.conducting[e] = 1;
        this.stampBoth(a, b, this.current[e], a, g);
        this.stampBoth(a, b, 0, b, -g);
        continue;
      }
      const gate = c.chGate[e];
      const bulkNet = net.bulk[e];
      const vbulk = bulkNet >= 0 ? this.read(bulkNet, x, scale) : scale * net.bulkDefault[e];
      evaluateMos(device, va, this.read(gate, x, scale), vb, vbulk, m);
      this.current[e] = m[ID];
      this.conducting[e] = m[G_DRAIN] !== 0 || m[G_GATE] !== 0 ? 1 : 0;
      this.stampBoth(a, b, m[ID], a, m[G_DRAIN]);
      this.stampBoth(a, b, 0, gate, m[G_GATE]);
      this.stampBoth(a, b, 0, b, m[G_SOURCE]);
      if (bulkNet >= 0) this.stampBoth(a, b, 0, bulkNet, m[G_BULK]);
    }
    const g0 = GMIN + loading.shunt;
    const { rows } = this;
    const tie = loading.tie;
    for (let i = 0; i < this.n; i++) {
      res[i] += g0 * x[i];
      rows[i][i] += g0;
      if (tie === undefined) continue;
      res[i] += tie.g[i] * (x[i] - tie.toward[i]);
      rows[i][i] += tie.g[i];
    }
  }

  private slope: Float64Array | null = null;
  private rhs: Float64Array | null = null;

  /**
   * A current i leaving net a and entering net b, and its derivative g with respect to net `col`:
   * +g in a's row, −g in b's row (for unknown rows); a fixed `col` goes to the slope's right-hand side.
   */
  private stampBoth(a: number, b: number, i: number, col: number, g: number): void {
    const ra = this.pos[a];
    const rb = this.pos[b];
    if (ra >= 0) this.residual[ra] += i;
    if (rb >= 0) this.residual[rb] -= i;
    if (g === 0) return;
    const p = this.pos[col];
    const rows = this.rows;
    if (p >= 0) {
      if (ra >= 0) rows[ra][p] += g;
      if (rb >= 0) rows[rb][p] -= g;
    } else if (this.rhs !== null && this.slope !== null) {
      const d = g * this.slope[col];
      if (ra >= 0) this.rhs[ra] -= d;
      if (rb >= 0) this.rhs[rb] += d;
    }
  }
}
