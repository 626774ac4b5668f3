// Indexes read here are in range by construction, so `!` marks them (no run-time cost).
/**
 * The exhaustive-sweep circuit: 16 inputs (A0…A7, B0…B7) feeding eight 8-bit mirror ripple adders
 * with their carry-in tied to GND. Adder r adds A to B rotated left by r bits, so the eight adders
 * see different operand pairs for the same vector and no two compute the same sums.
 * 8 adders × 8 bits × 28 transistors = 1,792 transistors.
 * Outputs: R{r}.S0…R{r}.S7 and R{r}.CO for each adder r. `bits` widens the operands (2·bits inputs).
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

export function adderBank(adders = 8, bits = BANK_BITS): Netlist {
  if (!Number.isInteger(bits) || bits < 1)
    throw new RangeError(`bits must be a positive integer, got ${bits}`);
  if (!Number.isInteger(adders) || adders < 1 || adders > bits) {
    throw new RangeError(`adders must be an integer from 1 to ${bits}, got ${adders}`);
  }
  const a = numbered('A', bits);
  const b = numbered('B', bits);
  const bank = Array.from({ length: adders }, (_, r) =>
    rippleAdderDevices(bits, { prefix: `R${r}.`, a, b: rotateLeft(b, r), carryIn: GND }),
  );
  const outputs = bank.flatMap((adder) => [...adder.sum, adder.co]);
  return assemble(
    `adder-bank-${adders}x${bits}`,
    { inputs: [...a, ...b], outputs },
    bank.map((x) => x.devices),
  );
}

/** The 24-input sweep: six 12-bit adders, 6 × 12 × 28 = 2,016 transistors, 16,777,216 vectors. */
export function wideAdderBank(): Netlist {
  return adderBank(6, 12);
}
