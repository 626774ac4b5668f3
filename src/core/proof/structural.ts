import { NMOS, PMOS, type CompiledNetlist } from '../compile/compile.ts';
import { classify, LEVEL_0, LEVEL_1 } from '../solver/levels.ts';
import type { Topology } from '../solver/topology.ts';
import type { GroupShape } from '../tables/shape.ts';
import { FALSE, TRUE, type Cnf } from './cnf.ts';
import type { GroupContext, GroupEncoding, LevelLits, RailLits } from './literals.ts';
import { layersNeeded, reach, type Link } from './reach.ts';

/** Past this many gates (layers × (links + nets) per level searched), a group is not encoded. */
export const MAX_STRUCTURAL_WORK = 1 << 20;

/**
 * A group without a table (docs/semantics.md §10, structural encoding): each device conducts when
 * its gate is exactly at the level that turns it on; a level reaches a net along conducting paths
 * from sources of that level (searched in layers, so loops of devices never support themselves). Where
 * only one level reaches a net the engine gives it that source's voltage, or the threshold drop when
 * every path passes a device that drops it (an NMOS for a high, a PMOS for a low); where neither
 * reaches, it floats. Where both reach, the engine solves a resistive divider whose answer depends on
 * sizes: those vectors are outside this encoding (its `unknown` literal), as are gates at other
 * voltages. Loops, self-gated devices and rails at voltages other than 0 and VDD are not encoded.
 */
export function encodeStructural(
  cnf: Cnf,
  c: CompiledNetlist,
  topology: Topology,
  shape: GroupShape,
  context: GroupContext,
): GroupEncoding {
  const blocker = cannotEncode(c, topology, shape);
  if (blocker !== null) return blocked(cnf, shape, context, blocker);
  const parts = deviceParts(cnf, c, topology, shape, context);
  const layers = layersNeeded(shape.nets.length, parts.links.on);
  if (layers * (parts.links.on.length + shape.nets.length) * 4 > MAX_STRUCTURAL_WORK)
    return blocked(cnf, shape, context, `${shape.nets.length} nets joined in loops are too many to encode`);
  const high = reach(cnf, parts.seeds.high, parts.links.on, layers);
  const low = reach(cnf, parts.seeds.low, parts.links.on, layers);
  const fullHigh = reach(cnf, parts.seeds.fullHigh, parts.links.fullHigh, layers);
  const fullLow = reach(cnf, parts.seeds.fullLow, parts.links.fullLow, layers);
  const fight = cnf.or(Array.from(shape.nets, (_, i) => cnf.and([high[i]!, low[i]!])));
  const { vdd, vtn, vtp, vil, vih } = c.tech;
  const droppedHigh = classify(vdd - vtn, vil, vih);
  const droppedLow = classify(vtp, vil, vih);
  const rails = new Map<number, RailLits>();
  const levels = new Map<number, LevelLits>();
  shape.nets.forEach((n, i) => {
    const [h, l, fh, fl] = [high[i]!, low[i]!, fullHigh[i]!, fullLow[i]!];
    if (context.needsRail(n)) rails.set(n, { high: cnf.and([fh, -l]), low: cnf.and([fl, -h]) });
    if (!context.needsLevel(n)) return;
    levels.set(n, {
      l1: cnf.and([h, -l, droppedHigh === LEVEL_1 ? TRUE : fh]),
      l0: cnf.and([l, -h, droppedLow === LEVEL_0 ? TRUE : fl]),
      lz: cnf.and([-h, -l]),
      degraded: cnf.or([cnf.and([h, -fh, -l]), cnf.and([l, -fl, -h])]),
    });
  });
  return {
    rails,
    levels,
    unknown: cnf.or([parts.offRail, fight]),
    current: fight,
    contention: fight,
    blocker: null,
    storedState: FALSE,
    storedNets: [],
  };
}

interface DeviceParts {
  readonly seeds: { high: number[]; low: number[]; fullHigh: number[]; fullLow: number[] };
  readonly links: { on: Link[]; fullHigh: Link[]; fullLow: Link[] };
  /** Some gate of the group is at neither rail. */
  readonly offRail: number;
}

