// Hot loop: indexes here are in range by construction, so `!` marks them (no run-time cost).
import type { CompiledNetlist } from '../compile/compile.ts';

export interface PathIndices {
  /** Source net first, sink net last. */
  readonly nets: readonly number[];
  /** Channel elements between consecutive nets. */
  readonly elements: readonly number[];
  /** Amperes carried along this path. */
  readonly current: number;
}

/** Paths carrying less than this fraction of the largest source outflow are not listed. */
const RELATIVE_FLOOR = 1e-6;
const MAX_PATHS_PER_SOURCE = 8;

/**
 * Decomposes the steady-state current into source-to-sink chains. Current flows from higher to
 * lower voltage, so following it never loops; each walk takes the branch with the most remaining
 * current, stops at a source at lower voltage, and removes the chain's bottleneck current from every
 * element on it.
 */
export function currentPaths(
  c: CompiledNetlist,
  isSource: Uint8Array,
  sourceNets: Int32Array,
  volts: Float64Array,
  chCurrent: Float64Array,
  sourceOut: Float64Array,
): PathIndices[] {
  let largest = 0;
  for (const n of sourceNets) if (sourceOut[n]! > largest) largest = sourceOut[n]!;
  if (largest <= 0) return [];
  const residual = Float64Array.from(chCurrent, Math.abs);
  const floor = largest * RELATIVE_FLOOR;
  const sources = Array.from(sourceNets).filter((n) => sourceOut[n]! > floor);
  sources.sort((a, b) => volts[b]! - volts[a]! || c.netNames[a]!.localeCompare(c.netNames[b]!));
  const paths: PathIndices[] = [];
  for (const s of sources) {
    for (let k = 0; k < MAX_PATHS_PER_SOURCE; k++) {
      const path = walk(c, isSource, volts, chCurrent, residual, s, floor);
      if (!path) break;
      paths.push(path);
    }
  }
  return paths;
}

function walk(
  c: CompiledNetlist,
  isSource: Uint8Array,
  volts: Float64Array,
  chCurrent: Float64Array,
  residual: Float64Array,
  start: number,
  floor: number,
): PathIndices | null {
  const nets = [start];
  const elements: number[] = [];
  let at = start;
  for (let steps = 0; steps <= c.netCount; steps++) {
    let bestE = -1;
    for (let p = c.netChannels.start[at]!; p < c.netChannels.start[at + 1]!; p++) {
      const e = c.netChannels.items[p]!;
      const leaves = (c.chA[e] === at && chCurrent[e]! > 0) || (c.chB[e] === at && chCurrent[e]! < 0);
      if (leaves && residual[e]! > floor && (bestE < 0 || preferred(c, residual, e, bestE))) bestE = e;
    }
    if (bestE < 0) return null;
    at = c.chA[bestE] === at ? c.chB[bestE]! : c.chA[bestE]!;
    elements.push(bestE);
    nets.push(at);
    if (isSource[at] && volts[at]! < volts[start]!) {
      const current = Math.min(...elements.map((e) => residual[e]!));
      for (const e of elements) residual[e]! -= current;
      return { nets, elements, current };
    }
  }
  return null;
}

/** More remaining current wins; near-equal branches go by device name, so order never matters. */
function preferred(c: CompiledNetlist, residual: Float64Array, e: number, than: number): boolean {
  const scale = Math.max(residual[e]!, residual[than]!);
  if (Math.abs(residual[e]! - residual[than]!) > 1e-9 * scale) return residual[e]! > residual[than]!;
  const name = (x: number): string => c.netlist.devices[c.chDevice[x]!]!.name;
  return name(e) < name(than);
}
