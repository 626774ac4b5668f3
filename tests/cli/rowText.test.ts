// Behaviour of our own command, not published values: no source applies.
/**
 * The text written for a sweep row without building the row must be, byte for byte, what
 * JSON.stringify writes for the row built: names JavaScript orders first (array indices), names a
 * plain object would treat specially, quotes and control characters, undriven inputs, every net.
 */
import { describe, expect, it } from 'vitest';
import { checkSweep } from '../../src/core/analysis/check.ts';
import { sweepRow } from '../../src/core/analysis/sweepColumns.ts';
import type { SweepColumns } from '../../src/core/analysis/report.ts';
import { circuit } from '../../src/core/model/builder.ts';
import { propertyOrder, SweepRowText } from '../../src/cli/rowText.ts';
import { vectorJson } from '../../src/cli/runCell.ts';

/** Inverters from hostile input names to hostile output names. */
function hostileCell() {
  const pins = [
    ['10', '2'],
    ['__proto__', 'constructor'],
    ['a"b', 'line\nbreak'],
    ['0', 'ω'],
  ] as const;
  let b = circuit('hostile').rails();
  for (const [input, output] of pins) {
    b = b
      .input(input)
      .output(output)
      .pmos(`P${input}`, { g: input, d: output, s: 'VDD', w: 2 })
      .nmos(`N${input}`, { g: input, d: output, s: 'GND' });
  }
  return b.build();
}

function expected(s: SweepColumns, i: number, indent: string): string {
  return JSON.stringify(vectorJson(sweepRow(s, i)), null, 2).replace(/\n/g, `\n${indent}`);
}

describe('a sweep row written from its columns', () => {
  it.each([
    [false, false],
    [true, false],
    [false, true],
    [true, true],
  ])('is what JSON.stringify writes for the row (all nets %s, undriven %s)', (allNets, undriven) => {
    const s = checkSweep(hostileCell(), { allNets, undrivenInputs: undriven }).sweep as SweepColumns;
    const text = new SweepRowText(s);
    // Driven rows are plain (written from the columns); undriven ones float (written through the row).
    expect(s.detail.filter((d) => d < 0).length).toBeGreaterThan(0);
    for (const indent of ['', '    ']) {
      for (let i = 0; i < s.count; i++) expect(text.text(s, i, indent)).toBe(expected(s, i, indent));
    }
  });

  it('lists array-index names first, in numeric order, then the rest as set (ECMA-262 §10.1.11.1)', () => {
    const names = ['b', '10', 'a', '2', '01', '4294967295'];
    const order = propertyOrder(names, [0, 1, 2, 3, 4, 5]).map((k) => names[k]);
    expect(order).toEqual(['2', '10', 'b', 'a', '01', '4294967295']);
    expect(Object.keys(Object.fromEntries(names.map((n) => [n, 0])))).toEqual(order);
  });
});