/** Per device: when it conducts; sources enter as seeds, devices between two nets become links. */
function deviceParts(
  cnf: Cnf,
  c: CompiledNetlist,
  topology: Topology,
  shape: GroupShape,
  context: GroupContext,
): DeviceParts {
  const local = new Map<number, number>();
  shape.nets.forEach((n, i) => local.set(n, i));
  const seedLists = {
    high: [] as number[][],
    low: [] as number[][],
    fullHigh: [] as number[][],
    fullLow: [] as number[][],
  };
  for (const list of Object.values(seedLists)) for (let i = 0; i < shape.nets.length; i++) list.push([]);
  const pairs = new Map<
    string,
    { a: number; b: number; on: number[]; fullHigh: number[]; fullLow: number[] }
  >();
  const offRail: number[] = [];
  for (const e of shape.elements) {
    const kind = c.chKind[e];
    const gate = kind === NMOS || kind === PMOS ? context.rail(c.chGate[e]!) : { high: TRUE, low: FALSE };
    offRail.push(cnf.and([-gate.high, -gate.low]));
    const on = kind === NMOS ? gate.high : kind === PMOS ? gate.low : TRUE;
    const passesHigh = kind !== NMOS ? on : FALSE;
    const passesLow = kind !== PMOS ? on : FALSE;
    const [a, b] = [c.chA[e]!, c.chB[e]!];
    if (topology.isSource[a] || topology.isSource[b]) {
      const [src, net] = topology.isSource[a] ? [a, local.get(b)] : [b, local.get(a)];
      if (net === undefined) continue;
      const level = context.rail(src);
      seedLists.high[net]!.push(cnf.and([on, level.high]));
      seedLists.low[net]!.push(cnf.and([on, level.low]));
      seedLists.fullHigh[net]!.push(cnf.and([passesHigh, level.high]));
      seedLists.fullLow[net]!.push(cnf.and([passesLow, level.low]));
      continue;
    }
    const [i, j] = [local.get(a) as number, local.get(b) as number];
    if (i === j) continue;
    const key = i < j ? `${i},${j}` : `${j},${i}`;
    const pair = pairs.get(key) ?? { a: i, b: j, on: [], fullHigh: [], fullLow: [] };
    pair.on.push(on);
    pair.fullHigh.push(passesHigh);
    pair.fullLow.push(passesLow);
    pairs.set(key, pair);
  }
  const linksOf = (pick: 'on' | 'fullHigh' | 'fullLow'): Link[] =>
    [...pairs.values()].map((p) => ({ a: p.a, b: p.b, conducts: cnf.or(p[pick]) }));
  const seeds = (lists: number[][]): number[] => lists.map((lits) => cnf.or(lits));
  return {
    seeds: {
      high: seeds(seedLists.high),
      low: seeds(seedLists.low),
      fullHigh: seeds(seedLists.fullHigh),
      fullLow: seeds(seedLists.fullLow),
    },
    links: { on: linksOf('on'), fullHigh: linksOf('fullHigh'), fullLow: linksOf('fullLow') },
    offRail: cnf.or(offRail),
  };
}

/** Why the structural encoding does not apply to a group, or null. */
function cannotEncode(c: CompiledNetlist, topology: Topology, shape: GroupShape): string | null {
  if (shape.feedback)
    return `a loop of ${shape.components.length} components with ${shape.controls.length} controls, past the table bound`;
  for (const e of shape.elements) {
    if (topology.selfGate[e] !== 0)
      return `a self-gated (diode-connected) device in a group past the table bound`;
    for (const end of [c.chA[e]!, c.chB[e]!]) {
      const v = c.railVolts[end]!;
      if (!Number.isNaN(v) && v !== 0 && v !== c.tech.vdd)
        return `a rail at ${v} V feeds a group past the table bound`;
    }
  }
  return null;
}

/** A group nothing can be said about: free literals, and the reason. */
function blocked(cnf: Cnf, shape: GroupShape, context: GroupContext, reason: string): GroupEncoding {
  const rails = new Map<number, RailLits>();
  const levels = new Map<number, LevelLits>();
  for (const n of shape.nets) {
    if (context.needsRail(n)) rails.set(n, { high: cnf.fresh(), low: cnf.fresh() });
    if (context.needsLevel(n))
      levels.set(n, { l0: cnf.fresh(), l1: cnf.fresh(), lz: cnf.fresh(), degraded: cnf.fresh() });
  }
  const name = context.name(shape.nets[0]!);
  return {
    rails,
    levels,
    unknown: TRUE,
    current: cnf.fresh(),
    contention: cnf.fresh(),
    blocker: `${reason} (at ${name})`,
    storedState: FALSE,
    storedNets: [],
  };
}
