import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  evaluateMos,
  G_BULK,
  G_DRAIN,
  G_GATE,
  G_SOURCE,
  ID,
  mosOutput,
  threshold,
  type Level1Device,
} from '../../src/core/dc/level1.ts';

/** An NMOS with no body effect and no channel-length modulation, β = k'·W/L. */
function plain(kPrime: number, wOverL: number, vt0: number): Level1Device {
  return { polarity: 1, beta: kPrime * wOverL, vt0, gamma: 0, phi: 0.6, lambda: 0 };
}

function current(d: Level1Device, vd: number, vg: number, vs: number, vb = 0): number {
  const out = mosOutput();
  evaluateMos(d, vd, vg, vs, vb, out);
  return out[ID]!;
}

describe('Shichman–Hodges drain current', () => {
  // Source: H. Shichman, D. A. Hodges, IEEE J. Solid-State Circuits 3(3), 1968 (the level-1 equations);
  // the numbers are derived here: k' 167.2 µA/V², W/L 10, VT 0.7 V, VGS 2.0 V.
  const d = plain(167.2e-6, 10, 0.7);
  it('saturation: (k′/2)(W/L)(VGS − VT)² = 1.413 mA', () => {
    const expected = 0.5 * 167.2e-6 * 10 * (2.0 - 0.7) ** 2;
    expect(expected).toBeCloseTo(1.413e-3, 6);
    expect(current(d, 2.5, 2.0, 0)).toBeCloseTo(expected, 12);
  });
  it('linear at VDS 0.5 V: k′(W/L)[(VGS − VT)VDS − VDS²/2] = 0.878 mA', () => {
    const expected = 167.2e-6 * 10 * ((2.0 - 0.7) * 0.5 - 0.5 ** 2 / 2);
    expect(expected).toBeCloseTo(0.878e-3, 6);
    expect(current(d, 0.5, 2.0, 0)).toBeCloseTo(expected, 12);
  });
  it('cut-off: no current at or below threshold', () => {
    expect(current(d, 2.5, 0.7, 0)).toBe(0);
    expect(current(d, 2.5, 0.3, 0)).toBe(0);
  });
  it('channel-length modulation multiplies by (1 + λ·VDS)', () => {
    const withLambda = { ...d, lambda: 0.1 };
    expect(current(withLambda, 2.0, 2.0, 0)).toBeCloseTo(current(d, 2.0, 2.0, 0) * 1.2, 12);
  });
  it('is symmetric: swapping drain and source reverses the current', () => {
    expect(current(d, 0, 2.0, 0.5)).toBeCloseTo(-current(d, 0.5, 2.0, 0), 12);
    expect(current(d, 0, 2.0, 0.5)).toBeLessThan(0);
  });
  it('a PMOS is the NMOS on negated voltages: source at 2.5 V, gate at 0.5 V, drain at 0', () => {
    const p: Level1Device = { ...d, polarity: -1 };
    // VSG 2.0 V, VSD 2.5 V: saturated, the same magnitude as the NMOS, flowing from source to drain.
    expect(current(p, 0, 0.5, 2.5, 2.5)).toBeCloseTo(-0.5 * 167.2e-6 * 10 * 1.3 ** 2, 12);
  });
});

describe('body effect', () => {
  // VT = VT0 + γ(√(2φF + VSB) − √(2φF)): Rabaey, Chandrakasan, Nikolić, Digital Integrated Circuits,
  // 2nd ed. (2003), eq. 3.28 form; 0.25 µm values VT0 0.43 V, γ 0.4 V^½, 2φF 0.6 V (from memory).
  const d: Level1Device = { polarity: 1, beta: 115e-6, vt0: 0.43, gamma: 0.4, phi: 0.6, lambda: 0 };
  it('raises the threshold with source–bulk bias', () => {
    expect(threshold(d, 0)).toBeCloseTo(0.43, 12);
    expect(threshold(d, 1.765)).toBeCloseTo(0.43 + 0.4 * (Math.sqrt(2.365) - Math.sqrt(0.6)), 12);
    expect(threshold(d, 1.765)).toBeCloseTo(0.735, 3);
  });
  it('continues smoothly into forward bias', () => {
    expect(threshold(d, -0.01)).toBeLessThan(0.43);
    expect(threshold(d, -10)).toBe(0.43 - 0.4 * Math.sqrt(0.6));
  });
});

describe('derivatives for Newton (properties)', () => {
  const device = fc.record({
    polarity: fc.constantFrom(1 as const, -1 as const),
    beta: fc.double({ min: 1e-6, max: 1e-3, noNaN: true }),
    vt0: fc.double({ min: 0.2, max: 0.9, noNaN: true }),
    gamma: fc.double({ min: 0, max: 0.6, noNaN: true }),
    phi: fc.double({ min: 0.5, max: 0.9, noNaN: true }),
    lambda: fc.double({ min: 0, max: 0.2, noNaN: true }),
  });
  const volts = fc.double({ min: -0.5, max: 3.5, noNaN: true });

  it('match central differences of the current', () => {
    fc.assert(
      fc.property(device, volts, volts, volts, volts, (d, vd, vg, vs, vb) => {
        const out = mosOutput();
        evaluateMos(d, vd, vg, vs, vb, out);
        const h = 1e-6;
        const v = [vd, vg, vs, vb];
        [G_DRAIN, G_GATE, G_SOURCE, G_BULK].forEach((slot, t) => {
          const up = [...v];
          const down = [...v];
          up[t]! += h;
          down[t]! -= h;
          const numeric =
            (current(d, up[0]!, up[1]!, up[2]!, up[3]) - current(d, down[0]!, down[1]!, down[2]!, down[3])) /
            (2 * h);
          // Region boundaries are C¹ (value and slope agree), so the difference quotient agrees there too.
          expect(Math.abs(numeric - out[slot]!)).toBeLessThan(
            1e-6 * (1 + Math.abs(out[slot]!)) + 1e-3 * d.beta,
          );
        });
      }),
    );
  });

  it('sum to zero: moving every terminal together changes nothing', () => {
    fc.assert(
      fc.property(device, volts, volts, volts, volts, (d, vd, vg, vs, vb) => {
        const out = mosOutput();
        evaluateMos(d, vd, vg, vs, vb, out);
        const sum = out[G_DRAIN]! + out[G_GATE]! + out[G_SOURCE]! + out[G_BULK]!;
        expect(Math.abs(sum)).toBeLessThan(1e-12 * (1 + Math.abs(out[G_DRAIN]!) + Math.abs(out[G_GATE]!)));
      }),
    );
  });

  it('current flows from the higher channel end to the lower', () => {
    fc.assert(
      fc.property(device, volts, volts, volts, volts, (d, vd, vg, vs, vb) => {
        expect(current(d, vd, vg, vs, vb) * (vd - vs)).toBeGreaterThanOrEqual(0);
      }),
    );
  });
});
