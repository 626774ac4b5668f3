import type { CompiledNetlist } from '../compile/compile.ts';
import { GATE_NOT_TIED } from '../solver/selfGated.ts';
import type { Topology } from '../solver/topology.ts';

/**
 * One unit of evaluation of the engine: a strongly connected group of channel-connected components
 * (a row of `topology.sccOrder`; usually one component that does not gate itself), with the nets it
 * writes and the nets whose levels decide it.
 */
export interface GroupShape {
  /** Row of `topology.sccOrder`: groups are numbered in evaluation order. */
  readonly index: number;
  readonly components: Int32Array;
  /** The group's nets (global indices), component by component. */
  readonly nets: Int32Array;
  /** Channel elements with at least one end in the group. */
  readonly elements: Int32Array;
  /**
   * The nets that decide the group, sorted by net index: gate nets outside the group and inputs tied
   * to its channels. Rails are not controls: they sit at their own voltage in every entry.
   */
  readonly controls: Int32Array;
  /** Per group net: 1 when it feeds a gate or is an output (the nets findings and later groups read). */
  readonly observed: Uint8Array;
  /** Some component of the group gates an element of the group (a loop: rounds and steady states). */
  readonly feedback: boolean;
}

/** Every group of a topology, in evaluation order. Linear in the netlist. */
export function groupShapes(
  c: CompiledNetlist,
  topology: Topology,
  feedback: (s: number) => boolean,
  groupOfNet = groupsOfNets(topology),
): GroupShape[] {
  const { sccOrder } = topology;
  const seen = new Int32Array(c.netCount).fill(-1);
  const output = new Uint8Array(c.netCount);
  for (const o of c.outputNets) output[o] = 1;
  const shapes: GroupShape[] = [];
  for (let s = 0; s + 1 < sccOrder.start.length; s++) {
    const components = sccOrder.items.slice(sccOrder.start[s], sccOrder.start[s + 1]);
    const nets = collect(topology.cccNets, components);
    const elements = collect(topology.cccElements, components);
    const controls: number[] = [];
    const add = (n: number): void => {
      if (n < 0 || seen[n] === s || groupOfNet[n] === s || !Number.isNaN(c.railVolts[n])) return;
      seen[n] = s;
      controls.push(n);
    };
    for (let i = 0; i < elements.length; i++) {
      const e = elements[i]!;
      if (topology.selfGate[e] === GATE_NOT_TIED) add(c.chGate[e]!);
      if (topology.isSource[c.chA[e]!]) add(c.chA[e]!);
      if (topology.isSource[c.chB[e]!]) add(c.chB[e]!);
    }
    const observed = new Uint8Array(nets.length);
    for (let i = 0; i < nets.length; i++) observed[i] = feedsGate(c, nets[i]!) || output[nets[i]!] ? 1 : 0;
    shapes.push({
      index: s,
      components,
      nets,
      elements,
      controls: Int32Array.from(controls).sort(),
      observed,
      feedback: feedback(s),
    });
  }
  return shapes;
}

/** Group of each net, -1 for sources. */
export function groupsOfNets(topology: Topology): Int32Array {
  const { sccOrder, cccOfNet } = topology;
  const groupOfCcc = new Int32Array(topology.cccCount);
  for (let s = 0; s + 1 < sccOrder.start.length; s++) {
    for (let i = sccOrder.start[s]!; i < sccOrder.start[s + 1]!; i++) groupOfCcc[sccOrder.items[i]!] = s;
  }
  const groups = new Int32Array(cccOfNet.length);
  for (let n = 0; n < groups.length; n++) groups[n] = cccOfNet[n]! < 0 ? -1 : groupOfCcc[cccOfNet[n]!]!;
  return groups;
}

function collect(rows: { start: Int32Array; items: Int32Array }, components: Int32Array): Int32Array {
  // Nearly every group is one component: its row is a copy of one slice.
  if (components.length === 1)
    return rows.items.slice(rows.start[components[0]!], rows.start[components[0]! + 1]);
  const out: number[] = [];
  for (const k of components)
    for (let i = rows.start[k]!; i < rows.start[k + 1]!; i++) out.push(rows.items[i]!);
  return Int32Array.from(out);
}

function feedsGate(c: CompiledNetlist, n: number): boolean {
  return c.netGates.start[n + 1]! > c.netGates.start[n]!;
}
