/**
 * The points of a transfer curve as CSV (RFC 4180, through the one writer of `csvExport.ts`): one
 * row per input voltage, the swept input first and then every output, in volts; a point where an
 * output has no DC voltage is an empty field.
 */
import { csvText, numberField } from '../netlist-io/csvExport.ts';
import type { TransferReport } from './transfer.ts';

export function transferCsv(report: TransferReport): string {
  const outputs = Object.keys(report.curves);
  const curves = outputs.map((o) => report.curves[o]?.points ?? []);
  const vin = curves[0]?.map(([v]) => v) ?? [];
  const header = [`V(${report.input}) [V]`, ...outputs.map((o) => `V(${o}) [V]`)];
  const rows = vin.map((v, k) => [numberField(v), ...curves.map((points) => numberField(points[k]?.[1]))]);
  return csvText([header, ...rows]);
}

/** The download's name: the cell and the swept input, in letters, digits, dot, dash and underscore. */
export function transferCsvName(cell: string, input: string): string {
  const safe = (text: string): string => text.trim().replace(/[^A-Za-z0-9._-]+/g, '_');
  return `${safe(cell) || 'cell'}-transfer-${safe(input) || 'input'}.csv`;
}
