/**
 * `node --import tsx bench/sheet/profileSummary.ts FILE.cpuprofile…`: sums a sampling CPU profile
 * (the DevTools `.cpuprofile` shape, as `npm run bench:sheet -- --profile DIR` writes them) by
 * function: time of its own ("self") and time with everything it called ("total", a recursive
 * function counted once per sample), the largest first. Names read best from a build made without
 * minifying (`npx vite build --minify false`, then `bench:sheet -- --no-build --profile DIR`).
 */
import { readFileSync } from 'node:fs';
import { basename } from 'node:path';
import { formatTable } from '../table.ts';

/** The parts of a DevTools `.cpuprofile` read here (the protocol's `Profiler.Profile`). */
interface CpuProfile {
  readonly nodes: readonly ProfileNode[];
  readonly startTime: number;
  readonly endTime: number;
  readonly samples?: readonly number[];
  readonly timeDeltas?: readonly number[];
}

interface ProfileNode {
  readonly id: number;
  readonly callFrame: { readonly functionName: string; readonly url: string; readonly lineNumber: number };
  readonly children?: readonly number[];
}

interface ProfileRow {
  readonly name: string;
  readonly ms: number;
}

interface ProfileSummary {
  readonly totalMs: number;
  readonly idleMs: number;
  readonly self: readonly ProfileRow[];
  readonly total: readonly ProfileRow[];
}

const IDLE = new Set(['(idle)', '(program)', '(garbage collector)']);

function nameOf(node: ProfileNode): string {
  const f = node.callFrame;
  const file = f.url.replace(/^.*\//, '');
  return file === ''
    ? f.functionName || '(anonymous)'
    : `${f.functionName || '(anonymous)'} ${file}:${f.lineNumber + 1}`;
}

function top(map: Map<string, number>, rows: number): ProfileRow[] {
  return [...map.entries()]
    .sort((a, b) => b[1] - a[1])
    .slice(0, rows)
    .map(([name, us]) => ({ name, ms: us / 1000 }));
}

function profileSummary(profile: CpuProfile, rows = 30): ProfileSummary {
  const byId = new Map(profile.nodes.map((n) => [n.id, n]));
  const parent = new Map<number, number>();
  for (const n of profile.nodes) for (const c of n.children ?? []) parent.set(c, n.id);
  const self = new Map<string, number>();
  const total = new Map<string, number>();
  let all = 0;
  let idle = 0;
  const samples = profile.samples ?? [];
  const deltas = profile.timeDeltas ?? [];
  samples.forEach((id, i) => {
    const us = deltas[i + 1] ?? 0; // a sample's time runs to the next one
    const node = byId.get(id);
    if (node === undefined) return;
    all += us;
    const name = nameOf(node);
    if (node.callFrame.functionName === '(idle)') idle += us;
    self.set(name, (self.get(name) ?? 0) + us);
    const seen = new Set<string>();
    for (let at: number | undefined = id; at !== undefined; at = parent.get(at)) {
      const n = byId.get(at);
      if (n === undefined || IDLE.has(n.callFrame.functionName) || n.callFrame.functionName === '(root)')
        continue;
      seen.add(nameOf(n));
    }
    for (const s of seen) total.set(s, (total.get(s) ?? 0) + us);
  });
  return { totalMs: all / 1000, idleMs: idle / 1000, self: top(self, rows), total: top(total, rows) };
}

function printSummary(file: string): void {
  const summary = profileSummary(JSON.parse(readFileSync(file, 'utf8')) as CpuProfile);
  console.log(
    `\n${basename(file)}: ${summary.totalMs.toFixed(0)} ms sampled, ${summary.idleMs.toFixed(0)} ms idle`,
  );
  console.log(
    formatTable(
      ['self ms', 'function'],
      summary.self.map((r) => [r.ms.toFixed(1), r.name]),
    ),
  );
  console.log(
    formatTable(
      ['total ms', 'function'],
      summary.total.map((r) => [r.ms.toFixed(1), r.name]),
    ),
  );
}

for (const file of process.argv.slice(2)) printSummary(file);
