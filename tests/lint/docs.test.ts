/**
 * The contributor docs say only what is true of the code: every file they name exists, every
 * constant, type and function they name in code font is in the code, and the list of limits in
 * DEVELOPERS.md ("Limits") names each bound where it is declared and misses none. Our own plumbing:
 * no published source applies.
 */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';

const SKIPPED_FOLDERS = new Set([
  'node_modules',
  '.git',
  'dist',
  'dist-cli',
  'test-results',
  'playwright-report',
]);

function walk(dir: string, out: { files: string[]; folders: string[] }): void {
  for (const name of readdirSync(dir)) {
    if (SKIPPED_FOLDERS.has(name) || name.startsWith('.dist-cli')) continue;
    const full = path.join(dir, name);
    if (statSync(full).isDirectory()) {
      out.folders.push(`${full}/`);
      walk(full, out);
    } else out.files.push(full);
  }
}

const tree = { files: [] as string[], folders: [] as string[] };
walk('.', tree);
const read = (file: string): string => readFileSync(file, 'utf8');
const DOCS = [
  'DEVELOPERS.md',
  'README.md',
  ...tree.files.filter((f) => /^src\/[\w-]+\/README\.md$/.test(f.split(path.sep).join('/'))),
];
/** Every source and configuration text a doc may point into. */
const CODE = tree.files
  .filter((f) => /\.(ts|tsx|js|mjs)$/.test(f) || /^(tsconfig|package)\.json$/.test(f))
  .map(read)
  .join('\n');

/** The text of each code span of a doc. */
function codeSpans(text: string): string[] {
  return [...text.matchAll(/`([^`\n]+)`/g)].map((m) => m[1] ?? '');
}

/** A span that names a file or folder of the repository (not a pattern, an extension or a build output). */
function namedPath(span: string): string | null {
  if (/[<>{}*\s]/.test(span) || span.startsWith('-') || span.startsWith('dist')) return null;
  if (!/\.(ts|tsx|js|mjs|json|md)$/.test(span) && !/^[\w.-]+\/([\w.-]+\/)*$/.test(span)) return null;
  if (/^\.\w+$/.test(span)) return null;
  return span.replace(/^\.\//, '');
}

function exists(named: string): boolean {
  const pool = named.endsWith('/') ? tree.folders : tree.files;
  return pool.some((f) => {
    const p = f.split(path.sep).join('/');
    return p === named || p.endsWith(`/${named}`);
  });
}

/** Constants, types and functions in code font: `MAX_DEPTH`, `LaneHost`, `analyseCell(…)`. */
function namedIdentifier(span: string): string | null {
  const id = /^([A-Za-z_][\w]*)(\(|$)/.exec(span)?.[1];
  if (id === undefined) return null;
  const constant = /^[A-Z][A-Z0-9]*(_[A-Z0-9]+)+$/.test(id);
  const pascal = /^[A-Z][a-z0-9]+[A-Z]\w*$/.test(id);
  const camel = /^[a-z][a-z0-9]*[A-Z]\w*$/.test(id);
  return constant || pascal || camel ? id : null;
}

describe.each(DOCS)('%s', (doc) => {
  const spans = codeSpans(read(doc));

  it('names only files and folders that exist', () => {
    const named = spans.map(namedPath).filter((p): p is string => p !== null);
    expect(named.filter((p) => !exists(p))).toEqual([]);
  });

  it('names only identifiers that are in the code', () => {
    const named = [...new Set(spans.map(namedIdentifier).filter((id): id is string => id !== null))];
    expect(named.filter((id) => !new RegExp(`\\b${id}\\b`).test(CODE))).toEqual([]);
  });
});

describe('the list of limits in DEVELOPERS.md', () => {
  const text = read('DEVELOPERS.md');
  const start = text.indexOf('## Limits');
  const section = text.slice(start, text.indexOf('\n## ', start + 1));
  const rows = section
    .split('\n')
    .filter((line) => line.startsWith('| ') && !line.startsWith('| **') && !line.startsWith('| limit |'))
    .map((line) => line.split(' | ')[1] ?? '');

  it('is read from the doc', () => {
    expect(DOCS.length).toBeGreaterThan(5);
    expect(codeSpans(read('DEVELOPERS.md')).map(namedPath).filter(Boolean).length).toBeGreaterThan(100);
  });

  it('names each bound in a file of its row', () => {
    expect(rows.length).toBeGreaterThan(40);
    const misplaced: string[] = [];
    for (const where of rows) {
      const spans = codeSpans(where);
      const files = spans
        .filter((s) => /\.tsx?$/.test(s))
        .map((s) =>
          tree.files.find(
            (f) => f.split(path.sep).join('/').endsWith(`src/${s}`) || f.endsWith(`src/core/${s}`),
          ),
        );
      const names = spans.filter((s) => !/\.tsx?$/.test(s)).map((s) => s.split('.')[0] ?? s);
      for (const name of names) {
        const declared = new RegExp(`\\b(const|class|function)\\s+${name}\\b`);
        if (!files.some((f) => f !== undefined && declared.test(read(f))))
          misplaced.push(`${name} (${where})`);
      }
    }
    expect(misplaced).toEqual([]);
  });

  it('misses no MAX_ constant of src', () => {
    const bounds = [...new Set([...CODE.matchAll(/\bconst (MAX_\w+)/g)].map((m) => m[1] ?? ''))];
    expect(bounds.length).toBeGreaterThan(20);
    expect(bounds.filter((name) => !section.includes(`\`${name}\``))).toEqual([]);
  });
});

describe('the worker lanes the docs name', () => {
  const protocol = read('src/worker/protocol.ts');
  const union = /export type AnalysisJob =([^;]+);/.exec(protocol)?.[1] ?? '';
  const kinds = union
    .split('|')
    .map((name) => name.trim())
    .map(
      (name) => new RegExp(`interface ${name} [^{]*\\{[^}]*?readonly kind: '([\\w-]+)'`).exec(protocol)?.[1],
    );
  const NUMBERS = ['zero', 'one', 'two', 'three', 'four', 'five', 'six', 'seven', 'eight', 'nine', 'ten'];

  it('are read from the protocol', () => {
    expect(kinds.length).toBeGreaterThan(6);
    expect(kinds.every((k) => k !== undefined)).toBe(true);
  });

  it.each([
    ['DEVELOPERS.md', /There are (\w+) \(`JobLane`[^:]*:([^.]*)\./],
    ['src/worker/README.md', /- (\w+) lanes, one worker each[^:]*:([^.]*)\./],
  ])('are the job kinds of worker/protocol.ts in %s', (doc, pattern) => {
    const m = pattern.exec(read(doc).replace(/\s+/g, ' '));
    expect(m).not.toBeNull();
    expect(NUMBERS.indexOf((m?.[1] ?? '').toLowerCase())).toBe(kinds.length);
    expect(codeSpans(m?.[2] ?? '')).toEqual(kinds);
  });
});
