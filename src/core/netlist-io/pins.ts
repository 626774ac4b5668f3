/**
 * Naming a cell's input and output pins by hand (the `--inputs`/`--outputs` flags and the
 * `* railwise: inputs …` directive), over what the importer inferred. Names match nets
 * case-insensitively, as SPICE does, and come back in the netlist's own spelling.
 */
import { netNames, type Netlist } from '../model/netlist.ts';

export class PinError extends Error {
  override readonly name = 'PinError';
  constructor(
    /** Which list is at fault. */
    readonly field: 'inputs' | 'outputs',
    message: string,
  ) {
    super(message);
  }
}

export interface PinChoice {
  readonly inputs?: readonly string[];
  readonly outputs?: readonly string[];
}

export interface PinRules {
  /**
   * A net in both lists is a pin that is driven and observed, and a rail may be observed as an
   * output (the pin directives of our own export say so); otherwise both are refused.
   */
  readonly bidirectional?: boolean;
}

/**
 * Given inputs replace the inferred ones, and the other inferred pins become outputs unless outputs
 * are given too. Given outputs replace the inferred ones and leave the inputs that remain.
 */
export function assignPins(netlist: Netlist, choice: PinChoice, rules: PinRules = {}): Netlist {
  if (choice.inputs === undefined && choice.outputs === undefined) return netlist;
  const lenient = rules.bidirectional === true;
  const inputs = choice.inputs === undefined ? undefined : resolve(netlist, choice.inputs, 'inputs', false);
  const outputs =
    choice.outputs === undefined ? undefined : resolve(netlist, choice.outputs, 'outputs', lenient);
  const both = inputs?.find((n) => outputs?.includes(n));
  if (both !== undefined && !lenient)
    throw new PinError('outputs', `${both} is named both as an input and as an output`);
  const nextInputs = inputs ?? netlist.inputs.filter((n) => !outputs?.includes(n));
  const nextOutputs =
    outputs ?? [...netlist.outputs, ...netlist.inputs].filter((n) => !nextInputs.includes(n));
  return { ...netlist, inputs: nextInputs, outputs: nextOutputs };
}

function resolve(
  netlist: Netlist,
  names: readonly string[],
  what: 'inputs' | 'outputs',
  railsAllowed: boolean,
): string[] {
  const byLower = new Map(netNames(netlist).map((n) => [n.toLowerCase(), n]));
  const rails = new Set(netlist.rails.map((r) => r.net));
  const out: string[] = [];
  for (const name of names) {
    const net = byLower.get(name.toLowerCase());
    if (net === undefined) {
      const ports = [...netlist.inputs, ...netlist.outputs].join(', ') || 'none';
      throw new PinError(what, `cell ${netlist.name} has no net "${name}" (its pins: ${ports})`);
    }
    if (rails.has(net) && !railsAllowed)
      throw new PinError(what, `${net} is a rail of cell ${netlist.name}, not a pin`);
    if (!out.includes(net)) out.push(net);
  }
  return out;
}
