// Indexes here are in range by construction (compiled-netlist and per-net arrays), so `!` marks them (no run-time cost).
import { NMOS, RESISTOR, type CompiledNetlist } from '../compile/compile.ts';
import type { MosDevice } from '../model/netlist.ts';
import { modelCard, technologyValue, type ModelField, type Technology } from '../model/technology.ts';
import { buildTopology, type Topology } from '../solver/topology.ts';
import { NodalSystem } from './assemble.ts';
import type { Level1Device } from './level1.ts';

/**
 * The DC view of a compiled netlist for one choice of source nets (rails and driven inputs): channel
 * elements with their level-1 parameters, and the nets to solve split into groups that can be solved
 * one after another (docs/semantics.md §2, DC levels).
 *
 * Gates draw no DC current, so the channel-connected components of the switch-level topology are
 * independent systems once their gate voltages are known; feedback (a latch) puts several components
 * in one strongly connected group, solved together. A bulk tied to a net solved in a later group
 * breaks that order: the whole circuit is then one group.
 */
export interface DcGroup {
  /** Global nets solved together. */
  readonly nets: Int32Array;
  /** Channel elements with at least one end in the group. */
  readonly elements: Int32Array;
  /** Some element's gate or bulk is a net of the group (a loop, possibly bistable). */
  readonly feedback: boolean;
}

export class DcNetwork {
  readonly topology: Topology;
  readonly groups: readonly DcGroup[];
  /** Group of each net, -1 for sources. */
  readonly groupOf: Int32Array;
  /** Bulk net per channel element, -1 where the device names none (or for resistors). */
  readonly bulk: Int32Array;
  /** Bulk volts where the device names no bulk: ground for NMOS, VDD for PMOS. */
  readonly bulkDefault: Float64Array;
  /** Level-1 parameters per channel element, null for resistors. */
  readonly devices: readonly (Level1Device | null)[];
  /** Siemens per channel element (resistors only). */
  readonly conductance: Float64Array;
  /** Supply rail nets, whose outgoing current is the supply current. */
  readonly supplyNets: readonly number[];
  /** Scratch: each unknown's position while its group is solved, -1 everywhere between solves. */
  readonly pos: Int32Array;
  private readonly systems: (NodalSystem | undefined)[] = [];

  constructor(
    readonly compiled: CompiledNetlist,
    undriven: ReadonlySet<number> = new Set(),
  ) {
    const c = compiled;
    this.topology = buildTopology(c, undriven);
    this.bulk = new Int32Array(c.chCount).fill(-1);
    this.bulkDefault = new Float64Array(c.chCount);
    this.conductance = new Float64Array(c.chCount);
    const devices: (Level1Device | null)[] = [];
    for (let e = 0; e < c.chCount; e++) {
      const d = c.netlist.devices[c.chDevice[e]!]!;
      if (c.chKind[e] === RESISTOR || (d.kind !== 'nmos' && d.kind !== 'pmos')) {
        this.conductance[e] = 1 / c.chOhms[e]!;
        devices.push(null);
        continue;
      }
      devices.push(level1Device(d, c.tech));
      if (d.bulk !== undefined) this.bulk[e] = c.netIndex.get(d.bulk) as number;
      this.bulkDefault[e] = c.chKind[e] === NMOS ? 0 : c.tech.vdd;
    }
    this.devices = devices;
    this.supplyNets = c.netlist.rails
      .filter((r) => r.role === 'supply')
      .map((r) => c.netIndex.get(r.net) as number);
    const grouped = orderedGroups(c, this.topology, this.bulk);
    this.groups = grouped.groups;
    this.groupOf = grouped.groupOf;
    this.pos = new Int32Array(c.netCount).fill(-1);
  }

  /**
   * The nodal system of group k with `unknowns` unknown nets, reading fixed nets from `volts`; kept
   * from solve to solve when every net of the group is unknown (the usual case), so a sweep point
   * allocates almost nothing.
   */
  system(k: number, unknowns: number, volts: Float64Array): NodalSystem {
    const group = this.groups[k] as DcGroup;
    if (unknowns !== group.nets.length)
      return new NodalSystem(this, group.elements, this.pos, volts, unknowns);
    let sys = this.systems[k];
    if (sys === undefined) {
      sys = new NodalSystem(this, group.elements, this.pos, volts, unknowns);
      this.systems[k] = sys;
    }
    sys.volts = volts;
    return sys;
  }
}

/**
 * Level-1 parameters of one transistor: its model card's values (`Technology.models`, from a SPICE
 * `.model` card), and the technology's own for what the card leaves out or when it names none. The
 * one place the DC model reads parameters (docs/semantics.md §1, "Model cards").
 */
export function level1Device(d: MosDevice, tech: Technology): Level1Device {
  const named = modelCard(tech, d.model);
  // The design-file reader refuses a card of the other type; a hand-built netlist gets the defaults.
  const card = named?.type === d.kind ? named : undefined;
  const value = (field: ModelField): number => card?.[field] ?? technologyValue(tech, d.kind, field);
  return {
    polarity: d.kind === 'nmos' ? 1 : -1,
    beta: value('kp') * (d.w / d.l),
    vt0: value('vt0'),
    gamma: value('gamma'),
    phi: value('phi'),
    lambda: value('lambda'),
  };
}

function orderedGroups(
  c: CompiledNetlist,
  topo: Topology,
  bulk: Int32Array,
): { groups: DcGroup[]; groupOf: Int32Array } {
  const { sccOrder, cccNets, cccElements } = topo;
  const groupOf = new Int32Array(c.netCount).fill(-1);
  const lists: { nets: number[]; elements: number[] }[] = [];
  for (let s = 0; s < sccOrder.start.length - 1; s++) {
    const nets: number[] = [];
    const elements: number[] = [];
    for (let i = sccOrder.start[s]!; i < sccOrder.start[s + 1]!; i++) {
      const k = sccOrder.items[i]!;
      for (let j = cccNets.start[k]!; j < cccNets.start[k + 1]!; j++) nets.push(cccNets.items[j]!);
      for (let j = cccElements.start[k]!; j < cccElements.start[k + 1]!; j++)
        elements.push(cccElements.items[j]!);
    }
    for (const n of nets) groupOf[n] = lists.length;
    lists.push({ nets, elements });
  }
  const bulkOutOfOrder = lists.some((g, index) =>
    g.elements.some((e) => bulk[e]! >= 0 && groupOf[bulk[e]!]! > index),
  );
  const merged = bulkOutOfOrder
    ? [{ nets: lists.flatMap((g) => g.nets), elements: lists.flatMap((g) => g.elements) }]
    : lists;
  if (bulkOutOfOrder) for (const n of merged[0]?.nets ?? []) groupOf[n] = 0;
  const groups = merged.map((g, index) => ({
    nets: Int32Array.from(g.nets),
    elements: Int32Array.from(g.elements),
    feedback: g.elements.some(
      (e) => controlledFrom(c.chGate[e]!, groupOf, index) || controlledFrom(bulk[e]!, groupOf, index),
    ),
  }));
  return { groups, groupOf };
}

function controlledFrom(net: number, groupOf: Int32Array, group: number): boolean {
  return net >= 0 && groupOf[net] === group;
}
