/**
 * The level-1 DC jobs of the worker (docs/semantics.md §2, "DC levels"), on circuits whose answer a
 * reader can check by hand.
 */
import { describe, expect, it } from 'vitest';
import { DEFAULT_TECHNOLOGY } from '../../src/core/model/technology.ts';
import { runJob } from '../../src/worker/runJob.ts';
import { jobSize, type JobProgress, type TransferJob, type VectorDcJob } from '../../src/worker/protocol.ts';
import { RESISTOR_LOAD_OHMS, design, inverter, resistorLoadInverter } from '../cells.ts';

const T = DEFAULT_TECHNOLOGY;

function transferJob(extra: Partial<TransferJob> = {}): TransferJob {
  return {
    kind: 'transfer',
    revision: 3,
    cell: design(inverter),
    input: 'A',
    hold: {},
    points: 201,
    ...extra,
  };
}

describe('transfer job', () => {
  it("draws the inverter's curve with its switching threshold", () => {
    // Inverter of tests/cells.ts: NMOS W/L 1/0.25, PMOS 2/0.25, default technology. Closed form
    // VM = (VTn + r(VDD − |VTp|)) / (1 + r), r = √(k'p·(W/L)p / (k'n·(W/L)n)) (Weste & Harris, CMOS
    // VLSI Design, 4th ed., eq. 2.50 form), which leaves out λ: the solved VM lies within 30 mV.
    const result = runJob(transferJob());
    if (result.kind !== 'transfer') throw new Error(result.kind);
    expect(result.revision).toBe(3);
    const r = Math.sqrt((T.kpp * 8) / (T.kpn * 4));
    const closed = (T.vtn + r * (T.vdd - T.vtp)) / (1 + r);
    expect(Math.abs((result.report?.curves['Y']?.vm as number) - closed)).toBeLessThan(0.03);
    expect(result.report?.curves['Y']?.points).toHaveLength(201);
  });

  it('reports progress over the points, ending at the total', () => {
    const seen: JobProgress[] = [];
    runJob(transferJob({ points: 51 }), (p) => seen.push(p));
    expect(seen.length).toBeGreaterThan(0);
    expect(seen[seen.length - 1]).toEqual({ done: 51, total: 51 });
    expect(jobSize(transferJob({ points: 51 }))).toBe(51);
  });

  it('a request the cell no longer fits comes back in words', () => {
    const result = runJob(transferJob({ input: 'B' }));
    if (result.kind !== 'transfer') throw new Error(result.kind);
    expect(result.report).toBeNull();
    expect(result.error).toMatch(/'B' is not an input/);
  });
});

describe('vector DC job', () => {
  it('a resistor-load inverter low: the level-1 current where the load and the NMOS agree', () => {
    // With A = 1 the NMOS (W/L = 1/0.25, β = k'n·4) is in its linear region, so
    // (VDD − V)/R = β((VDD − VTn)·V − V²/2)(1 + λV) (Shichman–Hodges; VSB = 0, so VT = VTn). Solved
    // here by bisection, apart from the product's solver.
    const beta = T.kpn * 4;
    const f = (v: number): number =>
      (T.vdd - v) / RESISTOR_LOAD_OHMS - beta * ((T.vdd - T.vtn) * v - (v * v) / 2) * (1 + T.lambdan * v);
    let [lo, hi] = [0, T.vdd - T.vtn];
    for (let i = 0; i < 200; i++) [lo, hi] = f((lo + hi) / 2) > 0 ? [(lo + hi) / 2, hi] : [lo, (lo + hi) / 2];
    const job: VectorDcJob = {
      kind: 'vector-dc',
      revision: 1,
      cell: design(resistorLoadInverter),
      steps: [{ A: '1' }],
    };
    const result = runJob(job);
    if (result.kind !== 'vector-dc') throw new Error(result.kind);
    const y = result.comparison?.outputs[0];
    expect(y?.name).toBe('Y');
    expect(y?.dcVolts).toBeCloseTo(lo, 6);
    expect(result.comparison?.dcCurrent).toBeCloseTo((T.vdd - lo) / RESISTOR_LOAD_OHMS, 12);
    // The switch level's linear on-resistance, Rn·L/W = 13 kΩ · 0.25, in series with the load.
    expect(result.comparison?.switchCurrent).toBeCloseTo(T.vdd / (RESISTOR_LOAD_OHMS + T.rn * 0.25), 12);
  });

  it('a step that names no input comes back in words', () => {
    const job: VectorDcJob = { kind: 'vector-dc', revision: 1, cell: design(inverter), steps: [{ Q: '1' }] };
    const result = runJob(job);
    if (result.kind !== 'vector-dc') throw new Error(result.kind);
    expect(result.comparison).toBeNull();
    expect(result.error).toMatch(/'Q', which is not an input/);
  });
});
