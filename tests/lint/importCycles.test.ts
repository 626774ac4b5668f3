/**
 * No import cycles: no two files of src/ import each other round a loop, and the folders of src/core
 * stand in the one order of CORE_ORDER (eslint.layers.js; DEVELOPERS.md, "Layers"), each importing
 * only folders below it. Type-only imports count: a cycle of types still ties the folders together.
 * Our own plumbing: no published source applies.
 */
import { mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { CORE_ORDER } from '../../eslint.layers.js';
import { cycles, folderImports, importGraph } from './importGraph.ts';

const SRC = path.resolve('src');
const CORE = path.join(SRC, 'core');

describe('the cycle finder', () => {
  it('finds loops and self-imports, and nothing in a tree', () => {
    const edges: Record<string, string[]> = { a: ['b'], b: ['c'], c: ['a', 'd'], d: ['e'], e: [], f: ['f'] };
    const found = cycles(Object.keys(edges), (n) => edges[n] ?? []);
    expect(found.map((c) => [...c].sort())).toEqual([['a', 'b', 'c'], ['f']]);
    expect(cycles(['d', 'e'], (n) => edges[n] ?? [])).toEqual([]);
  });

  const tree = mkdtempSync(path.join(tmpdir(), 'railwise-imports-'));
  afterAll(() => rmSync(tree, { recursive: true, force: true }));

  it('reads type imports, re-exports and dynamic imports from source files', () => {
    mkdirSync(path.join(tree, 'low'));
    mkdirSync(path.join(tree, 'high'));
    writeFileSync(
      path.join(tree, 'low', 'a.ts'),
      `import type { B } from '../high/b.ts';\nexport type A = B;\n`,
    );
    writeFileSync(path.join(tree, 'high', 'b.ts'), `export { c } from './c.ts';\nexport type B = number;\n`);
    writeFileSync(path.join(tree, 'high', 'c.ts'), `export const c = () => import('../low/a.ts');\n`);
    const graph = importGraph(tree);
    const [loop] = cycles(graph.keys(), (f) => graph.get(f) ?? []);
    expect(loop?.map((f) => path.relative(tree, f)).sort()).toEqual(['high/b.ts', 'high/c.ts', 'low/a.ts']);
    expect([...(folderImports(graph, tree).get('low')?.keys() ?? [])]).toEqual(['high']);
  });
});

describe('the import graph of src', () => {
  const graph = importGraph(SRC);

  it('reads every source file', () => {
    expect(graph.size).toBeGreaterThan(300);
    const edges = [...graph.values()].reduce((n, targets) => n + targets.length, 0);
    expect(edges).toBeGreaterThan(graph.size);
  });

  it('has no cycle between files', () => {
    const loops = cycles(graph.keys(), (f) => graph.get(f) ?? []).map((loop) =>
      loop.map((f) => path.relative(SRC, f)).sort(),
    );
    expect(loops).toEqual([]);
  });
});

describe('the folders of src/core', () => {
  const graph = importGraph(CORE);
  const folders = readdirSync(CORE).filter((name) => statSync(path.join(CORE, name)).isDirectory());

  it('are each placed once in CORE_ORDER', () => {
    expect([...CORE_ORDER].sort()).toEqual([...folders].sort());
    expect(new Set(CORE_ORDER).size).toBe(CORE_ORDER.length);
  });

  it('import only folders below them (files directly in src/core sit below all)', () => {
    const rank = (folder: string): number => (folder === '' ? -1 : CORE_ORDER.indexOf(folder));
    const upward: string[] = [];
    for (const [from, row] of folderImports(graph, CORE))
      for (const [to, files] of row) if (rank(to) >= rank(from)) upward.push(...files);
    expect(upward).toEqual([]);
  });

  it('are listed bottom first in DEVELOPERS.md, "Layers"', () => {
    const text = readFileSync('DEVELOPERS.md', 'utf8');
    const section = text.slice(
      text.indexOf('## Layers'),
      text.indexOf('\n## ', text.indexOf('## Layers') + 1),
    );
    const listed = [...section.matchAll(/^\| `([\w-]+)` \|/gm)].map((m) => m[1]);
    expect(listed).toEqual(CORE_ORDER);
  });
});
