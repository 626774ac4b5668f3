// Indexes read here are in range by construction (compiled and topology arrays), so `!` marks them.
import type { CompiledNetlist } from '../compile/compile.ts';
import type { Topology } from '../solver/topology.ts';
import type { GroupShape } from './shape.ts';

/**
 * A group's structure with its nets and controls renamed to their positions (docs/semantics.md §10,
 * "identical groups"): two groups with the same signature are the same circuit up to renaming of
 * nets, so one table serves both, entry for entry. The signature is a list of numbers holding
 * everything the group's evaluation reads: each element's kind, on-resistance and gate tie, where its gate and channel ends
 * are (a group net, a control, or a rail at its voltage), and per net its capacitance, whether it is
 * observed and its elements in the order the solver walks them. A net outside those (a rail, or a
 * gate inside a feedback loop) is kept by its global number. Feedback groups get
 * no signature: their steady-state search names devices, so each builds its own table.
 */
export class GroupSignatures {
  private readonly netPos: Int32Array;
  private readonly controlPos: Int32Array;
  private readonly elementPos: Int32Array;
  /** The signature being written, reused from group to group. */
  private scratch = new Float64Array(256);
  private length = 0;

  constructor(
    private readonly c: CompiledNetlist,
    private readonly topology: Topology,
  ) {
    this.netPos = new Int32Array(c.netCount).fill(-1);
    this.controlPos = new Int32Array(c.netCount).fill(-1);
    this.elementPos = new Int32Array(c.chCount).fill(-1);
  }

  /** The group's signature, or null for a feedback group; valid until the next call (copy to keep). */
  of(shape: GroupShape): Float64Array | null {
    if (shape.feedback) return null;
    const { nets, controls, elements } = shape;
    for (let i = 0; i < nets.length; i++) this.netPos[nets[i]!] = i;
    for (let i = 0; i < controls.length; i++) this.controlPos[controls[i]!] = i;
    for (let i = 0; i < elements.length; i++) this.elementPos[elements[i]!] = i;
    this.length = 0;
    this.push(nets.length, controls.length, elements.length);
    for (let i = 0; i < elements.length; i++) this.element(elements[i]!);
    for (let i = 0; i < nets.length; i++) this.net(nets[i]!, shape.observed[i]!);
    for (let i = 0; i < nets.length; i++) this.netPos[nets[i]!] = -1;
    for (let i = 0; i < controls.length; i++) this.controlPos[controls[i]!] = -1;
    for (let i = 0; i < elements.length; i++) this.elementPos[elements[i]!] = -1;
    return this.scratch.subarray(0, this.length);
  }

  private push(a: number, b: number, c: number): void {
    if (this.length + 3 > this.scratch.length) {
      const grown = new Float64Array(2 * this.scratch.length);
      grown.set(this.scratch);
      this.scratch = grown;
    }
    this.scratch[this.length++] = a;
    this.scratch[this.length++] = b;
    this.scratch[this.length++] = c;
  }

  private element(e: number): void {
    const { c } = this;
    const gate = c.chGate[e]!;
    this.push(c.chKind[e]!, c.chOhms[e]!, this.topology.selfGate[e]!);
    this.push(gate < 0 ? -1 : this.end(gate), this.end(c.chA[e]!), this.end(c.chB[e]!));
  }

  private net(n: number, observed: number): void {
    const { netChannels, netCap } = this.c;
    const from = netChannels.start[n]!;
    const to = netChannels.start[n + 1]!;
    this.push(netCap[n]!, observed, to - from);
    for (let p = from; p < to; p++) this.push(this.elementPos[netChannels.items[p]!]!, -1, -1);
  }

  /**
   * A net as seen from the group: its position (4i), a control's position (4i + 1), or, outside the
   * group, a rail (4n + 2) or another net (4n + 3) by its number, the same in every group.
   */
  private end(n: number): number {
    const inGroup = this.netPos[n]!;
    if (inGroup >= 0) return 4 * inGroup;
    const control = this.controlPos[n]!;
    if (control >= 0) return 4 * control + 1;
    return 4 * n + (Number.isNaN(this.c.railVolts[n]!) ? 3 : 2);
  }
}

/** Values by signature: equal signatures find the same value (hashed, then compared in full). */
export class SignatureMap<T> {
  private readonly buckets = new Map<number, { readonly signature: Float64Array; readonly value: T }[]>();

  get(signature: Float64Array): T | undefined {
    return this.buckets.get(hashOf(signature))?.find((x) => sameValues(x.signature, signature))?.value;
  }

  /** Keeps a copy of the signature with its value. */
  set(signature: Float64Array, value: T): void {
    const h = hashOf(signature);
    const entry = { signature: signature.slice(), value };
    const bucket = this.buckets.get(h);
    if (bucket === undefined) this.buckets.set(h, [entry]);
    else bucket.push(entry);
  }
}

/** Index of a value's high 32 bits within its two Int32 halves, for this machine's byte order. */
const HIGH_HALF = new Int32Array(Float64Array.of(1).buffer)[1] !== 0 ? 1 : 0;

/**
 * FNV-1a over the high half of each value's bits (sign, exponent and the top of the mantissa: the
 * whole of the small integers that most values are). Equal signatures hash equal; the full
 * comparison in `get` decides.
 */
function hashOf(signature: Float64Array): number {
  const bits = new Int32Array(signature.buffer, signature.byteOffset, signature.length * 2);
  let h = 0x811c9dc5;
  for (let i = HIGH_HALF; i < bits.length; i += 2) h = Math.imul(h ^ bits[i]!, 0x01000193);
  return h;
}

/**
 * Equal value for value, as `Object.is` compares: NaN matches NaN (a key may mark "unknown" with it)
 * and −0 does not match 0, so equal signatures are equal to the bit.
 */
export function sameValues(a: Float64Array, b: Float64Array): boolean {
  if (a.length !== b.length) return false;
  for (let i = 0; i < a.length; i++) if (!Object.is(a[i], b[i])) return false;
  return true;
}
