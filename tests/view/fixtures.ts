/** Hand-written reports in the docs/semantics.md §5 shape, with values a reader can re-derive. */
import type { CheckReport, Finding, Level, VectorReport } from '../../src/core/analysis/report.ts';
import type { InputValue } from '../../src/core/model/design.ts';
import { columnsOfRows } from '../../src/core/analysis/sweepRecorder.ts';

export function finding(partial: Partial<Finding> & Pick<Finding, 'kind' | 'severity'>): Finding {
  return { vector: null, nets: [], devices: [], path: null, message: partial.kind, ...partial };
}

export function vector(
  inputs: Record<string, InputValue>,
  outputs: Record<string, Level>,
  extra: Partial<VectorReport> = {},
): VectorReport {
  return {
    inputs,
    outputs,
    voltages: {},
    supplyCurrent: 0,
    staticPower: 0,
    currentPaths: [],
    findings: [],
    ...extra,
  };
}

/** A sweep's report from its rows, written in truth-table order (VDD 2.5 V). */
export function report(vectors: VectorReport[], inputs: string[], outputs: string[]): CheckReport {
  return {
    cell: 'fixture',
    inputs,
    outputs,
    sweep: columnsOfRows(vectors, { inputs, outputs, vdd: 2.5 }),
    findings: vectors.flatMap((v) => v.findings),
    summary: { vectors: vectors.length, errors: 0, warnings: 0 },
    notes: [],
  };
}

/**
 * Pseudo-NMOS inverter, output low (square law, derived; RCN 2nd ed. 0.25 µm values, from memory):
 * VDD 2.5 V, |Vtp| 0.4 V, k'n 115 µA/V², (W/L)n 1.5 and kn/kp = 9, so the saturated PMOS load carries
 * I = ½·kp·(VDD − |Vtp|)² = ½·(115e-6·1.5/9)·2.1² ≈ 42.3 µA and the cell burns VDD·I ≈ 106 µW.
 */
export const PSEUDO_NMOS_LOW_CURRENT = 0.5 * ((115e-6 * 1.5) / 9) * (2.5 - 0.4) ** 2;
export const PSEUDO_NMOS_LOW_POWER = 2.5 * PSEUDO_NMOS_LOW_CURRENT;

export const pseudoNmosInverter = report(
  [
    vector({ A: '0' }, { Y: '1' }),
    vector(
      { A: '1' },
      { Y: '0' },
      {
        supplyCurrent: PSEUDO_NMOS_LOW_CURRENT,
        staticPower: PSEUDO_NMOS_LOW_POWER,
        currentPaths: [{ chain: ['VDD', 'P1', 'Y', 'N1', 'GND'], current: PSEUDO_NMOS_LOW_CURRENT }],
        findings: [
          finding({
            kind: 'static-current',
            severity: 'warning',
            vector: 1,
            nets: ['VDD', 'Y', 'GND'],
            devices: ['P1', 'N1'],
            path: ['VDD', 'P1', 'Y', 'N1', 'GND'],
            current: PSEUDO_NMOS_LOW_CURRENT,
          }),
        ],
      },
    ),
  ],
  ['A'],
  ['Y'],
);

/**
 * A NAND2 whose pull-up lost the PMOS on B: with A = 1 and B = 0 neither network conducts, so Y floats
 * (a fact of the series/parallel duality, common practice, no source). Expected Y = !(A & B).
 */
export const nandMissingPullUp = report(
  [
    vector({ A: '0', B: '0' }, { Y: '1' }),
    vector({ A: '0', B: '1' }, { Y: '1' }),
    vector(
      { A: '1', B: '0' },
      { Y: 'Z' },
      {
        findings: [
          finding({ kind: 'floating', severity: 'error', vector: 2, nets: ['Y'] }),
          finding({ kind: 'mismatch', severity: 'error', vector: 2, nets: ['Y'] }),
        ],
      },
    ),
    vector({ A: '1', B: '1' }, { Y: '0' }),
  ],
  ['A', 'B'],
  ['Y'],
);
