import type { Cnf } from './cnf.ts';

/** A channel between two nets of a group (parallel devices merged): when it conducts for a level. */
export interface Link {
  readonly a: number;
  readonly b: number;
  readonly conducts: number;
}

/**
 * Which nets a level reaches through conducting links, from the nets it enters at (`seeds`, one
 * literal per local net). Encoded in layers: reach_d(n) = reach_{d-1}(n) ∨ ⋁ (link ∧ reach_{d-1}(m)),
 * so a net is reached only along an actual path and never by a loop of links supporting itself.
 * `layers` must be at least the longest shortest path a conducting subset can need.
 */
export function reach(cnf: Cnf, seeds: readonly number[], links: readonly Link[], layers: number): number[] {
  let current = [...seeds];
  for (let d = 0; d < layers; d++) {
    const incoming: number[][] = current.map((lit) => [lit]);
    for (const { a, b, conducts } of links) {
      incoming[a]!.push(cnf.and([conducts, current[b]!]));
      incoming[b]!.push(cnf.and([conducts, current[a]!]));
    }
    const next = incoming.map((lits) => cnf.or(lits));
    if (next.every((lit, i) => lit === current[i])) break;
    current = next;
  }
  return current;
}

/**
 * How many layers `reach` needs: in a forest the path between two nets is unique, so the longest
 * path (the largest diameter) suffices; with loops, any simple path has at most nets − 1 links.
 */
export function layersNeeded(netCount: number, links: readonly Link[]): number {
  const adjacent: number[][] = Array.from({ length: netCount }, () => []);
  for (const { a, b } of links) {
    adjacent[a]!.push(b);
    adjacent[b]!.push(a);
  }
  if (links.length >= netCount || hasLoop(netCount, links)) return Math.max(0, netCount - 1);
  const seen = new Uint8Array(netCount);
  let longest = 0;
  for (let n = 0; n < netCount; n++) {
    if (seen[n]) continue;
    const [far] = farthest(adjacent, n, seen);
    longest = Math.max(longest, farthest(adjacent, far, new Uint8Array(netCount))[1]);
  }
  return longest;
}

function hasLoop(netCount: number, links: readonly Link[]): boolean {
  const parent = Int32Array.from({ length: netCount }, (_, i) => i);
  const root = (x: number): number => {
    while (parent[x] !== x) x = parent[x] = parent[parent[x]!]!;
    return x;
  };
  for (const { a, b } of links) {
    const [ra, rb] = [root(a), root(b)];
    if (ra === rb) return true;
    parent[ra] = rb;
  }
  return false;
}

/** Breadth-first from `start`: the farthest net and its distance; marks what it visits. */
function farthest(adjacent: readonly number[][], start: number, seen: Uint8Array): [number, number] {
  let frontier = [start];
  seen[start] = 1;
  let depth = 0;
  let last = start;
  while (frontier.length > 0) {
    const next: number[] = [];
    for (const n of frontier) {
      last = n;
      for (const m of adjacent[n]!) {
        if (seen[m]) continue;
        seen[m] = 1;
        next.push(m);
      }
    }
    if (next.length === 0) break;
    frontier = next;
    depth++;
  }
  return [last, depth];
}
