import { describe, expect, it } from 'vitest';
import { engineering, formatCurrent, formatPower, formatVolts } from '../../src/core/view/format.ts';

describe('engineering notation', () => {
  // SI prefixes k, m, µ, n, p, f: BIPM, The International System of Units, 9th ed. (2019), table 7.
  it.each([
    [1e-4, 'A', '100 µA'],
    [4.23e-5, 'A', '42.3 µA'],
    [2.5e-9, 'A', '2.5 nA'],
    [3.3e3, 'Ω', '3.3 kΩ'],
    [1e-15, 'F', '1 fF'],
    [-0.02, 'A', '-20 mA'],
  ])('%d %s → %s', (value, unit, text) => {
    expect(engineering(value, unit)).toBe(text);
  });

  it('rounds up into the next prefix rather than printing 1000', () => {
    expect(formatCurrent(0.99996e-3)).toBe('1 mA');
  });

  it('prints zero and unknown plainly', () => {
    expect(formatPower(0)).toBe('0 W');
    expect(formatCurrent(NaN)).toBe('?');
    expect(formatVolts(null)).toBe('? V');
  });

  // Resistive divider, 10 kΩ pull-up to 5 V into 40 kΩ: 4.00 V, 0.1 mA, 0.5 mW (common practice, no source;
  // Ohm's law arithmetic).
  it('prints the divider figures a designer checks by hand', () => {
    const i = 5 / (10e3 + 40e3);
    expect(formatVolts(i * 40e3)).toBe('4.00 V');
    expect(formatCurrent(i)).toBe('100 µA');
    expect(formatPower(5 * i)).toBe('500 µW');
  });
});
