// Indexes read here are in range by construction, so `!` marks them (no run-time cost).
import type { Device, Netlist } from '../model/netlist.ts';
import type { Technology } from '../model/technology.ts';
import { referenceLength } from './logicalEffort.ts';
import { extractStage, type Stage } from './stage.ts';
import { nameRecord } from '../model/records.ts';

/** The inverter whose drive every output should match: widths and length in µm. */
export interface ReferenceInverter {
  readonly wn: number;
  readonly wp: number;
  /** Length the reference is drawn at (default: the shortest length in the cell). */
  readonly l?: number;
}

export interface WidthProposal {
  /** The same netlist with the proposed widths; lengths, names and connections unchanged. */
  readonly netlist: Netlist;
  /** Old and new width per resized transistor, µm. */
  readonly widths: Readonly<Record<string, { readonly from: number; readonly to: number }>>;
  readonly notes: readonly string[];
}

/** Bound on the path enumeration per output stage. */
const PATH_SEARCH_STEPS = 50_000;

/**
 * Proposes widths that give every output the drive of the reference inverter in the worst case:
 * a transistor that lies on series chains of at most n switched transistors between the output and
 * a source gets n times the reference width of its type (scaled by its own length), so each chain
 * has the reference's resistance — the textbook sizing of Weste & Harris, 4th ed., §4.4 (a NAND2
 * gets NMOS 2, PMOS 2 against an inverter of 1 and 2). Always-on loads and resistors keep their size.
 */
export function proposeWidths(
  netlist: Netlist,
  tech: Technology,
  reference: ReferenceInverter,
): WidthProposal {
  const notes: string[] = [];
  const l = reference.l ?? referenceLength(netlist) ?? 1;
  const depth = new Map<string, number>();
  for (const output of netlist.outputs) {
    const stage = extractStage(netlist, tech, output);
    if (!chainDepths(stage, depth))
      notes.push(`${output}: too many paths to enumerate; widths left as drawn.`);
  }
  const widths = nameRecord<{ from: number; to: number }>();
  const devices = netlist.devices.map((d): Device => {
    const n = depth.get(d.name);
    if (n === undefined || (d.kind !== 'nmos' && d.kind !== 'pmos')) return d;
    const to = (n * (d.kind === 'nmos' ? reference.wn : reference.wp) * d.l) / l;
    widths[d.name] = { from: d.w, to };
    return { ...d, w: to };
  });
  return { netlist: { ...netlist, devices }, widths, notes };
}

/**
 * Records, per switched transistor, the most switched transistors on any simple chain through it
 * from the output to a source. Returns false when the search bound is reached (nothing recorded).
 */
function chainDepths(stage: Stage, depth: Map<string, number>): boolean {
  const found = new Map<string, number>();
  const onPath: number[] = [];
  const visited = new Set<number>([stage.output]);
  let steps = 0;
  const walk = (net: number): void => {
    if (++steps > PATH_SEARCH_STEPS) return;
    stage.elements.forEach((e, i) => {
      const next = e.a === net ? e.b : e.b === net ? e.a : -1;
      if (next < 0 || visited.has(next)) return;
      onPath.push(i);
      if (stage.roles[next] !== 'none') record(stage, onPath, found);
      else {
        visited.add(next);
        walk(next);
        visited.delete(next);
      }
      onPath.pop();
    });
  };
  walk(stage.output);
  if (steps > PATH_SEARCH_STEPS) return false;
  for (const [name, n] of found) depth.set(name, Math.max(depth.get(name) ?? 0, n));
  return true;
}

function record(stage: Stage, chain: readonly number[], found: Map<string, number>): void {
  const switched = chain.filter((i) => stage.elements[i]!.control >= 0);
  for (const i of switched) {
    const name = stage.elements[i]!.name;
    found.set(name, Math.max(found.get(name) ?? 0, switched.length));
  }
}
