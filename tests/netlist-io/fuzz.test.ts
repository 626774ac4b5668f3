// Robustness only, no published values: no source applies.
/**
 * docs/semantics.md §8: a pathological netlist never crashes the importer. Random lines built from SPICE-like
 * tokens either import or throw SpiceImportError with a line inside the file; nothing else escapes.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { importSpice, SpiceImportError } from '../../src/core/netlist-io/spiceImport.ts';
import { Tally } from '../fuzzTally.ts';

const token = fc.constantFrom(
  'M1',
  'm2',
  'R1',
  'C1',
  'D1',
  'V1',
  'X1',
  'Q1',
  'A',
  'Y',
  'vdd',
  'gnd',
  '0',
  'n1',
  'nch',
  'pch',
  'inv',
  'W=1u',
  'L=0.25u',
  'm=2',
  'ad=1p',
  '10k',
  '1f',
  '2.5',
  'DC',
  'PULSE(0',
  '1)',
  '$',
  ';',
  '=',
  '{w}',
  '.subckt',
  '.ends',
  '.model',
  'nmos',
  'pmos',
  '.global',
  '.end',
  '.tran',
  '.include',
  '+',
  '*',
  '* railwise: expect',
  '* railwise: inputs',
  'Y = !A',
  '',
);
const line = fc.array(token, { maxLength: 8 }).map((t) => t.join(' '));
const text = fc.array(line, { maxLength: 25 }).map((l) => l.join('\n'));

describe('importer fuzz', () => {
  it('imports or throws SpiceImportError naming a line of the file', () => {
    const tally = new Tally();
    fc.assert(
      fc.property(text, (t) => {
        try {
          importSpice(t, 'fuzz.sp');
          tally.add({ outcome: 'clean', why: '' }, t);
        } catch (e) {
          const lines = t.split('\n').length;
          const line = e instanceof SpiceImportError ? e.line : 0;
          const clear = line >= 1 && line <= Math.max(lines, 1);
          tally.add({ outcome: clear ? 'refusal' : 'bad', why: String(e) }, JSON.stringify(t));
          expect(e).toBeInstanceOf(SpiceImportError);
          expect(line).toBeGreaterThanOrEqual(1);
          expect(line).toBeLessThanOrEqual(Math.max(lines, 1));
        }
      }),
      { numRuns: 3000 },
    );
    tally.print('random netlists (importer)');
  });
});
