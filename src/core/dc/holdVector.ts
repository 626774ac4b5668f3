// Indexes here are in range by construction (compiled-netlist and per-net arrays), so `!` marks them (no run-time cost).
import { sweepVectors } from '../analysis/vectors.ts';
import type { CompiledNetlist } from '../compile/compile.ts';
import type { InputValue, InputVector } from '../model/design.ts';
import { LEVEL_0, LEVEL_1 } from '../solver/levels.ts';
import { Simulator } from '../solver/simulator.ts';
import { TransferError } from './errors.ts';
import { nameRecord } from '../model/records.ts';

/** Free held inputs searched for a sensitising vector; beyond this they are held at 0 (noted). */
export const MAX_HOLD_SEARCH = 12;

export interface HoldChoice {
  /** The held value of every input but the swept one. */
  readonly hold: InputVector;
  /** Inputs whose value Railwise chose (the user named the others). */
  readonly chosen: readonly string[];
  readonly notes: readonly string[];
}

/**
 * Completes a partly given hold vector. A designer sweeping A of a NAND wants the other inputs at 1,
 * where the output follows A: among the completions (truth-table order), pick the first under which
 * the switch-level solver sees the most outputs flip between A = 0 and A = 1.
 */
export function chooseHold(c: CompiledNetlist, input: string, given: InputVector): HoldChoice {
  const free = c.netlist.inputs.filter((n) => n !== input && !(n in given));
  if (free.length === 0) return { hold: given, chosen: [], notes: [] };
  if (free.length > MAX_HOLD_SEARCH) {
    const zeros = Object.fromEntries(free.map((n) => [n, '0' as InputValue]));
    return {
      hold: { ...given, ...zeros },
      chosen: free,
      notes: [
        `${free.length} inputs not held: too many to search, so they are held at 0 (name them with --hold)`,
      ],
    };
  }
  const simulator = new Simulator(c);
  let best: InputVector | null = null;
  let bestCount = -1;
  for (const completion of sweepVectors(free)) {
    const hold = { ...given, ...completion };
    const count = flippingOutputs(c, simulator, input, hold);
    if (count > bestCount) {
      best = hold;
      bestCount = count;
    }
  }
  const hold = best ?? given;
  const label = free.map((n) => `${n}=${hold[n]}`).join(' ');
  const notes =
    bestCount > 0
      ? [`held inputs chosen so that the output follows ${input}: ${label}`]
      : [`no held vector makes an output follow ${input}; holding ${label}`];
  return { hold, chosen: free, notes };
}

function flippingOutputs(c: CompiledNetlist, simulator: Simulator, input: string, hold: InputVector): number {
  const low = simulator.solveFresh({ ...hold, [input]: '0' }).levels.slice();
  const high = simulator.solveFresh({ ...hold, [input]: '1' }).levels;
  let count = 0;
  for (const n of c.outputNets) {
    const a = low[n];
    const b = high[n];
    if ((a === LEVEL_0 || a === LEVEL_1) && (b === LEVEL_0 || b === LEVEL_1) && a !== b) count++;
  }
  return count;
}

/**
 * Reads held values written as `"B=1 C=0"` (spaces or commas between; names match an input
 * regardless of case); a TransferError names a bad item.
 */
export function parseHold(text: string, inputs: readonly string[]): InputVector {
  const hold = nameRecord<InputValue>();
  for (const item of text.split(/[\s,]+/).filter((s) => s !== '')) {
    const m = /^([^=\s]+)=([01])$/.exec(item);
    if (!m) throw new TransferError(`held '${item}' is not NAME=0 or NAME=1`);
    const name = inputs.includes(m[1]!) ? m[1] : inputs.find((n) => n.toLowerCase() === m[1]!.toLowerCase());
    if (name === undefined)
      throw new TransferError(`held '${m[1]}' is not an input (inputs: ${inputs.join(', ') || 'none'})`);
    hold[name] = m[2] as InputValue;
  }
  return hold;
}
