/**
 * A ratioed (pseudo-NMOS) decoder: k address bits A0… (A0 least significant), 2^k output lines Y0….
 * Each line is a NOR: a PMOS load with its gate at GND pulls it up, and one NMOS per address bit pulls
 * it down whenever that bit differs from the line's own number. Outputs are active high: exactly the
 * line whose number equals the address is 1; every other line is pulled low against its load and draws
 * static current by design. Transistors: 2^k·(k + 1) in the lines plus 2·k in the address inverters.
 *
 * Ratio: the pull-down must win clearly. With unit resistances Rn 13 kΩ and Rp 31 kΩ (the default
 * technology), a 1 µm/0.25 µm NMOS is 3.25 kΩ and a 0.5 µm/0.25 µm PMOS load 15.5 kΩ, so one conducting
 * pull-down leaves VOL ≈ 2.5 V · 3.25/18.75 ≈ 0.43 V, under VIL = 0.875 V. A load about a quarter to a
 * fifth the strength of the pull-down is the usual pseudo-NMOS choice (common practice, no source).
 */
import type { Device, Netlist } from '../../src/core/model/netlist.ts';
import { GND, NMOS_W, VDD, assemble, cellDevices, inverter, numbered } from './parts.ts';

const LOAD_W = 0.5;

/** Output line `line`: a PMOS load plus pull-downs gated by the address literals that must be 0. */
function decoderLine(line: number, addressBits: number): readonly Device[] {
  const y = `Y${line}`;
  return cellDevices((c) => {
    let b = c.pmos(`L${line}.P`, { g: GND, d: y, s: VDD, w: LOAD_W });
    for (let i = 0; i < addressBits; i++) {
      // The line wants bit i = 1: pull down when it is 0, i.e. gate on the complement.
      const gate = (line >> i) & 1 ? `AB${i}` : `A${i}`;
      b = b.nmos(`L${line}.N${i}`, { g: gate, d: y, s: GND, w: NMOS_W });
    }
    return b;
  });
}

export function ratioedDecoder(addressBits: number): Netlist {
  if (!Number.isInteger(addressBits) || addressBits < 1 || addressBits > 16) {
    throw new RangeError(`address bits must be an integer from 1 to 16, got ${addressBits}`);
  }
  const address = numbered('A', addressBits);
  const lines = 2 ** addressBits;
  const cells = [
    ...address.map((a, i) => inverter(`IA${i}.`, a, `AB${i}`)),
    ...Array.from({ length: lines }, (_, j) => decoderLine(j, addressBits)),
  ];
  return assemble(
    `ratioed-decoder-${addressBits}`,
    { inputs: address, outputs: numbered('Y', lines) },
    cells,
  );
}
