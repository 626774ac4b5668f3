import { describe, expect, it } from 'vitest';
import { SweepLimitError } from '../../src/core/analysis/check.ts';
import { reportRows } from '../../src/core/analysis/sweepColumns.ts';
import type { SweepColumns } from '../../src/core/analysis/report.ts';
import { DEFAULT_TECHNOLOGY } from '../../src/core/model/technology.ts';
import { levelAt, levelStrips } from '../../src/core/view/levelStrip.ts';
import { vectorRows } from '../../src/core/view/vectorTable.ts';
import { usableExpectations } from '../../src/core/expect/problems.ts';
import { forTransfer } from '../../src/worker/jobs.ts';
import { runJob as runAnyJob } from '../../src/worker/runJob.ts';
import type { CheckResult, SequenceJob, SweepJob } from '../../src/worker/protocol.ts';
import { APP_MAX_INPUTS, MAX_INPUTS_WITH_UNDRIVEN, jobSize } from '../../src/worker/protocol.ts';
import {
  RESISTOR_LOAD_OHMS,
  design,
  nand2,
  nand2MissingPullUp,
  nandLatch,
  resistorLoadInverter,
} from '../cells.ts';
import { leading } from '../helpers.ts';

/** The check jobs under test always answer with a check result. */
function runJob(job: SweepJob | SequenceJob, onProgress?: Parameters<typeof runAnyJob>[1]): CheckResult {
  const result = runAnyJob(job, onProgress);
  if (result.kind !== 'sweep' && result.kind !== 'sequence') throw new Error('expected a check result');
  return result;
}

/** A sweep job's columns. */
function sweepOf(result: CheckResult): SweepColumns {
  if (result.report.sweep === undefined) throw new Error('expected a sweep');
  return result.report.sweep;
}

describe('sweep job', () => {
  // Resistor-load inverter with A = 1: the NMOS acts as its on-resistance Rn·L/W = 13 kΩ · 0.25 = 3.25 kΩ
  // (RCN 2nd ed., table 3.3, from memory), in series with the 40 kΩ load: I = 2.5 V / 43.25 kΩ = 57.8 µA
  // and P = VDD·I = 145 µW (Ohm's law; common practice, no source).
  it('reports the current of the vector that draws it', () => {
    const result = runJob({ kind: 'sweep', revision: 7, cell: design(resistorLoadInverter, { Y: '!A' }) });
    expect(result.revision).toBe(7);
    const [low, high] = leading(vectorRows(sweepOf(result)), 2);
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
      sweepOf(runJob({ kind: 'sweep', revision: 1, cell: design(nand2MissingPullUp, { Y: '!(A & B)' }) })),
    );
    expect(broken.filter((r) => r.kinds.length > 0).map((r) => r.index)).toEqual([2]);
    expect(broken[2]!.outputs.Y).toBe('Z');
    expect(broken[2]!.kinds).toEqual(expect.arrayContaining(['floating', 'mismatch']));
    const fixed = vectorRows(
      sweepOf(runJob({ kind: 'sweep', revision: 2, cell: design(nand2, { Y: '!(A & B)' }) })),
    );
    expect(fixed.every((r) => r.kinds.length === 0)).toBe(true);
  });

  it('reports progress, ending at the total', () => {
    const seen: number[] = [];
    runJob({ kind: 'sweep', revision: 1, cell: design(nand2) }, (p) => seen.push(p.done / p.total));
    expect(seen[seen.length - 1]).toBe(1);
  });

  /** The NAND2 with `extra` more inputs that drive nothing. */
  const widened = (extra: number) => ({
    ...nand2,
    inputs: [...nand2.inputs, ...Array.from({ length: extra }, (_, i) => `U${i}`)],
  });

  it('caps sweeps with undriven inputs and names the limit', () => {
    const many = widened(MAX_INPUTS_WITH_UNDRIVEN - 1);
    const size = jobSize({ kind: 'sweep', revision: 0, cell: design(many), undrivenInputs: true });
    expect(size).toBe(3 ** (MAX_INPUTS_WITH_UNDRIVEN + 1));
    expect(() => runJob({ kind: 'sweep', revision: 1, cell: design(many), undrivenInputs: true })).toThrow(
      SweepLimitError,
    );
  });

  it("sweeps past the command line's default of 16 inputs, and refuses past the page's limit", () => {
    const result = runJob({ kind: 'sweep', revision: 1, cell: design(widened(15), { Y: '!(A & B)' }) });
    expect(sweepOf(result).count).toBe(2 ** 17);
    // NAND2 (common practice, no source): no vector disagrees; the 15 unused inputs are structural findings.
    expect(result.report.summary.mismatch).toBe(0);
    expect(result.report.findings.every((f) => f.vector === null)).toBe(true);
    const wide = design(widened(APP_MAX_INPUTS - 1));
    expect(() => runJob({ kind: 'sweep', revision: 1, cell: wide })).toThrow(SweepLimitError);
  });
});

