// Indexes read here are in range by construction, so `!` marks them (no run-time cost).
/**
 * The exhaustive-sweep circuit: 16 inputs (A0…A7, B0…B7) feeding eight 8-bit mirror ripple adders
 * with their carry-in tied to GND. Adder r adds A to B rotated left by r bits, so the eight adders
 * see different operand pairs for the same vector and no two compute the same sums.
 * 8 adders × 8 bits × 28 transistors = 1,792 transistors.
 * Outputs: R{r}.S0…R{r}.S7 and R{r}.CO for each adder r.
 */
import type { Netlist } from '../../src/core/model/netlist.ts';
import { rippleAdderDevices } from './mirrorAdder.ts';
import { GND, assemble, numbered } from './parts.ts';

export const BANK_BITS = 8;

/** `nets` rotated left by r places: bit i of the result is bit (i − r) mod n of the input. */
export function rotateLeft<T>(nets: readonly T[], r: number): T[] {
  const n = nets.length;
  return nets.map((_, i) => nets[(((i - r) % n) + n) % n]!);
}

export function adderBank(adders = 8): Netlist {
  if (!Number.isInteger(adders) || adders < 1 || adders > BANK_BITS) {
    throw new RangeError(`adders must be an integer from 1 to ${BANK_BITS}, got ${adders}`);
  }
  const a = numbered('A', BANK_BITS);
  const b = numbered('B', BANK_BITS);
  const bank = Array.from({ length: adders }, (_, r) =>
    rippleAdderDevices(BANK_BITS, { prefix: `R${r}.`, a, b: rotateLeft(b, r), carryIn: GND }),
  );
  const outputs = bank.flatMap((adder) => [...adder.sum, adder.co]);
  return assemble(
    `adder-bank-${adders}x${BANK_BITS}`,
    { inputs: [...a, ...b], outputs },
    bank.map((x) => x.devices),
  );
}
