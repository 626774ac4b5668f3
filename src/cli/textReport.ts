/**
 * The human report: a compact truth table with marks for problems, the findings with their current
 * paths, and a summary line per cell. Built from a digest of the rows (`TextDigest`), so a 65,536-row
 * sweep is read once and only what is shown is kept. Every name and message from the design is
 * printed escaped (printable.ts): a net name cannot move the cursor or rewrite a CI log.
 */
import type { Finding, Summary, SweepColumns } from '../core/analysis/report.ts';
import { foundFunctionText } from '../core/analysis/foundFunction.ts';
import { brief, printable } from '../core/text/printable.ts';
import { own } from '../core/model/records.ts';
import { formatSi, type Colour } from './colour.ts';
import { dcLines, transferLines } from './dcText.ts';
import { proofLines } from './proofText.ts';
import type { CellFailure, CellSkip } from './loadCells.ts';
import { vectorJson, type CellJson, type VectorJson } from './runCell.ts';
import { sweepFindings, sweepRow } from '../core/analysis/sweepColumns.ts';
import type { CellHead, CellTail } from './streamCell.ts';

/** Rows beyond this are left out when they have no findings (the JSON has them all). */
const MAX_TABLE_ROWS = 64;
const MAX_FINDINGS = 20;

/** What the text report shows of a cell. */
export interface CellView {
  readonly head: CellHead;
  readonly tail: CellTail;
  readonly rowKind: 'vectors' | 'steps';
  /** The rows shown: all of them up to MAX_TABLE_ROWS, else the first rows with findings. */
  readonly rows: readonly VectorJson[];
  readonly rowCount: number;
  /** The first findings, structural ones first, and how many there are in all. */
  readonly findings: readonly Finding[];
  readonly findingCount: number;
  /** The whole cell, when it was collected: the level-1 DC lines read its rows. */
  readonly json?: CellJson;
}

/** Keeps what the report will show while rows go by. */
export class TextDigest {
  private readonly first: VectorJson[] = [];
  private readonly flagged: VectorJson[] = [];
  private readonly rowFindings: Finding[] = [];
  private rowCount = 0;
  private rowFindingCount = 0;

  add(row: VectorJson): void {
    this.rowCount++;
    if (this.first.length < MAX_TABLE_ROWS) this.first.push(row);
    if (row.findings.length > 0 && this.flagged.length < MAX_TABLE_ROWS) this.flagged.push(row);
    this.rowFindingCount += row.findings.length;
    for (const f of row.findings) if (this.rowFindings.length < MAX_FINDINGS) this.rowFindings.push(f);
  }

  /** A block of a sweep: only the rows the report may show are built. */
  addBlock(s: SweepColumns): void {
    for (let i = 0; i < s.count && this.first.length < MAX_TABLE_ROWS; i++)
      this.first.push(vectorJson(sweepRow(s, i)));
    for (let i = 0; i < s.count && this.flagged.length < MAX_TABLE_ROWS; i++)
      if (s.kinds[i] !== 0) this.flagged.push(vectorJson(sweepRow(s, i)));
    for (const f of sweepFindings(s)) {
      this.rowFindingCount++;
      if (this.rowFindings.length < MAX_FINDINGS) this.rowFindings.push(f);
    }
    this.rowCount += s.count;
  }

  view(head: CellHead, tail: CellTail, rowKind: CellView['rowKind'] = 'vectors'): CellView {
    return {
      head,
      tail,
      rowKind,
      rows: this.rowCount <= MAX_TABLE_ROWS ? this.first : this.flagged,
      rowCount: this.rowCount,
      findings: [...tail.structural, ...this.rowFindings].slice(0, MAX_FINDINGS),
      findingCount: tail.structural.length + this.rowFindingCount,
    };
  }

  /** The view of a cell already collected as JSON. */
  static of(json: CellJson): CellView {
    const rows = json.steps ?? json.vectors ?? [];
    const digest = new TextDigest();
    rows.forEach((r) => digest.add(r));
    if (json.sweep !== undefined) digest.addBlock(json.sweep);
    const inRows = new Set(rows.flatMap((r) => r.findings));
    if (json.sweep !== undefined) for (const f of sweepFindings(json.sweep)) inRows.add(f);
    const { cell, file, inputs, outputs, technology, sizing, transfer, found, proof, power, summary, notes } =
      json;
    const head: CellHead = {
      cell,
      file,
      inputs,
      outputs,
      technology,
      ...(sizing === undefined ? {} : { sizing }),
      ...(transfer === undefined ? {} : { transfer }),
      ...(found === undefined ? {} : { found }),
      ...(proof === undefined ? {} : { proof }),
    };
    const structural = json.findings.filter((f) => !inRows.has(f));
    const tail: CellTail = { structural, summary, notes, ...(power === undefined ? {} : { power }) };
    return { ...digest.view(head, tail, json.steps === undefined ? 'vectors' : 'steps'), json };
  }
}

export function formatCell(view: CellView, c: Colour): string {
  const { head, tail } = view;
  const what = view.rowKind === 'steps' ? 'step' : 'vector';
  const lines = [
    `${c.bold(printable(head.cell))}  ${c.dim(`${printable(head.file)} · ${count(view.rowCount, what)} · VDD ${head.technology.vdd} V`)}`,
    ...truthTable(view, c),
    ...findingLines(view, c),
    ...tail.notes.map((n) => c.dim(`  note: ${brief(n)}`)),
    ...extraLines(head, tail),
    ...(head.transfer === undefined ? [] : transferLines(head.transfer, c)),
    ...(view.json === undefined ? [] : dcLines(view.json, c)),
    ...(head.proof === undefined ? [] : proofLines(head.proof, head.inputs.length, c)),
    summaryLine(tail.summary, what, c),
  ];
  return lines.join('\n');
}

