// Indexes read here are in range by construction, so `!` marks them (no run-time cost).
/**
 * Memory growth with circuit size: bytes retained per transistor by the netlist, its compiled form,
 * a simulator and one solved vector. V8 keeps large typed arrays outside the JavaScript heap, so the
 * figure adds `arrayBuffers` to `heapUsed`; both are read after a forced collection.
 */
import { setFlagsFromString } from 'node:v8';
import { runInNewContext } from 'node:vm';
import type { Netlist } from '../src/core/model/netlist.ts';
import { prepare } from './measure.ts';
import { randomVectors } from './vectors.ts';

export interface MemoryResult {
  readonly name: string;
  readonly transistors: number;
  /** Bytes retained (heap plus array buffers) divided by transistors. */
  readonly bytesPerTransistor: number;
  readonly heapBytesPerTransistor: number;
  /**
   * Extra bytes per extra transistor since the previous size of the same family: the slope of the
   * growth, which stays flat when memory grows linearly. Absent for the first size.
   */
  readonly marginalBytesPerTransistor?: number;
}

/** Adds each result's slope against the one before it (results of one family, smallest first). */
export function withSlopes(series: readonly MemoryResult[]): MemoryResult[] {
  return series.map((m, i) => {
    if (i === 0) return m;
    const prev = series[i - 1]!;
    const bytes = m.bytesPerTransistor * m.transistors - prev.bytesPerTransistor * prev.transistors;
    return { ...m, marginalBytesPerTransistor: bytes / (m.transistors - prev.transistors) };
  });
}

/** A handle on V8's collector; the flag must be set before a fresh context asks for `gc`. */
function collector(): () => void {
  setFlagsFromString('--expose-gc');
  return runInNewContext('gc') as () => void;
}

function retained(gc: () => void): { heap: number; total: number } {
  gc();
  gc();
  const m = process.memoryUsage();
  return { heap: m.heapUsed, total: m.heapUsed + m.arrayBuffers };
}

/** Builds, compiles and solves `make()` once, keeping everything alive while the heap is read. */
export function measureMemory(name: string, make: () => Netlist): MemoryResult {
  const gc = collector();
  const before = retained(gc);
  const p = prepare(make());
  const solved = p.simulator.solveFresh(randomVectors(p.netlist.inputs, 1, 3)[0]!);
  const after = retained(gc);
  // Touch what must stay alive so the collector cannot free it before the reading above.
  if (solved.levels.length !== p.compiled.netCount) throw new Error(`${name}: levels do not cover every net`);
  return {
    name,
    transistors: p.transistors,
    bytesPerTransistor: (after.total - before.total) / p.transistors,
    heapBytesPerTransistor: (after.heap - before.heap) / p.transistors,
  };
}
