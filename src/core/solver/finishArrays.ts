// Hot loop: indexes here are in range by construction, so `!` marks them (no run-time cost).
/**
 * The per-net and per-element arrays a solve derives once its voltages are known (Simulator.finish):
 * each net's level and each element's conduction. After an incremental solve only the nets of the
 * groups it re-evaluated and the sources can have changed, so only those are worked out again over
 * the base's arrays (`Changes`).
 */
import type { CompiledNetlist } from '../compile/compile.ts';
import { conductionFor } from './evaluate.ts';
import { LEVEL_0, LEVEL_1, LEVEL_X, LEVEL_Z } from './levels.ts';
import type { NetState } from './netState.ts';
import { clampConduction, GATE_TIED_A } from './selfGated.ts';
import type { Topology } from './topology.ts';

/** What an incremental solve changed: the base it started from, and the nets that may differ. */
export interface Changes {
  readonly base: { readonly levels: Uint8Array; readonly conduction: Uint8Array };
  readonly nets: Int32Array;
}

/** Each net's level from its voltage: every net, or only the changed ones over the base's levels. */
export function levelsOf(
  c: CompiledNetlist,
  topology: Topology,
  state: NetState,
  into: Uint8Array,
  changes: Changes | null,
): Uint8Array {
  const { volts, driven } = state;
  const { vil, vih } = c.tech;
  const update = (n: number): void => {
    const v = volts[n]!;
    into[n] =
      driven[n] || topology.isSource[n] ? (v <= vil ? LEVEL_0 : v >= vih ? LEVEL_1 : LEVEL_X) : LEVEL_Z;
  };
  if (changes === null) for (let n = 0; n < into.length; n++) update(n);
  else for (const n of changes.nets) update(n);
  return into;
}

/**
 * Conduction of every element from its gate's voltage (a floating gate reads its stored charge), or
 * of the elements the changed nets gate; a self-gated element conducts when it is forward-biased.
 */
export function conductionOfAll(
  c: CompiledNetlist,
  topology: Topology,
  volts: Float64Array,
  into: Uint8Array,
  changes: Changes | null,
): Uint8Array {
  const { chKind, chGate, chA, chB, tech, netGates } = c;
  const update = (e: number): void => {
    const gate = chGate[e]!;
    into[e] = conductionFor(chKind[e]!, gate >= 0 ? volts[gate]! : NaN, tech.vil, tech.vih);
  };
  if (changes === null) for (let e = 0; e < into.length; e++) update(e);
  else
    for (const n of changes.nets)
      for (let p = netGates.start[n]!; p < netGates.start[n + 1]!; p++) update(netGates.items[p]!);
  for (const e of topology.selfGatedElements) {
    const [gateEnd, other] = topology.selfGate[e] === GATE_TIED_A ? [chA[e]!, chB[e]!] : [chB[e]!, chA[e]!];
    into[e] = clampConduction(chKind[e]!, volts[gateEnd]!, volts[other]!);
  }
  return into;
}
