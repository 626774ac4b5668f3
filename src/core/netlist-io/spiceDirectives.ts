/**
 * What the `* railwise:` directives inside one subcircuit say about its pins and expected functions
 * (docs/semantics.md §6): `inputs` and `outputs` lines name the pins, `expect` lines the expected
 * functions, and a directive this build does not know is noted, never an error.
 */
import type { Netlist } from '../model/netlist.ts';
import type { Directive } from './spiceParse.ts';
import { SpiceImportError } from './spiceErrors.ts';
import { assignPins, PinError } from './pins.ts';
import { nameRecord } from '../model/records.ts';
import { unquoted } from '../text/printable.ts';

/**
 * `inputs` and `outputs` lines of one cell apply together, so a net named in both is a pin that is
 * driven and observed (a bidirectional pin), as our export writes it.
 */
export function applyPinDirectives(
  netlist: Netlist,
  directives: readonly Directive[],
  fileName: string,
): Netlist {
  const pins = directives.filter((d) => d.key === 'inputs' || d.key === 'outputs');
  const listed = (key: 'inputs' | 'outputs'): string[] | undefined => {
    const lines = pins.filter((d) => d.key === key);
    return lines.length === 0
      ? undefined
      : lines.flatMap((d) => d.value.split(/[\s,]+/).filter((n) => n !== ''));
  };
  const [inputs, outputs] = [listed('inputs'), listed('outputs')];
  try {
    return assignPins(
      netlist,
      { ...(inputs === undefined ? {} : { inputs }), ...(outputs === undefined ? {} : { outputs }) },
      { bidirectional: true },
    );
  } catch (e) {
    if (!(e instanceof PinError)) throw e;
    const line = pins.find((d) => d.key === e.field)?.line ?? pins[0]?.line ?? 1;
    throw new SpiceImportError(fileName, line, `${e.field}: ${e.message}`);
  }
}

const KNOWN_DIRECTIVES = new Set([
  'expect',
  'inputs',
  'outputs',
  'supply',
  'ground',
  'treat-as',
  'technology',
  'name',
  'implied-bulk',
  'implied-ground',
  'unwired',
]);

export function readExpectations(
  netlist: Netlist,
  directives: readonly Directive[],
  notes: string[],
): { expectations: Record<string, string>; lines: Record<string, number> } {
  const expectations = nameRecord<string>(); // an output may be called __proto__
  const lines = nameRecord<number>();
  for (const d of directives) {
    if (!KNOWN_DIRECTIVES.has(d.key))
      notes.push(`line ${d.line}: unknown railwise directive "${d.key}" ignored`);
    if (d.key !== 'expect') continue;
    const eq = d.value.indexOf('=');
    const output = d.value.slice(0, Math.max(eq, 0)).trim();
    if (eq < 0 || output === '') {
      notes.push(`line ${d.line}: an expect line reads "expect OUTPUT = EXPRESSION"; ignored`);
      continue;
    }
    const net = netlist.outputs.find((o) => o.toLowerCase() === output.toLowerCase()) ?? output;
    const text = d.value.slice(eq + 1).trim();
    // Our export writes an expression that would not read back as it is as a JSON string.
    expectations[net] = (text.startsWith('"') ? unquoted(text) : null) ?? text;
    lines[net] = d.line;
  }
  return { expectations, lines };
}
