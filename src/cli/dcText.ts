/**
 * Text lines for the level-1 DC parts of the human report: transfer-curve figures (`--transfer`)
 * and, per vector, the DC voltages and current beside the switch-level estimate (`--dc`).
 */
import type { TransferReport } from '../core/dc/transfer.ts';
import { formatSi, type Colour } from './colour.ts';
import type { CellJson, VectorJson } from './runCell.ts';

const MAX_ROWS = 64;
const MAX_NOTES = 10;

const FIGURES = ['vm', 'vil', 'vih', 'vol', 'voh', 'nml', 'nmh'] as const;

function volts(v: number | null | undefined): string {
  return v === null || v === undefined ? '–' : `${v.toFixed(3)} V`;
}

export function transferLines(t: TransferReport, c: Colour): string[] {
  const hold = Object.entries(t.hold).map(([k, v]) => `${k}=${v}`);
  const held =
    hold.length === 0 ? 'nothing held' : `${hold.join(' ')} ${t.holdChosen.length > 0 ? 'chosen' : 'held'}`;
  const where =
    t.convention === 'rails' ? 'VOL/VOH with the input at the rails' : 'VOL/VOH at the unity-gain points';
  const out = [`  transfer of ${t.input}, level-1 model (${held}; ${where}):`];
  for (const [output, curve] of Object.entries(t.curves)) {
    out.push(`    ${output}  ${FIGURES.map((f) => `${f.toUpperCase()} ${volts(curve[f])}`).join('  ')}`);
    for (const note of curve.notes) out.push(c.dim(`      ${note}`));
  }
  return [...out, ...t.notes.map((n) => c.dim(`    note: ${n}`))];
}

export function dcLines(json: CellJson, c: Colour): string[] {
  const rows = (json.steps ?? json.vectors ?? []).filter((r) => r.dc !== undefined);
  if (rows.length === 0) return [];
  const shown = rows.length <= MAX_ROWS ? rows : rows.filter(disagrees).slice(0, MAX_ROWS);
  const out = [`  level-1 DC (switch-level estimate in brackets; ≠ where they disagree):`];
  for (const row of shown) out.push(`    ${dcRow(json, row, c)}`);
  if (shown.length < rows.length)
    out.push(c.dim(`    (${rows.length - shown.length} rows agree and are not shown)`));
  const notes = [...new Set(rows.flatMap((r) => (r.dc?.notes ?? []).map((n) => `${label(json, r)}: ${n}`)))];
  for (const note of notes.slice(0, MAX_NOTES)) out.push(c.dim(`    ${note}`));
  if (notes.length > MAX_NOTES)
    out.push(c.dim(`    … ${notes.length - MAX_NOTES} more notes (--json lists them all)`));
  return out;
}

function disagrees(row: VectorJson): boolean {
  return (row.dc?.differs.length ?? 0) > 0 || (row.dc?.notes.length ?? 0) > 0;
}

function label(json: CellJson, row: VectorJson): string {
  return json.inputs.map((n) => `${n}=${row.inputs[n] ?? 'Z'}`).join(' ') || '(no inputs)';
}

function dcRow(json: CellJson, row: VectorJson, c: Colour): string {
  const dc = row.dc;
  const outputs = json.outputs.map((n) => `${n} ${volts(dc?.voltages[n])} (${volts(row.voltages[n])})`);
  const current = dc?.supplyCurrent;
  const supply = `I ${current === null || current === undefined ? '–' : formatSi(current, 'A')} (${formatSi(row.supplyCurrent, 'A')})`;
  const mark = (dc?.differs.length ?? 0) > 0 ? `  ${c.warning('≠')}` : '';
  return `${label(json, row)} │ ${outputs.join('  ')} │ ${supply}${mark}`;
}
