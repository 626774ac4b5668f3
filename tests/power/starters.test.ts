import { describe, expect, it } from 'vitest';
import { powerReport } from '../../src/core/power/powerReport.ts';
import { sizingReport } from '../../src/core/sizing/sizingReport.ts';
import { STARTERS } from '../../src/core/starters/index.ts';

const options = { frequency: 100e6, activity: 'random', load: 10e-15 } as const;

describe('power and sizing over every starter cell', () => {
  it('has starter cells to check, some of them with stored state and a sequence', () => {
    expect(STARTERS.length).toBeGreaterThanOrEqual(10);
    expect(STARTERS.filter((s) => s.design.sequences.length > 0).length).toBeGreaterThan(0);
  });

  for (const { id, design } of STARTERS) {
    it(`${id}: figures within their physical bounds`, () => {
      const power = powerReport(design.netlist, design.technology, options);
      // α = p0·p1 with p0 + p1 ≤ 1 never exceeds 1/4 (arithmetic–geometric mean inequality).
      for (const a of Object.values(power.activity)) expect(a).toBeGreaterThanOrEqual(0);
      for (const a of Object.values(power.activity)) expect(a).toBeLessThanOrEqual(0.25 + 1e-12);
      for (const w of power.staticWatts) expect(w).toBeGreaterThanOrEqual(0);
      expect(power.dynamicWatts).toBeGreaterThan(0);
      const sizing = sizingReport(design.netlist, design.technology, { load: 10e-15 });
      for (const out of sizing.outputs) {
        for (const g of Object.values(out.logicalEffort)) if (g !== null) expect(g).toBeGreaterThan(0);
        if (out.rise) expect(out.rise.seconds).toBeGreaterThan(0);
        if (out.fall) expect(out.fall.seconds).toBeGreaterThan(0);
      }
    });
  }

  it('complementary gates draw no DC current in any vector; ratioed ones do in some', () => {
    // A static CMOS gate never has its pull-up and pull-down on together; a ratioed load conducts
    // whenever the pull-down does (common practice, no source).
    const dcOf = (id: string): number[] => {
      const { design } = STARTERS.find((s) => s.id === id) ?? STARTERS[0]!;
      return powerReport(design.netlist, design.technology, options).vectors.map((v) => v.dcWatts);
    };
    for (const id of ['inverter', 'nand2', 'nor2', 'aoi21', 'oai21']) expect(Math.max(...dcOf(id))).toBe(0);
    for (const id of ['resistor-load-inverter', 'ratioed-nor2'])
      expect(Math.max(...dcOf(id))).toBeGreaterThan(0);
  });

  it('sequences of the stateful starters give activities of at most one rise per step change', () => {
    const stateful = STARTERS.filter((s) => s.design.sequences.length > 0);
    expect(stateful.length).toBeGreaterThan(0);
    for (const { design } of stateful) {
      const sequence = design.sequences[0]!.steps;
      const power = powerReport(
        design.netlist,
        design.technology,
        { ...options, activity: 'sequence' },
        { sequence },
      );
      for (const a of Object.values(power.activity)) expect(a).toBeLessThanOrEqual(1);
      expect(power.vectors).toHaveLength(sequence.length);
    }
  });
});
