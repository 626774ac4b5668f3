/**
 * The Liberty reader against hand-written files. The syntax checked here is that of the Liberty
 * format's public reference manual (group, simple and complex attributes, `/* *\/` comments, quoted
 * strings, a backslash continuing a line; the `function` attribute's operators and their ranking:
 * inversion first, then XOR, then AND, then OR), all from memory.
 */
import { describe, expect, it } from 'vitest';
import { readLibertyGroups } from '../../src/core/liberty/libertyGroups.ts';
import { LibertyError } from '../../src/core/liberty/libertyLexer.ts';
import { readLiberty } from '../../src/core/liberty/libertyCells.ts';
import {
  parseLibertyFunction,
  toExpectation,
  LibertyFunctionError,
} from '../../src/core/liberty/libertyFunction.ts';
import { evaluateExpression } from '../../src/core/expect/evaluate.ts';
import { parseExpression } from '../../src/core/expect/parse.ts';

const LIB = `/* a made-up library for the reader */
library (harbour_cells) {
  delay_model : table_lookup ;
  voltage_map (VPWR, 1.8) ;
  voltage_map (VGND, 0) ;
  capacitive_load_unit (1, pf) ;
  // a line comment, as some writers use
  cell ("hb_inv") {
    area : 1.2 ;
    pg_pin (VPWR) { pg_type : primary_power ; voltage_name : "VPWR" ; }
    pg_pin (VGND) { pg_type : primary_ground ; voltage_name : VGND ; }
    pin (A) { direction : input ; capacitance : 0.002 ; }
    pin (Y) {
      direction : output ;
      function : "A'" ;
      timing () {
        related_pin : "A" ;
        cell_rise (tmpl) { index_1 ("0.1, 0.2", \\
                                    "0.3") ; values ("1, 2") ; }
      }
    }
  }
  cell (hb_ebuf) {
    pin (A, TE_B) { direction : input ; }
    pin (Z) { direction : output ; function : "A" ; three_state : "TE_B" ; }
  }
  cell (hb_dff) {
    ff (IQ, IQ_N) { next_state : "D" ; clocked_on : "CLK" ; }
    pin (D) { direction : input ; }
    pin (CLK) { direction : input ; }
    pin (Q) { direction : output ; function : "IQ" ; }
  }
}
`;

describe('group syntax', () => {
  it('reads groups, simple and complex attributes, comments, strings and continued lines', () => {
    const [library] = readLibertyGroups(LIB);
    expect(library).toMatchObject({ type: 'library', names: ['harbour_cells'], line: 2 });
    expect(library?.attributes.map((a) => [a.name, a.values])).toEqual([
      ['delay_model', ['table_lookup']],
      ['voltage_map', ['VPWR', '1.8']],
      ['voltage_map', ['VGND', '0']],
      ['capacitive_load_unit', ['1', 'pf']],
    ]);
    const timing = library?.groups[0]?.groups[3]?.groups[0];
    expect(timing?.groups[0]?.attributes[0]).toMatchObject({
      name: 'index_1',
      values: ['0.1, 0.2', '0.3'],
      line: 18,
    });
  });

  it('takes an attribute whose semicolon is missing at the end of its line', () => {
    const [lib] = readLibertyGroups('library (x) {\n  a : 1\n  b : "two"\n  cell (c) { }\n}');
    expect(lib?.attributes.map((a) => [a.name, a.values[0]])).toEqual([
      ['a', '1'],
      ['b', 'two'],
    ]);
    expect(lib?.groups.map((g) => g.type)).toEqual(['cell']);
  });

  it.each([
    ['library (x) {\n  cell (c) {\n', /line 2: group cell is never closed/],
    ['library (x) {\n}\n}', /line 3: a "}" closes no group/],
    ['library (x) {\n  a : "open\n}', /line 2: a quoted string is never closed/],
    ['library (x) {\n /* never closed', /line 2: a \/\* comment is never closed/],
    ['library (x) {\n  cell c { }\n}', /line 2: "cell" is followed by neither ":" nor "\("/],
  ])('refuses a broken file with its line: %j', (text, message) => {
    expect(() => readLibertyGroups(text)).toThrow(LibertyError);
    expect(() => readLibertyGroups(text)).toThrow(message);
  });
});

describe('cells', () => {
  it('reads pins, functions, three-state conditions, power pins and sequential groups', () => {
    const lib = readLiberty(LIB);
    expect(lib.cells.map((c) => [c.name, c.sequential])).toEqual([
      ['hb_inv', null],
      ['hb_ebuf', null],
      ['hb_dff', 'ff'],
    ]);
    expect(lib.cells[0]?.powerPins).toEqual([
      { name: 'VPWR', role: 'supply' },
      { name: 'VGND', role: 'ground' },
    ]);
    expect(lib.cells[1]?.pins).toEqual([
      { name: 'A', direction: 'input', line: 24 },
      { name: 'TE_B', direction: 'input', line: 24 },
      { name: 'Z', direction: 'output', function: 'A', threeState: 'TE_B', line: 25 },
    ]);
  });
});

/** Every 0/1 assignment of the names, evaluated through our own expected-function syntax. */
function truthTable(fn: string, names: readonly string[]): string {
  const text = toExpectation(parseLibertyFunction(fn), (n) => n);
  const expr = parseExpression(text, names);
  const rows: string[] = [];
  for (let v = 0; v < 1 << names.length; v++) {
    const inputs = Object.fromEntries(
      names.map((n, i) => [n, (v >> (names.length - 1 - i)) & 1 ? '1' : '0'] as const),
    );
    rows.push(evaluateExpression(expr, inputs));
  }
  return rows.join('');
}

describe('function expressions', () => {
  it.each([
    ['!A', ['A'], '10'],
    ["A'", ['A'], '10'],
    ['A & B', ['A', 'B'], '0001'],
    ['A * B', ['A', 'B'], '0001'],
    ['A B', ['A', 'B'], '0001'],
    ['A | B', ['A', 'B'], '0111'],
    ['A + B', ['A', 'B'], '0111'],
    ['A ^ B', ['A', 'B'], '0110'],
    ["(A B)'", ['A', 'B'], '1110'],
    ['1', [], '1'],
    ['0', [], '0'],
    // AND before OR: A + (B C)
    ['A + B C', ['A', 'B', 'C'], '00011111'],
    // XOR before AND: A (B ^ C), which our own syntax would read the other way
    ['A & B ^ C', ['A', 'B', 'C'], '00000110'],
    ['A ^ B & C', ['A', 'B', 'C'], '00010100'],
    // inversion before everything: (!A) & B
    ['!A B', ['A', 'B'], '0100'],
    ["A' + B'", ['A', 'B'], '1110'],
    ['(!((A1 A2) + B1))', ['A1', 'A2', 'B1'], '10101000'],
  ])('%s', (fn, names, table) => {
    expect(truthTable(fn, names)).toBe(table);
  });

  it.each([
    ['A +', /the function ends too early at column 4/],
    ['(A', /a '\(' is never closed at column 1/],
    ['A)', /a '\)' without its '\(' at column 2/],
    ['A % B', /unexpected character '%' at column 3/],
    ['', /empty function/],
  ])('refuses %j with the column', (fn, message) => {
    expect(() => parseLibertyFunction(fn)).toThrow(LibertyFunctionError);
    expect(() => parseLibertyFunction(fn)).toThrow(message);
  });

  it('reads 5,000 nested parentheses without recursion', () => {
    const fn = `${'('.repeat(5000)}A${')'.repeat(5000)}`;
    expect(parseLibertyFunction(fn)).toEqual({ kind: 'name', name: 'A' });
  });
});
