/**
 * Naming a cell's input and output pins by hand (the `--inputs`/`--outputs` flags and the
 * `* railwise: inputs …` directive), over what the importer inferred. Names match nets
 * case-insensitively, as SPICE does, and come back in the netlist's own spelling.
 */
import { expressionNames, namesRead } from '../expect/names.ts';
import { ExpressionError, parseExpression } from '../expect/parse.ts';
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

/**
 * Pins that expected functions show to be inputs: a port the importer took for an output (it reaches
 * a channel, as the data input of a pass gate does) that an expected function reads but that has no
 * expected function of its own. `CO = A & B | CI & (A ^ B)` makes A, B and CI inputs whatever they
 * drive. An output named in its own expression (`Q = S | !R & Q`, docs/semantics.md §4) stays an
 * output. Expressions that do not parse are left to the check, which reports them with their place.
 */
export function inputsReadByExpectations(
  netlist: Netlist,
  expectations: Readonly<Record<string, string>>,
): string[] {
  const names = expressionNames(netlist);
  const read = new Set<string>();
  for (const text of Object.values(expectations)) {
    try {
      namesRead(parseExpression(text, names), read);
    } catch (e) {
      if (!(e instanceof ExpressionError)) throw e;
    }
  }
  const described = new Set(Object.keys(expectations).map((o) => o.toLowerCase()));
  return netlist.outputs.filter((o) => read.has(o) && !described.has(o.toLowerCase()));
}

/** The netlist with `inputsReadByExpectations` moved from its outputs to the end of its inputs. */
export function withInputsReadByExpectations(
  netlist: Netlist,
  expectations: Readonly<Record<string, string>>,
): Netlist {
  const read = inputsReadByExpectations(netlist, expectations);
  return read.length === 0 ? netlist : assignPins(netlist, { inputs: [...netlist.inputs, ...read] });
}
