/**
 * Transfer-curve points as CSV. The format rules are RFC 4180 (section 2): CRLF after every record
 * (2.1, 2.2), a header line (2.3), fields with a comma, quote or line break in double quotes with
 * quotes doubled (2.6, 2.7). The values are the curve's own, so they read back exactly.
 *
 * Sources: RFC 4180 §2 as above. That the NAND2 curve runs from 0 V to VDD (2.5 V, the default
 * technology's supply) at its input is how a transfer curve is drawn: common practice, no source.
 */
import { describe, expect, it } from 'vitest';
import { transferCurves, type TransferReport } from '../../src/core/dc/transfer.ts';
import { transferCsv } from '../../src/core/dc/transferCsv.ts';
import { DEFAULT_TECHNOLOGY } from '../../src/core/model/technology.ts';
import { nand2 } from '../../src/core/starters/combinational.ts';

describe('transfer points as CSV', () => {
  const report = transferCurves(nand2, DEFAULT_TECHNOLOGY, { input: 'A', points: 11 });
  const text = transferCsv(report);
  const records = text.split('\r\n');

  it('one header and one record per point, every record ended by CRLF', () => {
    expect(text.endsWith('\r\n')).toBe(true);
    expect(records.pop()).toBe('');
    expect(records).toHaveLength(12);
    expect(records[0]).toBe('V(A) [V],V(Y) [V]');
    expect(text).not.toMatch(/[^\r]\n/);
  });

  it('every value as computed: the input from 0 to VDD, the output as solved', () => {
    const rows = records.slice(1).map((r) => r.split(',').map(Number));
    expect(rows.map((r) => r[0])).toEqual(report.curves['Y']?.points.map(([v]) => v));
    expect(rows.map((r) => r[1])).toEqual(report.curves['Y']?.points.map(([, v]) => v));
    expect(rows[10]?.[0]).toBe(2.5);
  });

  it('an output without a voltage is an empty field; a name with a comma is quoted', () => {
    const curve = report.curves['Y']!;
    const odd: TransferReport = {
      ...report,
      input: 'A,1',
      curves: { 'Y "main"': { ...curve, points: [[0, null], ...curve.points.slice(1)] } },
    };
    const [header, first] = transferCsv(odd).split('\r\n');
    expect(header).toBe('"V(A,1) [V]","V(Y ""main"") [V]"');
    expect(first).toBe('0,');
  });
});
