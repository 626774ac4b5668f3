/**
 * Export → import is the identity on any design's netlist and expected functions, whatever its
 * names (docs/semantics.md §5, "Export → import is the identity"; §8 asks it of import → export →
 * import; a design's own names are harder). And no name or text of a design can add a statement to
 * an export. Our own format's behaviour: no published source applies; the SPICE rules followed are
 * the usual ones (a line starting with `*` is a comment, `+` continues the line before, `.` starts a
 * command; common practice, no source).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { Netlist } from '../../src/core/model/netlist.ts';
import { DEFAULT_TECHNOLOGY } from '../../src/core/model/technology.ts';
import { exportSpice } from '../../src/core/netlist-io/spiceExport.ts';
import { importSpice } from '../../src/core/netlist-io/spiceImport.ts';
import { hasControlCharacter, HOSTILE_NAMES } from '../fixtures/hostileNames.ts';
import { hostileNetlistArb } from './arbitraries.ts';

const expressionArb = fc.oneof(
  fc.constantFrom('!A', ' A & B ', 'x\n.control\nshell touch /tmp/pwned\n.endc', '"quoted"', ''),
  fc.string(),
);

/** Expected functions keyed by outputs, and now and then by a name that is not one. */
function withExpectations(netlist: Netlist) {
  return fc
    .tuple(
      fc.array(expressionArb, { minLength: 4, maxLength: 4 }),
      fc.option(fc.constantFrom(...HOSTILE_NAMES)),
    )
    .map(([texts, stray]) => {
      const keys = [...netlist.outputs.slice(0, 3), ...(stray === null ? [] : [stray])];
      const expectations: Record<string, string> = Object.create(null) as Record<string, string>;
      keys.forEach((k, i) => (expectations[k] = texts[i] as string));
      return { netlist, expectations };
    });
}

function reimport(text: string) {
  const result = importSpice(text, 'identity.sp');
  expect(result.failed).toEqual([]);
  expect(result.cells).toHaveLength(1);
  return result.cells[0]!;
}

describe('SPICE export of hostile designs', () => {
  it('reads back as the same netlist and expected functions', () => {
    fc.assert(
      fc.property(hostileNetlistArb.chain(withExpectations), ({ netlist, expectations }) => {
        const cell = reimport(exportSpice(netlist, DEFAULT_TECHNOLOGY, { expectations }));
        expect(cell.netlist).toEqual(netlist);
        expect({ ...cell.expectations }).toEqual({ ...expectations });
      }),
      { seed: 1616, numRuns: 400 },
    );
  });

  it('holds no statement but its own: models, one subcircuit, its elements, the end', () => {
    fc.assert(
      fc.property(hostileNetlistArb, (netlist) => {
        const tech = { ...DEFAULT_TECHNOLOGY, source: 'lab notes\n.control\nshell touch /tmp/pwned\n.endc' };
        const lines = exportSpice(netlist, tech).split('\n');
        expect(lines.some((l) => hasControlCharacter(l))).toBe(false);
        const statements = lines.filter((l) => l !== '' && !l.startsWith('*'));
        const kinds = statements.map(
          (l) => /^\.(model|subckt|ends|end)\b/.exec(l)?.[1] ?? l.charAt(0).toUpperCase(),
        );
        expect(kinds.filter((k) => k === 'subckt')).toHaveLength(1);
        expect(kinds.filter((k) => k === 'end')).toHaveLength(1);
        expect(kinds.at(-1)).toBe('end');
        const elements = kinds.filter((k) => /^[MRCDV]$/.test(k)).length;
        const held = netlist.rails.filter((r) => r.volts !== undefined).length;
        expect(elements).toBe(netlist.devices.length + held);
        expect(kinds.every((k) => /^(model|subckt|ends|end|[MRCDV])$/.test(k))).toBe(true);
      }),
      { seed: 1617, numRuns: 300 },
    );
  });

  it('lists every replaced name with its original as a JSON string', () => {
    const netlist: Netlist = {
      name: 'mid cell',
      devices: [
        { kind: 'nmos', name: 'N1', gate: 'mid node', drain: 'mid_node', source: 'GND', w: 1, l: 0.25 },
        { kind: 'nmos', name: 'N1', gate: 'a', drain: 'A', source: 'GND', w: 1, l: 0.25 },
      ],
      rails: [{ net: 'GND', role: 'ground' }],
      inputs: ['mid node', 'a'],
      outputs: ['mid_node', 'A', 'a'],
    };
    const text = exportSpice(netlist, DEFAULT_TECHNOLOGY);
    expect(text).toContain('* railwise: name cell mid_cell "mid cell"');
    expect(text).toContain('* railwise: name net mid_node_2 "mid node"');
    expect(text).toContain('* railwise: name net A_2 "A"');
    expect(text).toContain('* railwise: name device MN1 "N1"');
    expect(text).toContain('* railwise: name device MN1_2 "N1"');
    expect(text).toContain('* railwise: inputs mid_node_2 a');
    expect(text).toContain('* railwise: outputs mid_node A_2 a');
    expect(reimport(text).netlist).toEqual(netlist);
  });
});
