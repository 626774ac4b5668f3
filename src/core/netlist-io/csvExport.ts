/**
 * The truth table as CSV per RFC 4180: CRLF line ends (2.1), a header row (2.3), and a field in
 * double quotes when it holds a comma, a quote or a line break, with quotes doubled (2.6, 2.7).
 * One row per vector (or step): inputs, output levels, output voltages, supply current, static power
 * and the findings of that row.
 *
 * Text from the design (names, finding messages) is made safe for spreadsheets: control characters
 * and line breaks are escaped (printable.ts), and a text field starting with `=`, `+`, `-`, `@`, a tab
 * or a carriage return gets a leading apostrophe, so no spreadsheet reads it as a formula. This is
 * the usual defence against "CSV injection" (OWASP's guidance, from memory). Numbers we write stay
 * plain numbers. Header names are made unique (` #2`) where escaping or a bidirectional pin would
 * repeat one.
 */
import type { CheckReport, Finding } from '../analysis/report.ts';
import { reportRow, reportRowCount } from '../analysis/sweepColumns.ts';
import { own } from '../model/records.ts';
import { printable } from '../text/printable.ts';

export function exportTruthTableCsv(report: CheckReport): string {
  const isSequence = report.steps !== undefined;
  const header = uniqueHeaders([
    isSequence ? 'step' : 'vector',
    ...report.inputs.map(printable),
    ...report.outputs.map(printable),
    ...report.outputs.map((o) => `V(${printable(o)}) [V]`),
    'supply current [A]',
    'static power [W]',
    'findings',
  ]).map(textField);
  const body = Array.from({ length: reportRowCount(report) }, (_, i) => reportRow(report, i)).map(
    (row, i) => [
      String(isSequence ? i + 1 : i),
      ...report.inputs.map((n) => own(row.inputs, n) ?? ''),
      ...report.outputs.map((n) => own(row.outputs, n) ?? ''),
      ...report.outputs.map((n) => numberField(own(row.voltages, n))),
      numberField(row.supplyCurrent),
      numberField(row.staticPower),
      textField(row.findings.map(findingText).join('; ')),
    ],
  );
  return csvText([header, ...body]);
}

/** Rows of fields as RFC 4180 text: the one CSV writer (truth tables, transfer curves). */
export function csvText(rows: readonly (readonly string[])[]): string {
  return rows.map((fields) => fields.map(csvField).join(',')).join('\r\n') + '\r\n';
}

function findingText(f: Finding): string {
  const nets = f.nets.map(printable).join(', ');
  return f.nets.length === 0 ? `${f.severity} ${f.kind}` : `${f.severity} ${f.kind} (${nets})`;
}

/** A number as JavaScript writes it exactly (read back by any CSV reader); empty when there is none. */
export function numberField(value: number | null | undefined): string {
  return value === null || value === undefined || Number.isNaN(value) ? '' : String(value);
}

/** A text field: escaped, and never read as a formula. */
export function textField(value: string): string {
  const safe = printable(value);
  return /^[=+\-@\t\r]/.test(safe) ? `'${safe}` : safe;
}

function uniqueHeaders(names: readonly string[]): string[] {
  const seen = new Map<string, number>();
  return names.map((name) => {
    const n = (seen.get(name) ?? 0) + 1;
    seen.set(name, n);
    return n === 1 ? name : `${name} #${n}`;
  });
}

/** RFC 4180 2.6 and 2.7. */
export function csvField(value: string): string {
  return /[",\r\n]/.test(value) ? `"${value.replace(/"/g, '""')}"` : value;
}
