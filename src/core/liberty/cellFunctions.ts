/**
 * A Liberty cell's published behaviour as this project's expectations for one netlist
 * (docs/semantics.md §4): its input and output pins, and per output the expected function, where a
 * `three_state` condition that holds expects Z (`(EN') ? Z : (A)`). Names are matched to the
 * netlist's nets without regard to case, as SPICE matches them.
 */
import { netNames, type Netlist } from '../model/netlist.ts';
import type { LibertyCell, LibertyLibrary, LibertyPin } from './libertyCells.ts';
import { LibertyFunctionError, namesIn, parseLibertyFunction, toExpectation } from './libertyFunction.ts';
import { nameRecord } from '../model/records.ts';

export interface CellFunctions {
  readonly inputs: readonly string[];
  readonly outputs: readonly string[];
  readonly expectations: Readonly<Record<string, string>>;
  readonly notes: readonly string[];
}

export function cellFunctions(cell: LibertyCell, netlist: Netlist, source: string): CellFunctions {
  const byLower = new Map(netNames(netlist).map((n) => [n.toLowerCase(), n]));
  const rails = new Set(netlist.rails.map((r) => r.net));
  const notes: string[] = [];
  const resolve = (pin: LibertyPin): string | null => {
    const net = byLower.get(pin.name.toLowerCase());
    if (net === undefined)
      notes.push(`pin ${pin.name} of ${source} (line ${pin.line}) is no net of the cell`);
    return net === undefined || rails.has(net) ? null : net;
  };
  const inputs = cell.pins.filter((p) => p.direction === 'input').flatMap((p) => resolve(p) ?? []);
  const outputPins = cell.pins.filter((p) => p.direction === 'output' || p.direction === 'inout');
  const outputs: string[] = [];
  const expectations = nameRecord<string>();
  for (const pin of outputPins) {
    const net = resolve(pin);
    if (net === null) continue;
    outputs.push(net);
    const expected = expectationOf(pin, new Map(inputs.map((n) => [n.toLowerCase(), n])), source);
    if ('text' in expected) expectations[net] = expected.text;
    else notes.push(expected.note);
  }
  return { inputs, outputs, expectations, notes };
}

type Expected = { readonly text: string } | { readonly note: string };

function expectationOf(pin: LibertyPin, inputs: ReadonlyMap<string, string>, source: string): Expected {
  const where = `${pin.name} (${source} line ${pin.line})`;
  if (pin.function === undefined) return { note: `output ${where} has no function: not checked against one` };
  try {
    const fn = parseLibertyFunction(pin.function);
    const ts = pin.threeState === undefined ? null : parseLibertyFunction(pin.threeState);
    const unknown = [...namesIn(fn), ...(ts === null ? [] : namesIn(ts))].filter(
      (n) => !inputs.has(n.toLowerCase()),
    );
    if (unknown.length > 0)
      return {
        note: `the function of output ${where} reads ${unknown.join(', ')}, not inputs of the cell: not checked`,
      };
    const rename = (name: string): string => inputs.get(name.toLowerCase()) ?? name;
    const body = toExpectation(fn, rename);
    return { text: ts === null ? body : `${toExpectation(ts, rename)} ? Z : ${body}` };
  } catch (e) {
    if (e instanceof LibertyFunctionError) return { note: `output ${where}: ${e.message}; not checked` };
    throw e;
  }
}

/**
 * Power and ground names over the whole library, for reading the netlists' rails: every cell's
 * power pins, and every name of the library's `voltage_map` (0 V a ground, else a supply), which
 * also covers well pins that are no `pg_pin` of any cell.
 */
export function powerNames(library: LibertyLibrary): { supply: string[]; ground: string[] } {
  const supply = new Set<string>();
  const ground = new Set<string>();
  library.voltages.forEach((volts, name) => {
    if (Number.isFinite(volts)) (volts === 0 ? ground : supply).add(name);
  });
  for (const cell of library.cells)
    for (const p of cell.powerPins) (p.role === 'supply' ? supply : ground).add(p.name);
  return { supply: [...supply], ground: [...ground].filter((n) => !supply.has(n)) };
}
