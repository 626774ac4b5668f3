/**
 * The truth table as CSV per RFC 4180: CRLF line ends (2.1), a header row (2.3), and a field in
 * double quotes when it holds a comma, a quote or a line break, with quotes doubled (2.6, 2.7).
 * One row per vector (or step): inputs, output levels, output voltages, supply current, static power
 * and the findings of that row.
 */
import type { CheckReport, Finding, VectorReport } from '../analysis/report.ts';

export function exportTruthTableCsv(report: CheckReport): string {
  const isSequence = report.steps !== undefined;
  const rows: readonly VectorReport[] = report.steps ?? report.vectors ?? [];
  const header = [
    isSequence ? 'step' : 'vector',
    ...report.inputs,
    ...report.outputs,
    ...report.outputs.map((o) => `V(${o}) [V]`),
    'supply current [A]',
    'static power [W]',
    'findings',
  ];
  const body = rows.map((row, i) => [
    String(isSequence ? i + 1 : i),
    ...report.inputs.map((n) => row.inputs[n] ?? ''),
    ...report.outputs.map((n) => row.outputs[n] ?? ''),
    ...report.outputs.map((n) => numberField(row.voltages[n])),
    numberField(row.supplyCurrent),
    numberField(row.staticPower),
    row.findings.map(findingText).join('; '),
  ]);
  return csvText([header, ...body]);
}

/** Rows of fields as RFC 4180 text: the one CSV writer (truth tables, transfer curves). */
export function csvText(rows: readonly (readonly string[])[]): string {
  return rows.map((fields) => fields.map(csvField).join(',')).join('\r\n') + '\r\n';
}

function findingText(f: Finding): string {
  return f.nets.length === 0 ? `${f.severity} ${f.kind}` : `${f.severity} ${f.kind} (${f.nets.join(', ')})`;
}

/** A number as JavaScript writes it exactly (read back by any CSV reader); empty when there is none. */
export function numberField(value: number | null | undefined): string {
  return value === null || value === undefined || Number.isNaN(value) ? '' : String(value);
}

/** RFC 4180 2.6 and 2.7. */
export function csvField(value: string): string {
  return /[",\r\n]/.test(value) ? `"${value.replace(/"/g, '""')}"` : value;
}
