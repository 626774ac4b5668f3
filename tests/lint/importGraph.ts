/**
 * The import graph of a source tree, read with the TypeScript compiler's own pre-processor (every
 * `import`, `import type`, `export … from` and `import()` with a relative specifier), and the cycles
 * in it (Tarjan's strongly connected components). Used by importCycles.test.ts.
 */
import { existsSync, readdirSync, readFileSync, statSync } from 'node:fs';
import path from 'node:path';
import ts from 'typescript';

/** Each file of the tree (absolute path) with the files of the same tree it imports. */
export type ImportGraph = ReadonlyMap<string, readonly string[]>;

function sourceFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const full = path.join(dir, name);
    if (statSync(full).isDirectory()) return sourceFiles(full);
    return /\.tsx?$/.test(name) && !name.endsWith('.d.ts') ? [full] : [];
  });
}

function resolveImport(from: string, specifier: string): string | null {
  const base = path.resolve(path.dirname(from), specifier);
  for (const candidate of [base, `${base}.ts`, `${base}.tsx`, path.join(base, 'index.ts')])
    if (existsSync(candidate) && statSync(candidate).isFile()) return candidate;
  return null;
}

export function importGraph(root: string): ImportGraph {
  const graph = new Map<string, string[]>();
  for (const file of sourceFiles(root)) {
    const { importedFiles } = ts.preProcessFile(readFileSync(file, 'utf8'), true, true);
    const targets = importedFiles
      .filter((ref) => ref.fileName.startsWith('.'))
      .map((ref) => resolveImport(file, ref.fileName))
      .filter((target): target is string => target !== null && target.startsWith(root + path.sep));
    graph.set(file, [...new Set(targets)]);
  }
  return graph;
}

/** Every set of nodes that import each other round a loop (a self-import included), sorted. */
export function cycles<T>(nodes: Iterable<T>, next: (node: T) => readonly T[]): T[][] {
  const index = new Map<T, number>();
  const low = new Map<T, number>();
  const stack: T[] = [];
  const onStack = new Set<T>();
  const found: T[][] = [];
  const visit = (v: T): void => {
    index.set(v, index.size);
    low.set(v, index.get(v) ?? 0);
    stack.push(v);
    onStack.add(v);
    for (const w of next(v)) {
      if (!index.has(w)) {
        visit(w);
        low.set(v, Math.min(low.get(v) ?? 0, low.get(w) ?? 0));
      } else if (onStack.has(w)) low.set(v, Math.min(low.get(v) ?? 0, index.get(w) ?? 0));
    }
    if (low.get(v) !== index.get(v)) return;
    const component: T[] = [];
    let w: T | undefined;
    do {
      w = stack.pop();
      if (w === undefined) break;
      onStack.delete(w);
      component.push(w);
    } while (w !== v);
    if (component.length > 1 || next(v).includes(v)) found.push(component);
  };
  for (const v of nodes) if (!index.has(v)) visit(v);
  return found;
}

/** The folder graph of a tree: for each pair of different folders, the file imports between them. */
export function folderImports(graph: ImportGraph, root: string): Map<string, Map<string, string[]>> {
  const folderOf = (file: string): string => {
    const parts = path.relative(root, file).split(path.sep);
    return parts.length > 1 ? (parts[0] ?? '') : '';
  };
  const out = new Map<string, Map<string, string[]>>();
  for (const [file, targets] of graph) {
    for (const target of targets) {
      const from = folderOf(file);
      const to = folderOf(target);
      if (from === to) continue;
      const row = out.get(from) ?? new Map<string, string[]>();
      out.set(from, row);
      row.set(to, [...(row.get(to) ?? []), `${path.relative(root, file)} → ${path.relative(root, target)}`]);
    }
  }
  return out;
}
