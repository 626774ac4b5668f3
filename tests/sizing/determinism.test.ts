import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { Netlist } from '../../src/core/model/netlist.ts';
import { powerReport } from '../../src/core/power/powerReport.ts';
import { sizingReport } from '../../src/core/sizing/sizingReport.ts';
import { aoi21, nand, nor, UNIT_RC_TECH } from './cells.ts';

/** Numbers rounded to 10 significant figures: sums in another order may differ in the last bits. */
function rounded(value: unknown): unknown {
  if (typeof value === 'number') return Number.isFinite(value) ? Number(value.toPrecision(10)) : value;
  if (Array.isArray(value)) return value.map(rounded);
  if (value !== null && typeof value === 'object') {
    return Object.fromEntries(Object.entries(value).map(([k, v]) => [k, rounded(v)]));
  }
  return value;
}

function permuted(netlist: Netlist, order: readonly number[]): Netlist {
  const keyed = netlist.devices.map((d, i) => ({ d, key: order[i % order.length]! * 1000 + i }));
  return { ...netlist, devices: keyed.sort((a, b) => a.key - b.key).map((k) => k.d) };
}

describe('results do not depend on the order devices are listed in (docs/semantics.md §8)', () => {
  const cells = [nand(3), nor(2), aoi21(1.5)];
  const orders = fc.array(fc.integer({ min: 0, max: 50 }), { minLength: 1, maxLength: 8 });

  it('sizing: same figures, paths and worst-case configurations', () => {
    fc.assert(
      fc.property(fc.constantFrom(...cells), orders, (cell, order) => {
        const a = sizingReport(cell, UNIT_RC_TECH, { load: 3e-15 });
        const b = sizingReport(permuted(cell, order), UNIT_RC_TECH, { load: 3e-15 });
        expect(rounded(b)).toEqual(rounded(a));
      }),
      { numRuns: 40 },
    );
  });

  it('power: same static power per vector, activity and capacitance per net', () => {
    fc.assert(
      fc.property(fc.constantFrom(...cells), orders, (cell, order) => {
        const options = { frequency: 1e8, activity: 'random', load: 3e-15 } as const;
        const a = powerReport(cell, UNIT_RC_TECH, options);
        const b = powerReport(permuted(cell, order), UNIT_RC_TECH, options);
        expect(rounded(b.staticWatts)).toEqual(rounded(a.staticWatts));
        expect(rounded(b.activity)).toEqual(rounded(a.activity));
        expect(rounded(b.capacitance)).toEqual(rounded(a.capacitance));
        expect(rounded(b.dynamicWatts)).toEqual(rounded(a.dynamicWatts));
      }),
      { numRuns: 40 },
    );
  });
});
