/**
 * What every vector of a check asks of a compiled netlist, worked out once per compile rather than
 * once per vector: which nets are outputs, and which are observed (outputs and nets that feed a gate:
 * the nets whose level matters to the cell, docs/semantics.md §3).
 */
import type { CompiledNetlist } from '../compile/compile.ts';

export interface Observation {
  /** 1 where the net is an output pin. */
  readonly isOutput: Uint8Array;
  /** 1 where the net is an output or feeds a gate. */
  readonly observed: Uint8Array;
}

const cache = new WeakMap<CompiledNetlist, Observation>();

export function observationOf(c: CompiledNetlist): Observation {
  let o = cache.get(c);
  if (o === undefined) {
    const isOutput = new Uint8Array(c.netCount);
    for (const n of c.outputNets) isOutput[n] = 1;
    const observed = Uint8Array.from(isOutput);
    for (let n = 0; n < c.netCount; n++) if (c.netGates.start[n + 1]! > c.netGates.start[n]!) observed[n] = 1;
    o = { isOutput, observed };
    cache.set(c, o);
  }
  return o;
}
