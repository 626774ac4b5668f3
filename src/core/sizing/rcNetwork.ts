// Indexes read here are in range by construction, so `!` marks them (no run-time cost).
import { LuDecomposition, Matrix } from 'ml-matrix';
import type { Stage } from './stage.ts';

/** Which sources a transition is driven from: a rise comes from supplies, a fall from grounds. */
export type Direction = 'up' | 'down';

export interface Evaluation {
  /** Effective resistance between the output and the merged sources, ohms. */
  readonly ohms: number;
  /** Elmore delay at the output, seconds: τ_out = Σ_k R_out,k · C_k. */
  readonly elmore: number;
  /** The most resistive conducting chain, source first, output last. */
  readonly path: readonly string[];
}

/** Bound on the depth-first search for the most resistive chain (a cell stage has few paths). */
const PATH_SEARCH_STEPS = 20_000;

function isRoot(stage: Stage, net: number, direction: Direction): boolean {
  const role = stage.roles[net];
  return role === 'both' || role === direction;
}

function isOpposite(stage: Stage, net: number, direction: Direction): boolean {
  return stage.roles[net] === (direction === 'up' ? 'down' : 'up');
}

/**
 * The conducting elements that count for one direction: elements touching an opposite source are
 * left out, so a ratioed stage's pull-down is measured as if its pull-up were open.
 */
function usable(stage: Stage, on: readonly boolean[], direction: Direction): number[] {
  const keep: number[] = [];
  stage.elements.forEach((e, i) => {
    if (on[i] && !isOpposite(stage, e.a, direction) && !isOpposite(stage, e.b, direction)) keep.push(i);
  });
  return keep;
}

/** Non-source nets joined to the output by the usable elements; null when no source is reached. */
function component(stage: Stage, elems: readonly number[], direction: Direction): number[] | null {
  const nodes = [stage.output];
  const seen = new Set(nodes);
  let reachesSource = false;
  for (let k = 0; k < nodes.length; k++) {
    for (const i of elems) {
      const e = stage.elements[i]!;
      const other = e.a === nodes[k] ? e.b : e.b === nodes[k] ? e.a : -1;
      if (other < 0 || seen.has(other)) continue;
      seen.add(other);
      if (isRoot(stage, other, direction)) reachesSource = true;
      else nodes.push(other);
    }
  }
  return reachesSource ? nodes : null;
}

/**
 * Nodal analysis with every source merged into the reference node: G·v = e_out gives the effective
 * resistance, and G·τ = c gives the Elmore delays (the general form of Elmore's shared-resistance
 * sum, exact for trees and for meshes alike).
 */
function solveRc(stage: Stage, elems: readonly number[], nodes: readonly number[], caps: Float64Array) {
  const position = new Map(nodes.map((n, p) => [n, p]));
  const g = Matrix.zeros(nodes.length, nodes.length);
  for (const i of elems) {
    const e = stage.elements[i]!;
    const pa = position.get(e.a);
    const pb = position.get(e.b);
    const conductance = 1 / e.ohms;
    if (pa !== undefined) g.set(pa, pa, g.get(pa, pa) + conductance);
    if (pb !== undefined) g.set(pb, pb, g.get(pb, pb) + conductance);
    if (pa !== undefined && pb !== undefined) {
      g.set(pa, pb, g.get(pa, pb) - conductance);
      g.set(pb, pa, g.get(pb, pa) - conductance);
    }
  }
  const rhs = Matrix.zeros(nodes.length, 2);
  rhs.set(0, 0, 1); // 1 A injected at the output (position 0)
  nodes.forEach((n, p) => rhs.set(p, 1, caps[n]!));
  const x = new LuDecomposition(g).solve(rhs);
  return { ohms: x.get(0, 0), elmore: x.get(0, 1) };
}

/** The most resistive simple chain from the output to a source through the usable elements. */
function worstChain(stage: Stage, elems: readonly number[], direction: Direction): string[] {
  let best: { ohms: number; chain: string[] } = { ohms: -1, chain: [] };
  let steps = 0;
  const visited = new Set<number>([stage.output]);
  const walk = (net: number, ohms: number, chain: string[]): void => {
    if (++steps > PATH_SEARCH_STEPS) return;
    for (const i of elems) {
      const e = stage.elements[i]!;
      const next = e.a === net ? e.b : e.b === net ? e.a : -1;
      if (next < 0 || visited.has(next)) continue;
      const extended = [...chain, e.name, stage.nets[next]!];
      if (isRoot(stage, next, direction)) {
        if (ohms + e.ohms > best.ohms) best = { ohms: ohms + e.ohms, chain: extended };
        continue;
      }
      visited.add(next);
      walk(next, ohms + e.ohms, extended);
      visited.delete(next);
    }
  };
  walk(stage.output, 0, [stage.nets[stage.output]!]);
  return best.chain.reverse();
}

/**
 * Evaluates one on/off configuration of a stage in one direction: null when the output is not
 * connected to any source of that direction. `caps` holds each stage net's capacitance, farads.
 */
export function evaluate(
  stage: Stage,
  on: readonly boolean[],
  direction: Direction,
  caps: Float64Array,
): Evaluation | null {
  if (stage.roles[stage.output] !== 'none') return null;
  const elems = usable(stage, on, direction);
  const nodes = component(stage, elems, direction);
  if (nodes === null) return null;
  return { ...solveRc(stage, elems, nodes, caps), path: worstChain(stage, elems, direction) };
}
