/**
 * The sweep with every input also left undriven (Z): 3^8 = 6,561 vectors of the 448-transistor
 * 8-input bank (four 4-bit adders), the whole check (`checkSweep`: solves, findings, rows) on CPU time.
 * Nearly every vector has findings here, so the row measures the engine, its outcome memo shared
 * across the sets of undriven inputs (solver/memo.ts), and the findings, not the bit-parallel path.
 */
import { checkSweep } from '../src/core/analysis/check.ts';
import { adderBank } from './generators/index.ts';
import type { CpuRow } from './sweepWords.ts';
import { prepare } from './measure.ts';
import { cpuSeconds } from './timing.ts';

export function measureUndrivenSweep(): CpuRow {
  const bank = adderBank(4, 4);
  const start = cpuSeconds();
  const { vectors } = checkSweep(bank, { undrivenInputs: true }).summary;
  const cpu = cpuSeconds() - start;
  const transistors = prepare(bank).transistors;
  return {
    name: 'check-sweep/adder-bank-8-inputs (undriven too)',
    transistors,
    vectors,
    cpuSeconds: cpu,
    nsPerTransistorVector: (cpu * 1e9) / (transistors * vectors),
  };
}
