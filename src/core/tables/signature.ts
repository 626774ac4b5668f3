// Indexes read here are in range by construction (compiled and topology arrays), so `!` marks them.
import type { CompiledNetlist } from '../compile/compile.ts';
import type { Topology } from '../solver/topology.ts';
import type { GroupShape } from './shape.ts';

/**
 * A group's structure with its nets and controls renamed to their positions (docs/semantics.md §10,
 * "identical groups"): two groups with the same signature are the same circuit up to renaming of
 * nets, so one table serves both, entry for entry. The signature holds everything the group's
 * evaluation reads: each element's kind, on-resistance and gate tie, where its gate and channel ends
 * are (a group net, a control, or a rail at its voltage), and per net its capacitance, whether it is
 * observed and its elements in the order the solver walks them. A name outside those (a gate inside
 * a feedback loop) is kept by its global number, so the group matches no other. Feedback groups get
 * no signature: their steady-state search names devices, so each builds its own table.
 */
export class GroupSignatures {
  private readonly netPos: Int32Array;
  private readonly controlPos: Int32Array;
  private readonly elementPos: Int32Array;

  constructor(
    private readonly c: CompiledNetlist,
    private readonly topology: Topology,
  ) {
    this.netPos = new Int32Array(c.netCount).fill(-1);
    this.controlPos = new Int32Array(c.netCount).fill(-1);
    this.elementPos = new Int32Array(c.chCount).fill(-1);
  }

  /** The group's signature, or null for a feedback group. */
  of(shape: GroupShape): string | null {
    if (shape.feedback) return null;
    const { nets, controls, elements } = shape;
    nets.forEach((n, i) => (this.netPos[n] = i));
    controls.forEach((n, i) => (this.controlPos[n] = i));
    elements.forEach((e, i) => (this.elementPos[e] = i));
    const parts: string[] = [`${nets.length}/${controls.length}/${elements.length}`];
    for (const e of elements) parts.push(this.element(e));
    nets.forEach((n, i) => parts.push(this.net(n, shape.observed[i]!)));
    for (const n of nets) this.netPos[n] = -1;
    for (const n of controls) this.controlPos[n] = -1;
    for (const e of elements) this.elementPos[e] = -1;
    return parts.join(';');
  }

  private element(e: number): string {
    const { c } = this;
    const gate = c.chGate[e]!;
    return `${c.chKind[e]},${c.chOhms[e]},${this.topology.selfGate[e]},${gate < 0 ? '-' : this.end(gate)},${this.end(c.chA[e]!)},${this.end(c.chB[e]!)}`;
  }

  private net(n: number, observed: number): string {
    const { netChannels, netCap } = this.c;
    const walk: number[] = [];
    for (let p = netChannels.start[n]!; p < netChannels.start[n + 1]!; p++)
      walk.push(this.elementPos[netChannels.items[p]!]!);
    return `${netCap[n]},${observed},${walk.join(' ')}`;
  }

  /** A net as seen from the group: its position, a control's position, a rail's voltage, or its number. */
  private end(n: number): string {
    const inGroup = this.netPos[n]!;
    if (inGroup >= 0) return `n${inGroup}`;
    const control = this.controlPos[n]!;
    if (control >= 0) return `c${control}`;
    const rail = this.c.railVolts[n]!;
    return Number.isNaN(rail) ? `g${n}` : `r${rail}`;
  }
}
