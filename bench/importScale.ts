/**
 * `node --import tsx bench/importScale.ts [--json] [--write DIR]`: CPU seconds of the netlist reader
 * on inputs that used to grow quadratically: `+` continuation lines, libraries of many cells, flat
 * netlists and hierarchical flattening to 100,000 and 1,000,000 transistors. Each case is generated
 * here, read once by `cellsFromText` (the loader the app and the command line share), and timed on
 * CPU time, which a shared machine disturbs less than wall time. Pairs of sizes give the growth
 * ratio: about 2 for twice the input when the stage is linear. `--write DIR` also saves each case's
 * file there, for a whole `railwise check` under `/usr/bin/time -v` (peak memory).
 */
import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { cellsFromText } from '../src/core/netlist-io/cellFiles.ts';

interface Case {
  readonly name: string;
  readonly size: number;
  readonly text: () => string;
}

/** One transistor line followed by `count` continuation lines of ignored parameters. */
function continuationLines(count: number): string {
  const lines = [
    '.subckt c A Y vdd gnd',
    'MP Y A vdd vdd pch W=1u L=0.25u',
    'MN Y A gnd gnd nch W=1u L=0.25u',
  ];
  for (let i = 0; i < count; i++) lines.push(`+ p${i}=1`);
  lines.push('.ends');
  return lines.join('\n');
}

/** A library of `count` inverter cells. */
function library(count: number): string {
  const lines: string[] = [];
  for (let i = 0; i < count; i++)
    lines.push(
      `.subckt inv${i} A Y vdd gnd`,
      'MP Y A vdd vdd pch W=2u L=0.25u',
      'MN Y A gnd gnd nch W=1u L=0.25u',
      '.ends',
    );
  return lines.join('\n');
}

/** A flat chain of `stages` inverters at the top level, no subcircuit: 2 transistors a stage. */
function flatChain(stages: number): string {
  const node = (i: number): string => (i === 0 ? 'A' : i === stages ? 'Y' : `n${i}`);
  const lines = ['* flat inverter chain', '.global vdd gnd'];
  for (let i = 0; i < stages; i++)
    lines.push(
      `MP${i} ${node(i + 1)} ${node(i)} vdd vdd pch W=2u L=0.25u`,
      `MN${i} ${node(i + 1)} ${node(i)} gnd gnd nch W=1u L=0.25u`,
    );
  lines.push('.end');
  return lines.join('\n');
}

/** A hierarchy of tenfold levels over an inverter pair, then `top` instances of the last level. */
function hierarchy(levels: number, top: number): string {
  const lines = [
    '.subckt h0 A Y vdd gnd',
    'MP Y A vdd vdd pch W=2u L=0.25u',
    'MN Y A gnd gnd nch W=1u L=0.25u',
    '.ends',
  ];
  for (let l = 1; l <= levels; l++) {
    lines.push(`.subckt h${l} A Y vdd gnd`);
    for (let i = 0; i < 10; i++)
      lines.push(`X${i} ${i === 0 ? 'A' : `n${i}`} ${i === 9 ? 'Y' : `n${i + 1}`} vdd gnd h${l - 1}`);
    lines.push('.ends');
  }
  lines.push('.subckt chip A Y vdd gnd');
  for (let i = 0; i < top; i++)
    lines.push(`X${i} ${i === 0 ? 'A' : `m${i}`} ${i === top - 1 ? 'Y' : `m${i + 1}`} vdd gnd h${levels}`);
  lines.push('.ends');
  return lines.join('\n');
}

const CASES: readonly Case[] = [
  { name: 'continuation lines', size: 20_000, text: () => continuationLines(20_000) },
  { name: 'continuation lines', size: 40_000, text: () => continuationLines(40_000) },
  { name: 'library cells', size: 5_000, text: () => library(5_000) },
  { name: 'library cells', size: 10_000, text: () => library(10_000) },
  { name: 'flat transistors', size: 100_000, text: () => flatChain(50_000) },
  { name: 'flat transistors', size: 1_000_000, text: () => flatChain(500_000) },
  { name: 'hierarchy transistors', size: 100_000, text: () => hierarchy(4, 5) },
  { name: 'hierarchy transistors', size: 1_000_000, text: () => hierarchy(5, 5) },
];

function cpuSeconds(since: NodeJS.CpuUsage): number {
  const used = process.cpuUsage(since);
  return (used.user + used.system) / 1e6;
}

const writeIndex = process.argv.indexOf('--write');
const writeDir = writeIndex < 0 ? undefined : process.argv[writeIndex + 1];
if (writeDir !== undefined) mkdirSync(writeDir, { recursive: true });

const results = CASES.map((c) => {
  const text = c.text();
  if (writeDir !== undefined)
    writeFileSync(join(writeDir, `${c.name.replace(/ /g, '-')}-${c.size}.sp`), text);
  const start = process.cpuUsage();
  const loaded = cellsFromText(text, `${c.name}.sp`);
  const seconds = cpuSeconds(start);
  const devices = loaded.cells.reduce((n, x) => n + ('job' in x ? x.job.netlist.devices.length : 0), 0);
  process.stderr.write(
    `import: ${c.name} ${c.size}: ${seconds.toFixed(2)} s CPU, ${loaded.cells.length} cells, ${devices} devices\n`,
  );
  return { name: c.name, size: c.size, cpuSeconds: seconds, cells: loaded.cells.length, devices };
});

const rows = results.map((r, i) => {
  const before = results[i - 1];
  const ratio =
    before !== undefined && before.name === r.name ? (r.cpuSeconds / before.cpuSeconds).toFixed(1) : '';
  return `${r.name.padEnd(22)} ${String(r.size).padStart(9)}  ${r.cpuSeconds.toFixed(2).padStart(7)} s CPU  ${ratio ? `×${ratio}` : ''}`;
});
process.stdout.write(`${rows.join('\n')}\n`);
if (process.argv.includes('--json')) process.stdout.write(`${JSON.stringify({ cases: results })}\n`);
