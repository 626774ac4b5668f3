/** Truth-table CSV against RFC 4180, section 2 (rules 1, 3, 6 and 7 quoted beside each check). */
import { describe, expect, it } from 'vitest';
import { checkSweep } from '../../src/core/analysis/check.ts';
import type { CheckReport } from '../../src/core/analysis/report.ts';
import { circuit } from '../../src/core/model/builder.ts';
import { csvField, exportTruthTableCsv } from '../../src/core/netlist-io/csvExport.ts';

const nand = circuit('nand2')
  .rails()
  .input('A', 'B')
  .output('Y')
  .pmos('P1', { g: 'A', d: 'Y', s: 'VDD' })
  .pmos('P2', { g: 'B', d: 'Y', s: 'VDD' })
  .nmos('N1', { g: 'A', d: 'Y', s: 'n1' })
  .nmos('N2', { g: 'B', d: 'n1', s: 'GND' })
  .build();

describe('truth table CSV', () => {
  it('writes a header and one CRLF-terminated row per vector (RFC 4180 2.1, 2.3)', () => {
    const csv = exportTruthTableCsv(checkSweep(nand));
    const lines = csv.split('\r\n');
    expect(lines.at(-1)).toBe('');
    expect(lines[0]).toBe('vector,A,B,Y,V(Y) [V],supply current [A],static power [W],findings');
    // NAND truth table (common practice, no source): only A = B = 1 gives 0. VDD 2.5 V (RCN defaults).
    expect(lines.slice(1, 5).map((l) => l.split(',').slice(0, 5).join(','))).toEqual([
      '0,0,0,1,2.5',
      '1,0,1,1,2.5',
      '2,1,0,1,2.5',
      '3,1,1,0,0',
    ]);
  });

  it('quotes fields with commas, quotes or line breaks and doubles the quotes (RFC 4180 2.6, 2.7)', () => {
    expect(csvField('plain')).toBe('plain');
    expect(csvField('a,b')).toBe('"a,b"');
    expect(csvField('say "hi"')).toBe('"say ""hi"""');
    expect(csvField('two\r\nlines')).toBe('"two\r\nlines"');
  });

  it('lists a row’s findings in one quoted field and numbers sequence steps from 1', () => {
    const finding = {
      kind: 'contention',
      severity: 'error',
      vector: 0,
      nets: ['Y', 'n1'],
      devices: [],
      path: null,
      message: 'm',
    } as const;
    const report: CheckReport = {
      cell: 'c',
      inputs: ['A'],
      outputs: ['Y'],
      steps: [
        {
          inputs: { A: '1' },
          outputs: { Y: 'X' },
          voltages: { Y: null },
          supplyCurrent: 1e-4,
          staticPower: 2.5e-4,
          currentPaths: [],
          findings: [finding],
        },
      ],
      findings: [finding],
      summary: { vectors: 1, errors: 1, warnings: 0 },
      notes: [],
    };
    expect(exportTruthTableCsv(report).split('\r\n')[1]).toBe(
      '1,1,X,,0.0001,0.00025,"error contention (Y, n1)"',
    );
  });
});
