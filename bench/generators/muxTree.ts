// Indexes read here are in range by construction, so `!` marks them (no run-time cost).
/**
 * A transmission-gate multiplexer tree: 2^k data inputs D0…, k select lines S0… (S0 least
 * significant), one output Y = D[S]. Each select line has its own static inverter for the
 * complement the PMOS halves need; every 2:1 stage is a pair of transmission gates.
 * Transistors: 4·(2^k − 1) in the tree plus 2·k in the select inverters.
 */
import type { Device, Netlist } from '../../src/core/model/netlist.ts';
import { assemble, inverter, numbered, transmissionGate } from './parts.ts';

/** One 2:1 stage: `zero` passes to `y` when the select is 0, `one` when it is 1. */
function mux2(
  prefix: string,
  zero: string,
  one: string,
  y: string,
  s: string,
  sb: string,
): readonly Device[] {
  return [
    ...transmissionGate(`${prefix}T0`, zero, y, sb, s),
    ...transmissionGate(`${prefix}T1`, one, y, s, sb),
  ];
}

export function muxTree(selectBits: number): Netlist {
  if (!Number.isInteger(selectBits) || selectBits < 1 || selectBits > 16) {
    throw new RangeError(`select bits must be an integer from 1 to 16, got ${selectBits}`);
  }
  const data = numbered('D', 2 ** selectBits);
  const selects = numbered('S', selectBits);
  const cells: (readonly Device[])[] = selects.map((s, i) => inverter(`IS${i}.`, s, `SB${i}`));
  // Level i halves the nets of level i−1, choosing between neighbours with select line i.
  let level = data;
  for (let i = 0; i < selectBits; i++) {
    const last = i === selectBits - 1;
    const next = Array.from({ length: level.length / 2 }, (_, j) => (last ? 'Y' : `m${i + 1}_${j}`));
    next.forEach((y, j) =>
      cells.push(mux2(`M${i + 1}_${j}.`, level[2 * j]!, level[2 * j + 1]!, y, `S${i}`, `SB${i}`)),
    );
    level = next;
  }
  return assemble(`tg-mux-${2 ** selectBits}`, { inputs: [...data, ...selects], outputs: ['Y'] }, cells);
}
