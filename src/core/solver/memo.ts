import type { CompiledNetlist } from '../compile/compile.ts';
import { csr, type Csr } from '../compile/csr.ts';
import type { NetState } from './schedule.ts';
import type { Topology } from './topology.ts';

/** Components whose outcome depends on more full-rail nets than this are never memoised. */
const MAX_KEY_NETS = 16;
/** Outcomes kept per component; past it the component is evaluated as usual. */
const MAX_ENTRIES = 256;

interface Outcome {
  readonly volts: Float64Array;
  readonly driven: Uint8Array;
  readonly flags: Uint8Array;
  readonly limiter: Int32Array;
  readonly current: Float64Array;
  /** Some net floated: the outcome holds for unknown stored charge (sweep mode) only. */
  readonly floats: boolean;
}

/**
 * Memoised component outcomes. A component's evaluation reads only its elements' gate voltages, the
 * voltages of the sources tied to it, and (for floating nets) its own stored charge. When every one
 * of those gates and sources sits exactly at a rail (0 or VDD), their levels form a small key and the
 * outcome can be replayed from a table: static CMOS gates then cost a table look-up per vector.
 * An outcome with a floating net depends on stored charge and is replayed in sweep mode only, where
 * stored charge is always unknown.
 */
export class OutcomeMemo {
  private readonly keyNets: Csr;
  private readonly tables: (Map<number, Outcome> | undefined)[];

  constructor(
    private readonly c: CompiledNetlist,
    private readonly topology: Topology,
  ) {
    const pairs: [number, number][] = [];
    for (let k = 0; k < topology.cccCount; k++) {
      const nets = new Set<number>();
      for (let i = topology.cccElements.start[k]; i < topology.cccElements.start[k + 1]; i++) {
        const e = topology.cccElements.items[i];
        if (c.chGate[e] >= 0) nets.add(c.chGate[e]);
        for (const end of [c.chA[e], c.chB[e]]) if (topology.isSource[end]) nets.add(end);
      }
      if (nets.size <= MAX_KEY_NETS) for (const n of [...nets].sort((a, b) => a - b)) pairs.push([k, n]);
      else pairs.push([k, -1]);
    }
    this.keyNets = csr(topology.cccCount, pairs);
    this.tables = new Array(topology.cccCount);
  }

  /** The key of component k's current inputs, or -1 when some input is not exactly at a rail. */
  key(k: number, volts: Float64Array): number {
    const { start, items } = this.keyNets;
    const vdd = this.c.tech.vdd;
    let key = 0;
    for (let i = start[k]; i < start[k + 1]; i++) {
      const n = items[i];
      if (n < 0) return -1;
      const v = volts[n];
      if (v === vdd) key |= 1 << (i - start[k]);
      else if (v !== 0) return -1;
    }
    return key;
  }

  /** Replays a stored outcome into the state; false when there is none usable. */
  replay(k: number, key: number, fresh: boolean, state: NetState): boolean {
    const outcome = this.tables[k]?.get(key);
    if (!outcome || (outcome.floats && !fresh)) return false;
    const { cccNets, cccElements } = this.topology;
    const n0 = cccNets.start[k];
    for (let i = n0; i < cccNets.start[k + 1]; i++) {
      const n = cccNets.items[i];
      state.volts[n] = outcome.volts[i - n0];
      state.driven[n] = outcome.driven[i - n0];
      state.flags[n] = outcome.flags[i - n0];
      state.limiter[n] = outcome.limiter[i - n0];
    }
    const e0 = cccElements.start[k];
    for (let i = e0; i < cccElements.start[k + 1]; i++)
      state.chCurrent[cccElements.items[i]] = outcome.current[i - e0];
    return true;
  }

  /** Stores the outcome just evaluated for component k. */
  store(k: number, key: number, fresh: boolean, state: NetState): void {
    const table = (this.tables[k] ??= new Map());
    if (table.size >= MAX_ENTRIES) return;
    const { cccNets, cccElements } = this.topology;
    const nets = cccNets.items.subarray(cccNets.start[k], cccNets.start[k + 1]);
    const elements = cccElements.items.subarray(cccElements.start[k], cccElements.start[k + 1]);
    const floats = nets.some((n) => state.driven[n] === 0);
    if (floats && !fresh) return;
    table.set(key, {
      volts: Float64Array.from(nets, (n) => state.volts[n]),
      driven: Uint8Array.from(nets, (n) => state.driven[n]),
      flags: Uint8Array.from(nets, (n) => state.flags[n]),
      limiter: Int32Array.from(nets, (n) => state.limiter[n]),
      current: Float64Array.from(elements, (e) => state.chCurrent[e]),
      floats,
    });
  }
}
