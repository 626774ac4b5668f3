/**
 * Single static CMOS cells for the DC rows of the benchmark: an n-input NAND (the 4-input gate of
 * the transfer-curve case) and AO222 (six inputs, two stages, for the per-vector DC pass).
 */
import { circuit } from '../../src/core/model/builder.ts';
import type { Netlist } from '../../src/core/model/netlist.ts';
import { GND, inverter, NMOS_W, PMOS_W, VDD } from './parts.ts';

const LETTERS = 'ABCDEFGH';

/** NAND of n inputs A, B, …: parallel PMOS, series NMOS (A nearest the output), stack widths n. */
export function nandGate(n: number): Netlist {
  const inputs = LETTERS.slice(0, n).split('');
  let b = circuit(`nand${n}`)
    .rails()
    .input(...inputs)
    .output('Y');
  inputs.forEach((a, i) => {
    const top = i === 0 ? 'Y' : `x${i}`;
    const bottom = i === n - 1 ? GND : `x${i + 1}`;
    b = b
      .pmos(`P${a}`, { g: a, d: 'Y', s: VDD, w: PMOS_W })
      .nmos(`N${a}`, { g: a, d: top, s: bottom, w: n * NMOS_W });
  });
  return b.build();
}

/**
 * Y = A·B + C·D + E·F: an AOI222 (three series pairs in parallel to ground, their dual above) and an
 * output inverter; 14 transistors.
 */
export function ao222(): Netlist {
  const pairs = [
    ['A', 'B'],
    ['C', 'D'],
    ['E', 'F'],
  ] as const;
  let b = circuit('ao222').rails().input('A', 'B', 'C', 'D', 'E', 'F').output('Y');
  pairs.forEach(([p, q], i) => {
    const above = i === 0 ? VDD : `u${i}`;
    const below = i === 2 ? 'Yb' : `u${i + 1}`;
    b = b
      .nmos(`N${p}`, { g: p, d: 'Yb', s: `m${i}`, w: 2 * NMOS_W })
      .nmos(`N${q}`, { g: q, d: `m${i}`, s: GND, w: 2 * NMOS_W })
      .pmos(`P${p}`, { g: p, d: below, s: above, w: 3 * PMOS_W })
      .pmos(`P${q}`, { g: q, d: below, s: above, w: 3 * PMOS_W });
  });
  const devices = [...b.build().devices, ...inverter('O', 'Yb', 'Y')];
  return { ...b.build(), devices };
}
