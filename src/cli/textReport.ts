/**
 * The human report: a compact truth table with marks for problems, the findings with their current
 * paths, and a summary line per cell. Built from the same JSON object `--json` prints.
 */
import type { Finding } from '../core/analysis/report.ts';
import { foundFunctionText } from '../core/expect/foundFunction.ts';
import { formatSi, type Colour } from './colour.ts';
import { dcLines, transferLines } from './dcText.ts';
import type { CellFailure, CellSkip } from './loadCells.ts';
import type { CellJson, VectorJson } from './runCell.ts';

/** Rows beyond this are left out when they have no findings (the JSON has them all). */
const MAX_TABLE_ROWS = 64;
const MAX_FINDINGS = 20;

export function formatCell(json: CellJson, c: Colour): string {
  const rows = json.steps ?? json.vectors ?? [];
  const what = json.steps === undefined ? 'vector' : 'step';
  const lines = [
    `${c.bold(json.cell)}  ${c.dim(`${json.file} · ${count(rows.length, what)} · VDD ${json.technology.vdd} V`)}`,
    ...truthTable(json, rows, c),
    ...findingLines(json.findings, c),
    ...json.notes.map((n) => c.dim(`  note: ${n}`)),
    ...extraLines(json),
    ...(json.transfer === undefined ? [] : transferLines(json.transfer, c)),
    ...dcLines(json, c),
    summaryLine(json, c),
  ];
  return lines.join('\n');
}

export function formatFailure(f: CellFailure, c: Colour): string {
  const where = f.cell === null ? f.file : `${f.cell}  ${c.dim(f.file)}`;
  return `${c.bold(where)}\n  ${c.error('unusable')}: ${f.message}`;
}

export function formatSkipped(s: CellSkip, c: Colour): string {
  return `${c.bold(s.cell)}  ${c.dim(s.file)}\n  ${c.dim('skipped')}: ${s.reason}`;
}

function truthTable(json: CellJson, rows: readonly VectorJson[], c: Colour): string[] {
  if (json.inputs.length === 0 && json.outputs.length === 0) {
    return [
      c.dim(
        `  no input or output pins (${rows.length === 1 ? 'one steady state' : `${rows.length} rows`} checked)`,
      ),
    ];
  }
  const shown =
    rows.length <= MAX_TABLE_ROWS ? rows : rows.filter((r) => r.findings.length > 0).slice(0, MAX_TABLE_ROWS);
  const headers = [...json.inputs, '│', ...json.outputs, '│', 'I(supply)', 'marks'];
  const widths = headers.map((h) => Math.max(h.length, 1));
  widths[json.inputs.length + json.outputs.length + 2] = Math.max(9, widths.at(-2) ?? 9);
  const pad = (s: string, i: number, raw = s): string =>
    s + ' '.repeat(Math.max(0, (widths[i] ?? 0) - raw.length));
  const out = [`  ${headers.map((h, i) => pad(h, i)).join(' ')}`];
  for (const row of shown) {
    const ins = json.inputs.map((n, i) => pad(String(row.inputs[n] ?? 'Z'), i));
    const outs = json.outputs.map((n, i) => {
      const level = row.outputs[n] ?? 'Z';
      return pad(c.level(level), json.inputs.length + 1 + i, level);
    });
    const current = formatSi(row.supplyCurrent, 'A');
    const cells = [
      ...ins,
      '│',
      ...outs,
      '│',
      pad(current, json.inputs.length + json.outputs.length + 2),
      marks(row.findings, c),
    ];
    out.push(`  ${cells.join(' ')}`.trimEnd());
  }
  if (shown.length < rows.length)
    out.push(c.dim(`  (${rows.length - shown.length} rows not shown; --json lists every row)`));
  return out;
}

/** `✗ contention` for errors, `! degraded` for warnings, one mark per kind. */
function marks(findings: readonly Finding[], c: Colour): string {
  const errors = [...new Set(findings.filter((f) => f.severity === 'error').map((f) => f.kind))];
  const warnings = [...new Set(findings.filter((f) => f.severity === 'warning').map((f) => f.kind))];
  return [...errors.map((k) => c.error(`✗ ${k}`)), ...warnings.map((k) => c.warning(`! ${k}`))].join(' ');
}

function findingLines(findings: readonly Finding[], c: Colour): string[] {
  if (findings.length === 0) return [];
  const out = ['  findings:'];
  for (const f of findings.slice(0, MAX_FINDINGS)) {
    const tag = f.severity === 'error' ? c.error('error  ') : c.warning('warning');
    out.push(`    ${tag} ${f.kind}: ${f.message}`);
    // Messages usually spell the path out already; print it apart only when they do not.
    if (f.path !== null && f.path.length > 0 && !f.message.includes(' → ')) {
      const current = f.current === undefined ? '' : `  ${formatSi(f.current, 'A')}`;
      out.push(`            ${f.path.join(' → ')}${current}`);
    }
  }
  if (findings.length > MAX_FINDINGS)
    out.push(c.dim(`    … ${findings.length - MAX_FINDINGS} more (--json lists them all)`));
  return out;
}

function extraLines(json: CellJson): string[] {
  const out: string[] = (json.found ?? []).map((f) => `  found: ${foundFunctionText(f)}`);
  if (json.power !== undefined) {
    const p = json.power;
    out.push(
      `  power: static ${formatSi(p.averageStaticWatts, 'W')} average, dynamic ${formatSi(p.dynamicWatts, 'W')} at ${formatSi(p.frequency, 'Hz')} and ${formatSi(p.load, 'F')} per output (${p.activitySource} activity), total ${formatSi(p.totalWatts, 'W')}`,
    );
  }
  if (json.sizing !== undefined) {
    const s = json.sizing;
    const g = Object.entries(s.logicalEffort).map(([k, v]) => `${k} ${v === null ? '–' : v.toFixed(2)}`);
    const p = s.parasiticDelay === null ? '–' : s.parasiticDelay.toFixed(2);
    out.push(
      `  sizing: logical effort ${g.join(', ') || '–'}; parasitic delay ${p}; ${formatSi(s.load, 'F')} per output`,
    );
  }
  return out;
}

export function summaryLine(json: CellJson, c: Colour): string {
  const { summary } = json;
  const kinds = Object.entries(summary)
    .filter(([k, n]) => !['vectors', 'errors', 'warnings'].includes(k) && n > 0)
    .map(([k, n]) => `${k} ${n}`);
  const verdict = summary.errors > 0 ? c.error('FAIL') : c.bold('pass');
  const what = json.steps === undefined ? 'vector' : 'step';
  const counts = `${count(summary.vectors, what)}, ${count(summary.errors, 'error')}, ${count(summary.warnings, 'warning')}`;
  return `  ${verdict}  ${counts}${kinds.length > 0 ? ` (${kinds.join(', ')})` : ''}`;
}

/** `1 error`, `2 errors`. */
export function count(n: number, noun: string): string {
  return `${n} ${noun}${n === 1 ? '' : 's'}`;
}
