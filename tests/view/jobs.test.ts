import { describe, expect, it } from 'vitest';
import { SweepLimitError } from '../../src/core/analysis/check.ts';
import { DEFAULT_TECHNOLOGY } from '../../src/core/model/technology.ts';
import { levelAt, levelStrips } from '../../src/core/view/levelStrip.ts';
import { vectorRows } from '../../src/core/view/vectorTable.ts';
import { runJob as runAnyJob, usableExpectations } from '../../src/worker/jobs.ts';
import type { CheckResult, SequenceJob, SweepJob } from '../../src/worker/protocol.ts';
import { heldSteps } from '../../src/core/view/sequenceEdit.ts';
import { jobSize } from '../../src/worker/protocol.ts';
import {
  RESISTOR_LOAD_OHMS,
  design,
  nand2,
  nand2MissingPullUp,
  nandLatch,
  resistorLoadInverter,
} from './circuits.ts';

/** The check jobs under test always answer with a check result. */
function runJob(job: SweepJob | SequenceJob, onProgress?: Parameters<typeof runAnyJob>[1]): CheckResult {
  const result = runAnyJob(job, onProgress);
  if (result.kind === 'power') throw new Error('expected a check result');
  return result;
}

describe('sweep job', () => {
  // Resistor-load inverter with A = 1: the NMOS acts as its on-resistance Rn·L/W = 13 kΩ · 0.25 = 3.25 kΩ
  // (RCN 2nd ed., table 3.3, from memory), in series with the 40 kΩ load: I = 2.5 V / 43.25 kΩ = 57.8 µA
  // and P = VDD·I = 145 µW (Ohm's law; common practice, no source).
  it('reports the current of the vector that draws it', () => {
    const result = runJob({ kind: 'sweep', revision: 7, design: design(resistorLoadInverter, { Y: '!A' }) });
    expect(result.revision).toBe(7);
    const [low, high] = vectorRows(result.report);
    const ron = DEFAULT_TECHNOLOGY.rn * (0.25 / 1);
    const amps = 2.5 / (RESISTOR_LOAD_OHMS + ron);
    expect(high.supplyCurrent).toBeCloseTo(amps, 9);
    expect(high.staticPower).toBeCloseTo(2.5 * amps, 8);
    expect(high.kinds).toContain('static-current');
    expect(high.outputs).toEqual({ Y: '0' });
    expect(low.supplyCurrent).toBe(0);
    expect(low.outputs).toEqual({ Y: '1' });
  });

  // A NAND2 needs a parallel PMOS per input; without the one on B, A = 1, B = 0 leaves Y with no
  // path to either rail (series-parallel duality, common practice, no source).
  it('finds the floating vector of a NAND2 with a missing pull-up, and nothing in the whole cell', () => {
    const broken = vectorRows(
      runJob({ kind: 'sweep', revision: 1, design: design(nand2MissingPullUp, { Y: '!(A & B)' }) }).report,
    );
    expect(broken.filter((r) => r.kinds.length > 0).map((r) => r.index)).toEqual([2]);
    expect(broken[2].outputs.Y).toBe('Z');
    expect(broken[2].kinds).toEqual(expect.arrayContaining(['floating', 'mismatch']));
    const fixed = vectorRows(
      runJob({ kind: 'sweep', revision: 2, design: design(nand2, { Y: '!(A & B)' }) }).report,
    );
    expect(fixed.every((r) => r.kinds.length === 0)).toBe(true);
  });

  it('reports progress, ending at the total', () => {
    const seen: number[] = [];
    runJob({ kind: 'sweep', revision: 1, design: design(nand2) }, (p) => seen.push(p.done / p.total));
    expect(seen[seen.length - 1]).toBe(1);
  });

  it('caps sweeps with undriven inputs and names the limit', () => {
    const many = { ...nand2, inputs: [...nand2.inputs, ...Array.from({ length: 9 }, (_, i) => `U${i}`)] };
    expect(jobSize({ kind: 'sweep', revision: 0, design: design(many), undrivenInputs: true })).toBe(3 ** 11);
    expect(() => runJob({ kind: 'sweep', revision: 1, design: design(many), undrivenInputs: true })).toThrow(
      SweepLimitError,
    );
  });
});

describe('expected functions in jobs', () => {
  it('keeps usable functions and turns the rest into notes', () => {
    const { expectations, notes } = usableExpectations(design(nand2, { Y: '!(A & B)', Q: 'A' }));
    expect(expectations).toEqual({ Y: '!(A & B)' });
    expect(notes).toHaveLength(1);
    expect(notes[0]).toContain('Q');
  });
});

describe('sequence job', () => {
  it('holds inputs a step leaves out, X before their first mention', () => {
    expect(heldSteps(['SN', 'RN'], [{ SN: '0' }, { RN: '1' }])).toEqual([
      { SN: '0', RN: 'X' },
      { SN: '0', RN: '1' },
    ]);
  });

  // Cross-coupled NAND latch: SN = 0 sets Q = 1; both high hold it; RN = 0 resets Q = 0; both high hold
  // (W&H 4th ed., sequential circuits; common practice). Holding needs the stored state carried between steps.
  it('carries the latch state between steps and gives strips for every net', () => {
    const steps = [
      { SN: '0', RN: '1' },
      { SN: '1', RN: '1' },
      { SN: '1', RN: '0' },
      { SN: '1', RN: '1' },
    ] as const;
    const result = runJob({ kind: 'sequence', revision: 3, design: design(nandLatch), steps });
    expect(result.report.steps?.map((s) => s.outputs.Q)).toEqual(['1', '1', '0', '0']);
    const [q, qn] = levelStrips(result.stepLevels ?? [], ['Q', 'QN']);
    expect([0, 1, 2, 3].map((s) => levelAt(q, s))).toEqual(['1', '1', '0', '0']);
    expect([0, 1, 2, 3].map((s) => levelAt(qn, s))).toEqual(['0', '0', '1', '1']);
    expect(q.runs).toHaveLength(2);
  });
});

describe('power job', () => {
  // Resistor-load inverter: the mean static power over A = 0 (no current) and A = 1 (2.5 V · 57.8 µA)
  // is half of 145 µW (Ohm's law with RCN's Rn, table 3.3, from memory; vectors equally likely).
  it('returns power and sizing figures, each on its own', () => {
    const result = runAnyJob({
      kind: 'power',
      revision: 4,
      design: design(resistorLoadInverter),
      settings: { freq: 100e6, load: 10e-15, activity: 'random' },
      steps: [],
    });
    if (result.kind !== 'power') throw new Error('expected a power result');
    expect(result.revision).toBe(4);
    const dc = 2.5 ** 2 / (RESISTOR_LOAD_OHMS + DEFAULT_TECHNOLOGY.rn * 0.25);
    expect(result.power?.vectors.map((v) => v.dcWatts)[1]).toBeCloseTo(dc, 8);
    expect(result.sizing).not.toBeNull();
  });

  it('reports a refused setting as an error, not a crash', () => {
    const result = runAnyJob({
      kind: 'power',
      revision: 1,
      design: design(nand2),
      settings: { freq: -1, load: 0, activity: 'random' },
      steps: [],
    });
    if (result.kind !== 'power') throw new Error('expected a power result');
    expect(result.power).toBeNull();
    expect(result.errors[0]).toContain('power');
  });
});
