/**
 * Leakage through floating stacks: the undriven joints between off transistors settle where the
 * leakage currents balance. Series conductances add as 1/g = Σ 1/g_k (Kirchhoff; common practice, no
 * source); the leakage model itself is the project's own (I = ioffPerWidth · W · V_DS / VDD).
 */
import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { checkSweep } from '../../src/core/analysis/check.ts';
import type { Netlist } from '../../src/core/model/netlist.ts';
import { DEFAULT_TECHNOLOGY } from '../../src/core/model/technology.ts';
import { powerReport } from '../../src/core/power/powerReport.ts';
import { complementaryGate, type SpTree } from '../property/generators.ts';

const tech = DEFAULT_TECHNOLOGY;
const random = { frequency: 1e6, load: 0, activity: 'random' } as const;

/**
 * A 26-transistor complementary gate (7 inputs) that once ended in "LU matrix is singular": with
 * A=1 E=1 and the rest 0, its pull-up is a chain of floating joints, some reached from the off
 * devices only through conducting ones.
 */
const gate = JSON.parse(
  readFileSync(new URL('./fixtures/floating-stack-gate.json', import.meta.url), 'utf8'),
) as Netlist;

describe('leakage through a chain of floating stack joints', () => {
  it('the regression gate passes every vector and its power report completes', () => {
    expect(checkSweep(gate, { technology: tech }).summary.errors).toBe(0);
    const report = powerReport(gate, tech, random);
    expect(report.vectors).toHaveLength(128);
    expect(report.leakageWatts.every((w) => Number.isFinite(w) && w >= 0)).toBe(true);
  });

  it('A=1 E=1: VDD → 2g → joint → g → joint → g → joint → g → Y, so the chain leaks VDD² · g / 3.5', () => {
    // Off PMOS of W = 2 µm: g = ioffPerWidth · 2 / VDD. P20 ∥ P21 give 2g; P31, P35 and P38 give g each.
    const g = (tech.ioffPerWidth * 2) / tech.vdd;
    const report = powerReport(gate, tech, random);
    // Inputs A B D E G I J, the first most significant: A=1 E=1 is 0b1001000 = 72.
    expect(report.vectors[72]?.inputs).toMatchObject({ A: '1', B: '0', E: '1', J: '0' });
    const expected = (tech.vdd ** 2 * g) / (1 / 2 + 1 + 1 + 1);
    expect((report.leakageWatts[72] as number) / expected).toBeCloseTo(1, 9);
  });
});

describe('random complementary gates', () => {
  // Wide NOR-like gates over a few repeated inputs: their pull-up is a long series stack in which
  // runs of conducting devices sit between off ones, the pattern that once broke the solve.
  const leaves = fc.array(fc.constantFrom('A', 'B', 'C', 'D'), { minLength: 4, maxLength: 10 });
  const parallel = (names: readonly string[]): SpTree =>
    names
      .map((input): SpTree => ({ kind: 'leaf', input }))
      .reduce((left, right) => ({ kind: 'parallel', left, right }));

  it('always give a finite, non-negative leakage for every vector', () => {
    fc.assert(
      fc.property(leaves, (names) => {
        const inputs = [...new Set(names)].sort();
        const report = powerReport(complementaryGate(parallel(names), inputs), tech, random);
        return report.leakageWatts.every((w) => Number.isFinite(w) && w >= 0);
      }),
      { seed: 16, numRuns: 100 },
    );
  });
});