describe('expected functions in jobs', () => {
  it('keeps usable functions and turns the rest into notes', () => {
    const { expectations, notes } = usableExpectations(nand2, { Y: '!(A & B)', Q: 'A' });
    expect(expectations).toEqual({ Y: '!(A & B)' });
    expect(notes).toHaveLength(1);
    expect(notes[0]).toContain('Q');
  });
});

describe('sequence job', () => {
  // Cross-coupled NAND latch: SN = 0 sets Q = 1; both high hold it; RN = 0 resets Q = 0; both high hold
  // (W&H 4th ed., sequential circuits; common practice). Holding needs the stored state carried between steps.
  it('carries the latch state between steps and gives strips for every net', () => {
    const steps = [
      { SN: '0', RN: '1' },
      { SN: '1', RN: '1' },
      { SN: '1', RN: '0' },
      { SN: '1', RN: '1' },
    ] as const;
    const result = runJob({ kind: 'sequence', revision: 3, cell: design(nandLatch), steps });
    expect(result.report.steps?.map((s) => s.outputs.Q)).toEqual(['1', '1', '0', '0']);
    const [q, qn] = leading(levelStrips(result.stepLevels ?? [], ['Q', 'QN']), 2);
    expect([0, 1, 2, 3].map((s) => levelAt(q, s))).toEqual(['1', '1', '0', '0']);
    expect([0, 1, 2, 3].map((s) => levelAt(qn, s))).toEqual(['0', '0', '1', '1']);
    expect(q.runs).toHaveLength(2);
    // Sequence activity counts 0→1 changes between steps over the step changes: Q reads 1 1 0 0 (no
    // rise), QN reads 0 0 1 1 (one rise in three changes), so α(QN) = 1/3 and α(Q) = 0.
    expect(result.power?.nets.find((n) => n.net === 'QN')?.activity).toBeCloseTo(1 / 3, 12);
    expect(result.power?.nets.find((n) => n.net === 'Q')?.activity).toBe(0);
  });
});

describe('sizing job', () => {
  it('returns the sizing figures for the load asked, and a refused load as an error', () => {
    const result = runAnyJob({
      kind: 'sizing',
      revision: 4,
      cell: design(resistorLoadInverter),
      load: 10e-15,
    });
    if (result.kind !== 'sizing') throw new Error('expected a sizing result');
    expect(result.revision).toBe(4);
    expect(result.sizing?.load).toBe(10e-15);
    const refused = runAnyJob({ kind: 'sizing', revision: 1, cell: design(nand2), load: -1 });
    if (refused.kind !== 'sizing') throw new Error('expected a sizing result');
    expect(refused.sizing).toBeNull();
    expect(refused.error).toContain('sizing');
  });
});

describe('power counts ride on the sweep', () => {
  // Resistor-load inverter: the static power of A = 1 is 2.5 V² / (40 kΩ + 3.25 kΩ) (Ohm's law with
  // RCN's Rn = 13 kΩ at W/L = 1, table 3.3, from memory); A = 0 draws none.
  it('counts the static power of each vector in the same pass as the table', () => {
    const result = runJob({ kind: 'sweep', revision: 4, cell: design(resistorLoadInverter) });
    const dc = 2.5 ** 2 / (RESISTOR_LOAD_OHMS + DEFAULT_TECHNOLOGY.rn * 0.25);
    expect(result.power?.vectors.map((v) => v.dcWatts)[1]).toBeCloseTo(dc, 8);
    expect(result.power?.vectors[0]?.dcWatts).toBe(0);
  });

  it('leaves vectors with an undriven input out of random activity', () => {
    const plain = runJob({ kind: 'sweep', revision: 1, cell: design(nand2) });
    const withZ = runJob({ kind: 'sweep', revision: 1, cell: design(nand2), undrivenInputs: true });
    expect(sweepOf(withZ).count).toBe(9);
    expect(withZ.power?.vectors.map((v) => v.inputs)).toEqual(plain.power?.vectors.map((v) => v.inputs));
    expect(withZ.power?.nets).toEqual(plain.power?.nets);
  });
});

describe('a sweep crossing to the page', () => {
  it('moves its columns as buffers and its details as one text, reading back row for row', () => {
    const result = runJob({
      kind: 'sweep',
      revision: 3,
      cell: design(nand2MissingPullUp, { Y: '!(A & B)' }),
    });
    const [rows, table] = [reportRows(result.report), vectorRows(sweepOf(result))];
    const { result: moving, buffers } = forTransfer(result);
    expect(buffers.length).toBeGreaterThanOrEqual(8);
    const arrived = structuredClone(moving, { transfer: buffers }) as CheckResult;
    expect(buffers.every((b) => b.byteLength === 0)).toBe(true); // moved, not copied
    const sweep = sweepOf(arrived);
    expect(Array.isArray(sweep.details)).toBe(false);
    expect(vectorRows(sweep)).toEqual(table);
    expect(reportRows(arrived.report)).toEqual(rows);
    // Only the structural findings travel in the report's list; each vector's are in its row.
    expect(arrived.report.findings.every((f) => f.vector === null)).toBe(true);
  });
});