export function formatFailure(f: CellFailure, c: Colour): string {
  const where = f.cell === null ? printable(f.file) : `${printable(f.cell)}  ${c.dim(printable(f.file))}`;
  return `${c.bold(where)}\n  ${c.error('unusable')}: ${brief(f.message)}`;
}

export function formatSkipped(s: CellSkip, c: Colour): string {
  return `${c.bold(printable(s.cell))}  ${c.dim(printable(s.file))}\n  ${c.dim('skipped')}: ${brief(s.reason)}`;
}

function truthTable(view: CellView, c: Colour): string[] {
  const inputs = view.head.inputs.map(printable);
  const outputs = view.head.outputs.map(printable);
  if (inputs.length === 0 && outputs.length === 0) {
    const n = view.rowCount;
    return [c.dim(`  no input or output pins (${n === 1 ? 'one steady state' : `${n} rows`} checked)`)];
  }
  const headers = [...inputs, '│', ...outputs, '│', 'I(supply)', 'marks'];
  const widths = headers.map((h) => Math.max(h.length, 1));
  widths[inputs.length + outputs.length + 2] = Math.max(9, widths.at(-2) ?? 9);
  const pad = (s: string, i: number, raw = s): string =>
    s + ' '.repeat(Math.max(0, (widths[i] ?? 0) - raw.length));
  const out = [`  ${headers.map((h, i) => pad(h, i)).join(' ')}`];
  for (const row of view.rows) {
    const ins = view.head.inputs.map((n, i) => pad(String(own(row.inputs, n) ?? 'Z'), i));
    const outs = view.head.outputs.map((n, i) => {
      const level = own(row.outputs, n) ?? 'Z';
      return pad(c.level(level), inputs.length + 1 + i, level);
    });
    const current = pad(formatSi(row.supplyCurrent, 'A'), inputs.length + outputs.length + 2);
    out.push(`  ${[...ins, '│', ...outs, '│', current, marks(row.findings, c)].join(' ')}`.trimEnd());
  }
  if (view.rows.length < view.rowCount)
    out.push(c.dim(`  (${view.rowCount - view.rows.length} rows not shown; --json lists every row)`));
  return out;
}

/** `✗ contention` for errors, `! degraded` for warnings, one mark per kind. */
function marks(findings: readonly Finding[], c: Colour): string {
  const errors = [...new Set(findings.filter((f) => f.severity === 'error').map((f) => f.kind))];
  const warnings = [...new Set(findings.filter((f) => f.severity === 'warning').map((f) => f.kind))];
  return [...errors.map((k) => c.error(`✗ ${k}`)), ...warnings.map((k) => c.warning(`! ${k}`))].join(' ');
}

function findingLines(view: CellView, c: Colour): string[] {
  if (view.findingCount === 0) return [];
  const out = ['  findings:'];
  for (const f of view.findings) {
    const tag = f.severity === 'error' ? c.error('error  ') : c.warning('warning');
    out.push(`    ${tag} ${f.kind}: ${brief(f.message, 1000)}`);
    // Messages usually spell the path out already; print it apart only when they do not.
    if (f.path !== null && f.path.length > 0 && !f.message.includes(' → ')) {
      const current = f.current === undefined ? '' : `  ${formatSi(f.current, 'A')}`;
      out.push(`            ${f.path.map(printable).join(' → ')}${current}`);
    }
  }
  if (view.findingCount > view.findings.length)
    out.push(c.dim(`    … ${view.findingCount - view.findings.length} more (--json lists them all)`));
  return out;
}

function extraLines(head: CellHead, tail: CellTail): string[] {
  const out: string[] = (head.found ?? []).map((f) => `  found: ${printable(foundFunctionText(f))}`);
  if (tail.power !== undefined) {
    const p = tail.power;
    out.push(
      `  power: static ${formatSi(p.averageStaticWatts, 'W')} average, dynamic ${formatSi(p.dynamicWatts, 'W')} at ${formatSi(p.frequency, 'Hz')} and ${formatSi(p.load, 'F')} per output (${p.activitySource} activity), total ${formatSi(p.totalWatts, 'W')}`,
    );
  }
  if (head.sizing !== undefined) {
    const s = head.sizing;
    const g = Object.entries(s.logicalEffort).map(
      ([k, v]) => `${printable(k)} ${v === null ? '–' : v.toFixed(2)}`,
    );
    const p = s.parasiticDelay === null ? '–' : s.parasiticDelay.toFixed(2);
    out.push(
      `  sizing: logical effort ${g.join(', ') || '–'}; parasitic delay ${p}; ${formatSi(s.load, 'F')} per output`,
    );
  }
  return out;
}

export function summaryLine(summary: Summary, what: 'vector' | 'step', c: Colour): string {
  const kinds = Object.entries(summary)
    .filter(([k, n]) => !['vectors', 'errors', 'warnings'].includes(k) && n > 0)
    .map(([k, n]) => `${k} ${n}`);
  const verdict = summary.errors > 0 ? c.error('FAIL') : c.bold('pass');
  const counts = `${count(summary.vectors, what)}, ${count(summary.errors, 'error')}, ${count(summary.warnings, 'warning')}`;
  return `  ${verdict}  ${counts}${kinds.length > 0 ? ` (${kinds.join(', ')})` : ''}`;
}

/** `1 error`, `2 errors`. */
export function count(n: number, noun: string): string {
  return `${n} ${noun}${n === 1 ? '' : 's'}`;
}
