/**
 * Properties of the level-1 DC solver: the switching threshold against the closed form, monotonic
 * transfer curves of static CMOS gates, and random netlists that never crash it or put a net outside
 * its sources' range.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { compile } from '../../src/core/compile/compile.ts';
import { DcSolver, sourcesFor } from '../../src/core/dc/operatingPoint.ts';
import { transferCurves } from '../../src/core/dc/transfer.ts';
import { circuit } from '../../src/core/model/builder.ts';
import type { Netlist } from '../../src/core/model/netlist.ts';
import { DEFAULT_TECHNOLOGY } from '../../src/core/model/technology.ts';
import { squareLaw } from '../dc/helpers.ts';
import { complementaryGate, randomNetlist, spTree } from './generators.ts';

const size = (min: number, max: number) => fc.double({ min, max, noNaN: true });

describe('switching threshold of any inverter', () => {
  // VM = (VTn + r(VDD − |VTp|)) / (1 + r), r = √(kp/kn), both devices saturated at VM: Weste &
  // Harris, CMOS VLSI Design, 4th ed. (2011), example 2.18 form. Square law: λ = 0, no body effect.
  it('equals the closed form within 1 mV', () => {
    fc.assert(
      fc.property(
        fc.record({
          vdd: size(1, 5),
          vtn: size(0.2, 0.8),
          vtp: size(0.2, 0.8),
          kpn: size(50e-6, 300e-6),
          kpp: size(20e-6, 150e-6),
          wn: size(0.3, 20),
          wp: size(0.3, 20),
          ln: size(0.25, 2),
          lp: size(0.25, 2),
        }),
        (p) => {
          fc.pre(p.vtn + p.vtp < p.vdd - 0.2);
          const tech = squareLaw({ vdd: p.vdd, vtn: p.vtn, vtp: p.vtp, kpn: p.kpn, kpp: p.kpp });
          const inv = circuit('inv')
            .rails()
            .input('A')
            .output('Y')
            .pmos('P1', { g: 'A', d: 'Y', s: 'VDD', w: p.wp, l: p.lp })
            .nmos('N1', { g: 'A', d: 'Y', s: 'GND', w: p.wn, l: p.ln })
            .build();
          const r = Math.sqrt((p.kpp * p.wp * p.ln) / (p.kpn * p.wn * p.lp));
          const closed = (p.vtn + r * (p.vdd - p.vtp)) / (1 + r);
          const vm = transferCurves(inv, tech, { input: 'A', points: 41 }).curves['Y']?.vm;
          expect(Math.abs((vm as number) - closed)).toBeLessThan(1e-3);
        },
      ),
      { numRuns: 40 },
    );
  });
});

/** A gate with every device's width scaled by its own factor. */
function resized(netlist: Netlist, factors: readonly number[]): Netlist {
  const devices = netlist.devices.map((d, i) =>
    d.kind === 'nmos' || d.kind === 'pmos' ? { ...d, w: d.w * (factors[i % factors.length] ?? 1) } : d,
  );
  return { ...netlist, devices };
}

describe('static CMOS transfer curves', () => {
  const inputs = ['A', 'B', 'C'];
  it('never rise as the input rises (complementary gates, any sizing, body effect and λ on)', () => {
    fc.assert(
      fc.property(
        spTree(inputs, 3),
        fc.array(size(0.3, 4), { minLength: 8, maxLength: 8 }),
        fc.constantFrom(...inputs),
        (tree, factors, input) => {
          const gate = resized(complementaryGate(tree, inputs), factors);
          const y = transferCurves(gate, DEFAULT_TECHNOLOGY, { input, points: 41 }).curves['Y'];
          const v = (y?.points ?? []).map(([, out]) => out as number);
          expect(v.every((out) => Number.isFinite(out))).toBe(true);
          // Within 1 µV: GMIN (1 pS) moves a net held through a weak path by nanovolts.
          for (let k = 1; k < v.length; k++) expect(v[k]).toBeLessThanOrEqual((v[k - 1] as number) + 1e-6);
        },
      ),
      { numRuns: 40 },
    );
  });
});

describe('random netlists', () => {
  // No net of a network of channels and resistors can sit outside the range of its fixed voltages:
  // every current flows from the higher end of a channel to the lower (common practice, no source).
  it('never crash the DC solver, and every voltage found lies between 0 and VDD', () => {
    fc.assert(
      fc.property(
        randomNetlist(),
        fc.constantFrom('0', '1', 'X', 'Z'),
        fc.constantFrom('0', '1'),
        (netlist, a, b) => {
          const c = compile(netlist, DEFAULT_TECHNOLOGY);
          const point = new DcSolver(c).solve(sourcesFor(c, { A: a, B: b }));
          for (const v of point.volts) if (!Number.isNaN(v)) expect(v >= -1e-9 && v <= 2.5 + 1e-9).toBe(true);
          expect(Number.isNaN(point.supplyCurrent) || Number.isFinite(point.supplyCurrent)).toBe(true);
        },
      ),
      { numRuns: 200 },
    );
  });
});
