/**
 * The device part specs one by one: label, fields, defaults, SVG text and what each contributes to
 * the netlist. SI prefixes (k = 10^3, f = 10^-15) are those of the BIPM SI Brochure, 9th edition
 * (2019), Table 7 (from memory); W/L written in µm as "W/L" is common practice, no source.
 */
import { describe, expect, it } from 'vitest';
import { partSpec } from '../../../src/core/sheet/parts/index.ts';
import { part } from '../fixtures.ts';
import { canvasTexts, devicesOf, svgTexts } from './partSheets.ts';

const fieldsOf = (kind: Parameters<typeof partSpec>[0]) =>
  partSpec(kind).fields.map((f) => `${f.key}: ${f.label} (${f.quantity.unit})`);

describe('NMOS and PMOS', () => {
  it('default to W 1 µm and 2 µm (PMOS twice the NMOS, common practice) at L 0.25 µm', () => {
    expect(partSpec('nmos').defaults).toEqual({ w: 1, l: 0.25 });
    expect(partSpec('pmos').defaults).toEqual({ w: 2, l: 0.25 });
    expect(fieldsOf('nmos')).toEqual(['w: W (µm)', 'l: L (µm)']);
  });

  it('label their size W/L in µm, the same on the canvas and in the SVG export', () => {
    const n = part('n', 'nmos', 'N1', 0, 0, { w: 1.5, l: 0.18 });
    expect(partSpec('nmos').valueLabel(n)).toBe('1.5/0.18');
    expect(canvasTexts(n)).toEqual(['N1', '1.5/0.18']);
    expect(svgTexts(n)).toEqual(['N1', '1.5/0.18']);
  });

  it('contribute a transistor with gate, drain and source on their pins', () => {
    expect(devicesOf(part('p', 'pmos', 'P7', 0, 0))).toEqual([
      { kind: 'pmos', name: 'P7', gate: 'net1', drain: 'net3', source: 'net2', w: 2, l: 0.25 },
    ]);
  });
});

describe('resistor', () => {
  it('defaults to 10 kΩ and edits its resistance with SPICE suffixes', () => {
    expect(partSpec('resistor').defaults).toEqual({ ohms: 10e3 });
    expect(fieldsOf('resistor')).toEqual(['ohms: Resistance (Ω)']);
    expect(partSpec('resistor').fields[0]!.quantity.read('4.7k')).toEqual({ ok: true, value: 4700 });
  });

  it('labels 10 000 Ω as 10 kΩ on the canvas and in the SVG export alike', () => {
    const r = part('r', 'resistor', 'R1', 0, 0);
    expect(partSpec('resistor').valueLabel(r)).toBe('10 kΩ');
    expect(canvasTexts(r)).toEqual(['R1', '10 kΩ']);
    expect(svgTexts(r)).toEqual(['R1', '10 kΩ']);
    expect(svgTexts(part('r', 'resistor', 'R1', 0, 0, { ohms: 1e6 }))).toEqual(['R1', '1 MΩ']);
  });

  it('contributes a resistor between its two ends', () => {
    expect(devicesOf(part('r', 'resistor', 'R2', 0, 0, { ohms: 4700 }))).toEqual([
      { kind: 'resistor', name: 'R2', a: 'net1', b: 'net2', ohms: 4700 },
    ]);
  });
});

describe('capacitor', () => {
  it('defaults to 10 fF and labels it so on the canvas and in the SVG export', () => {
    const c = part('c', 'capacitor', 'C1', 0, 0);
    expect(partSpec('capacitor').defaults).toEqual({ farads: 10e-15 });
    expect(fieldsOf('capacitor')).toEqual(['farads: Capacitance (F)']);
    expect(canvasTexts(c)).toEqual(['C1', '10 fF']);
    expect(svgTexts(c)).toEqual(['C1', '10 fF']);
  });

  it('contributes a capacitor between its two plates', () => {
    expect(devicesOf(part('c', 'capacitor', 'C3', 0, 0, { farads: 2e-12 }))).toEqual([
      { kind: 'capacitor', name: 'C3', a: 'net1', b: 'net2', farads: 2e-12 },
    ]);
  });
});
