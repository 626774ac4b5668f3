// SPICE scale factors (k = 1e3, meg = 1e6, m = 1e-3, f = 1e-15): common practice, no source.
import { describe, expect, it } from 'vitest';
import { fieldText, readField, fieldsFor } from '../../src/app/fieldRules.ts';
import { drawnInverter, part } from '../sheet/fixtures.ts';

describe('properties form rules', () => {
  const sheet = drawnInverter();
  const n1 = sheet.parts[1]!;

  it('reads W and L as µm and values with SI suffixes (SPICE convention: k = 1e3, f = 1e-15)', () => {
    expect(readField('w', '0.5', n1, sheet)).toEqual({ ok: true, value: 0.5 });
    expect(readField('ohms', '4.7k', part('r', 'resistor', 'R1', 0, 0), sheet)).toEqual({
      ok: true,
      value: 4700,
    });
    const c = readField('farads', '12f', part('c', 'capacitor', 'C1', 0, 0), sheet);
    expect(c.ok && (c.value as number)).toBeCloseTo(12e-15, 30);
  });

  it('refuses zero, negative, empty and unreadable values with a reason', () => {
    for (const text of ['0', '-1', '', 'wide']) {
      const r = readField('w', text, n1, sheet);
      expect(r.ok).toBe(false);
    }
  });

  it('refuses a device name used by another device, but not a repeated net label', () => {
    expect(readField('name', 'P1', n1, sheet)).toEqual({
      ok: false,
      error: 'P1 is already used by another device',
    });
    expect(readField('name', 'N1', n1, sheet)).toEqual({ ok: true, value: 'N1' });
    const label = part('l', 'label', 'x', 0, 0);
    expect(readField('name', 'A', label, { ...sheet, parts: [...sheet.parts, label] })).toEqual({
      ok: true,
      value: 'A',
    });
    expect(readField('name', 'two words', label, sheet).ok).toBe(false);
  });

  it('shows the fields each kind has', () => {
    expect(fieldsFor(n1).map((f) => f.key)).toEqual(['name', 'w', 'l']);
    expect(fieldsFor(part('g', 'gnd', 'GND', 0, 0)).map((f) => f.key)).toEqual(['name']);
  });

  it('shows values that read back unchanged, so leaving a field untouched never edits the part', () => {
    for (const ohms of [1e6, 4712.3, 20e3, 0.5]) {
      const r = { ...part('r', 'resistor', 'R1', 0, 0), ohms };
      expect(readField('ohms', fieldText(r, 'ohms'), r, sheet)).toEqual({ ok: true, value: ohms });
    }
    const c = { ...part('c', 'capacitor', 'C1', 0, 0), farads: 12.5e-15 };
    expect(fieldText(c, 'farads')).toBe('12.5f');
    expect(readField('farads', fieldText(c, 'farads'), c, sheet)).toEqual({ ok: true, value: 12.5e-15 });
  });
});
