/**
 * Mutated inputs through the whole command, in-process: the shared core of the fuzz test in the
 * suite and of the longer campaign run by hand (`RAILWISE_FUZZ_RUNS=5000`). Each case ends as
 * `clean` (exit 0 or 1, a report that parses), `refusal` (exit 2 with one JSON document whose every
 * error names the file and a line or a field) or `bad` (anything else: an internal error, output
 * that does not parse, a refusal that names no place). Only `bad` fails.
 */
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import fc from 'fast-check';
import { HOSTILE_NAMES } from '../fixtures/hostileNames.ts';
import { railwise } from './inProcess.ts';

export { Tally, type Case, type Outcome } from '../fuzzTally.ts';
import type { Case } from '../fuzzTally.ts';

const dir = mkdtempSync(join(tmpdir(), 'railwise-fuzz-'));
/** Removes the cases' files, unless RAILWISE_FUZZ_KEEP is set (to read the bad ones). */
export function removeFuzzFiles(): void {
  if (process.env['RAILWISE_FUZZ_KEEP'] !== undefined) return;
  rmSync(dir, { recursive: true, force: true });
}

let counter = 0;
export function fuzzFile(extension: string, text: string): string {
  const path = join(dir, `case-${counter++}${extension}`);
  writeFileSync(path, text);
  return path;
}

/** Every `error` object in a report: the top-level one and each cell's. */
function errorsOf(doc: Record<string, unknown>): Record<string, unknown>[] {
  const cells = Array.isArray(doc['cells']) ? (doc['cells'] as Record<string, unknown>[]) : [doc];
  return cells.flatMap((c) =>
    typeof c['error'] === 'object' && c['error'] !== null ? [c['error'] as Record<string, unknown>] : [],
  );
}

/** Runs `railwise check FILE --json` and judges the result. */
export async function checkCase(file: string, ...flags: string[]): Promise<Case> {
  const r = await railwise('check', file, '--json', ...flags);
  if (/internal error/i.test(r.out + r.err))
    return { outcome: 'bad', why: `internal error: ${r.err.slice(0, 300)}` };
  let doc: Record<string, unknown>;
  try {
    doc = JSON.parse(r.out) as Record<string, unknown>;
  } catch {
    return { outcome: 'bad', why: `output does not parse: ${r.out.slice(0, 200)}` };
  }
  if (r.status === 0 || r.status === 1) return { outcome: 'clean', why: '' };
  if (r.status !== 2) return { outcome: 'bad', why: `exit status ${r.status}` };
  const errors = errorsOf(doc);
  if (errors.length === 0) return { outcome: 'bad', why: 'exit 2 with no error in the report' };
  const unplaced = errors.find((e) => e['line'] === undefined && e['field'] === undefined);
  if (unplaced !== undefined)
    return { outcome: 'bad', why: `refusal names no line or field: ${String(unplaced['message'])}` };
  return { outcome: 'refusal', why: '' };
}

/** Text mutations a careless script or an attacker might make, each at a random place. */
const HOSTILE_SNIPPETS = [
  '\n',
  '\r\n',
  '\n+ ',
  '\n* railwise: expect Y = ',
  '\n* railwise: inputs __proto__',
  '\n.subckt x a b\n',
  '\n.ends\n',
  '\n.end\n',
  '1e400',
  '1e-320',
  '-1',
  '0',
  'NaN',
  '__proto__',
  '(',
  '{',
  '"',
  '\u0000',
  '\u001b[2J',
  '\ud800',
  '!'.repeat(3000),
  '('.repeat(2000),
  'A&'.repeat(2000),
  ' m=1e18',
  ' W=1e300',
  '\nX1 a b nosuch\n',
  '\nV1 vdd 0 DC 1e400\n',
  '\nR9 a b 1e-300\n',
  ',',
  ']',
  '}',
  ': 1e400',
  ': -5',
  '": {"x": 1e7}',
];

export const mutation: fc.Arbitrary<(text: string) => string> = fc.oneof(
  fc.tuple(fc.nat(), fc.nat(40)).map(
    ([at, n]) =>
      (t: string) =>
        cut(t, at, n),
  ),
  fc.tuple(fc.nat(), fc.constantFrom(...HOSTILE_SNIPPETS)).map(
    ([at, s]) =>
      (t: string) =>
        insert(t, at, s),
  ),
  fc.tuple(fc.nat(), fc.string({ maxLength: 12 })).map(
    ([at, s]) =>
      (t: string) =>
        insert(t, at, s),
  ),
  fc.tuple(fc.nat(), fc.nat()).map(
    ([a, b]) =>
      (t: string) =>
        swapLines(t, a, b),
  ),
  fc.tuple(fc.nat(), fc.constantFrom('1e400', '-3', '0', '1e-320', '9e15', '1e7', '0.5')).map(
    ([k, n]) =>
      (t: string) =>
        replaceNth(t, /-?\d+(\.\d+)?(e[-+]?\d+)?/g, k, n),
  ),
  fc.tuple(fc.nat(), fc.constantFrom(...HOSTILE_NAMES, 'VDD', 'GND', '')).map(
    ([k, name]) =>
      (t: string) =>
        replaceNth(t, /"(?:[^"\\]|\\.)*"/g, k, JSON.stringify(name)),
  ),
);

/** The text with its k-th match (counted round) replaced. */
function replaceNth(t: string, pattern: RegExp, k: number, by: string): string {
  const matches = [...t.matchAll(pattern)];
  const m = matches[k % Math.max(1, matches.length)];
  return m?.index === undefined ? t : t.slice(0, m.index) + by + t.slice(m.index + m[0].length);
}

function cut(t: string, at: number, n: number): string {
  const i = t.length === 0 ? 0 : at % t.length;
  return t.slice(0, i) + t.slice(i + n);
}

function insert(t: string, at: number, s: string): string {
  const i = at % (t.length + 1);
  return t.slice(0, i) + s + t.slice(i);
}

function swapLines(t: string, a: number, b: number): string {
  const lines = t.split('\n');
  const [i, j] = [a % lines.length, b % lines.length];
  [lines[i], lines[j]] = [lines[j] as string, lines[i] as string];
  return lines.join('\n');
}
