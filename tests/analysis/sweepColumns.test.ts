/**
 * A sweep kept in columns must read back, row by row, as the report of each vector solved on its own:
 * a one-step sequence from an unknown state is exactly one sweep vector (docs/semantics.md §2.9), so
 * every field of every row is compared with it. Truth tables: common practice, no source.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { checkSequence, checkSweep, SWEEP_BLOCK } from '../../src/core/analysis/check.ts';
import type { SweepColumns, VectorReport } from '../../src/core/analysis/report.ts';
import { levelAt, reportRows, sweepRow, sweepRows } from '../../src/core/analysis/sweepColumns.ts';
import { columnsOfRows } from '../../src/core/analysis/sweepRecorder.ts';
import { sweepVector } from '../../src/core/analysis/vectors.ts';
import { circuit } from '../../src/core/model/builder.ts';
import type { Netlist } from '../../src/core/model/netlist.ts';
import { LEVEL_0, LEVEL_1, LEVEL_Z } from '../../src/core/solver/levels.ts';
import { nand2, nand2MissingPullUp } from '../cells.ts';
import { passNetwork, randomNetlist } from '../property/generators.ts';

/** Each vector of the sweep solved alone, as a one-step sequence, with the sweep's vector number. */
function aloneRows(netlist: Netlist, options: { allNets: boolean; undriven: boolean }): VectorReport[] {
  const total = (options.undriven ? 3 : 2) ** netlist.inputs.length;
  return Array.from({ length: total }, (_, k) => {
    const vector = sweepVector(netlist.inputs, k, options.undriven);
    const [row] = checkSequence(netlist, [vector], { allNets: options.allNets }).steps ?? [];
    if (row === undefined) throw new Error(`vector ${k} gave no row`);
    return { ...row, findings: row.findings.map((f) => ({ ...f, vector: k })) };
  });
}

describe('a sweep in columns', () => {
  it.each([
    [false, false],
    [true, false],
    [false, true],
    [true, true],
  ])('reads back as each vector solved alone (all nets %s, undriven %s)', (allNets, undriven) => {
    const options = { allNets, undriven };
    for (const netlist of [nand2, nand2MissingPullUp]) {
      const report = checkSweep(netlist, { allNets, undrivenInputs: undriven });
      expect(reportRows(report)).toEqual(aloneRows(netlist, options));
    }
  });

  it('does so on random netlists and pass networks, findings, currents and voltages included', () => {
    const cells = fc.oneof(randomNetlist(), passNetwork());
    fc.assert(
      fc.property(cells, fc.boolean(), fc.boolean(), (netlist, allNets, undriven) => {
        const report = checkSweep(netlist, { allNets, undrivenInputs: undriven });
        const rows = aloneRows(netlist, { allNets, undriven });
        expect(reportRows(report)).toEqual(rows);
        const perVector = report.findings.filter((f) => f.vector !== null);
        expect(perVector).toEqual(rows.flatMap((r) => r.findings));
      }),
      { numRuns: 60, seed: 11 },
    );
  });

  it('keeps a NAND2 truth table as two bit-planes per output, and no detail for plain rows', () => {
    const s = checkSweep(nand2).sweep as SweepColumns;
    expect(s.nets).toEqual(['Y']);
    expect(Array.from({ length: 4 }, (_, i) => levelAt(s, 0, i))).toEqual([
      LEVEL_1,
      LEVEL_1,
      LEVEL_1,
      LEVEL_0,
    ]);
    expect(s.levels[0]).toBe(0b0111); // low bit of the code, rows 0…3
    expect(s.levels[1]).toBe(0); // high bit: no X or Z
    expect(Array.from(s.detail)).toEqual([-1, -1, -1, -1]);
    expect(s.details).toEqual([]);
  });

  it('keeps a detail only for the row with findings', () => {
    const s = checkSweep(nand2MissingPullUp).sweep as SweepColumns;
    expect(levelAt(s, 0, 2)).toBe(LEVEL_Z);
    expect(Array.from(s.detail)).toEqual([-1, -1, 0, -1]);
    expect(sweepRow(s, 2).findings.map((f) => f.kind)).toEqual(['floating']);
  });

  it('hands a long sweep on in blocks of SWEEP_BLOCK rows that join up to the sweep kept whole', () => {
    // Thirteen inverters side by side: 8,192 vectors, two whole blocks; Y0 = !A0 draws no current.
    const inputs = Array.from({ length: 13 }, (_, i) => `A${i}`);
    let b = circuit('inv13')
      .rails()
      .input(...inputs);
    inputs.forEach((a, i) => {
      b = b
        .output(`Y${i}`)
        .pmos(`P${i}`, { g: a, d: `Y${i}`, s: 'VDD', w: 2 })
        .nmos(`N${i}`, { g: a, d: `Y${i}`, s: 'GND' });
    });
    const netlist = b.build();
    const blocks: SweepColumns[] = [];
    const streamed = checkSweep(netlist, { onBlock: (block) => blocks.push(block) });
    const whole = checkSweep(netlist);
    expect(blocks.map((x) => [x.first, x.count])).toEqual([
      [0, SWEEP_BLOCK],
      [SWEEP_BLOCK, SWEEP_BLOCK],
    ]);
    expect(streamed.sweep).toBeUndefined();
    expect(streamed.summary).toEqual(whole.summary);
    expect(blocks.flatMap(sweepRows)).toEqual(sweepRows(whole.sweep as SweepColumns));
  });

  it('is rebuilt from its rows by columnsOfRows', () => {
    const s = checkSweep(nand2MissingPullUp).sweep as SweepColumns;
    const again = columnsOfRows(sweepRows(s), { inputs: ['A', 'B'], outputs: ['Y'], vdd: s.vdd });
    expect(sweepRows(again)).toEqual(sweepRows(s));
  });
});
