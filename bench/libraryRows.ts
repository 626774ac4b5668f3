/**
 * CPU time of what the library view does with an 80-cell library of about 2,000 transistors: read
 * the netlist into a design, then check every cell (the worker's library job). `npm run bench:library`.
 */
import { cpuUsage } from 'node:process';
import { importSpice } from '../src/core/netlist-io/spiceImport.ts';
import { designFromImport } from '../src/core/netlist-io/spiceDesign.ts';
import { DEFAULT_TECHNOLOGY } from '../src/core/model/technology.ts';
import { checkLibraryCell } from '../src/core/analysis/libraryCheck.ts';
import { tidewaterLibrary } from './generators/library.ts';

function cpuSeconds(run: () => void): number {
  const before = cpuUsage();
  run();
  const used = cpuUsage(before);
  return (used.user + used.system) / 1e6;
}

const text = tidewaterLibrary(80, 6);
let design = designFromImport(importSpice(text, 'tidewater.sp'), DEFAULT_TECHNOLOGY, 'tidewater');
const read = cpuSeconds(() => {
  design = designFromImport(importSpice(text, 'tidewater.sp'), DEFAULT_TECHNOLOGY, 'tidewater');
});
const transistors = design.cells.reduce((n, c) => n + c.netlist.devices.length, 0);
let failing = 0;
const check = cpuSeconds(() => {
  failing = design.cells
    .map((c) => checkLibraryCell(design, c.name))
    .filter((r) => r.status !== 'pass').length;
});
console.log(
  `library of ${design.cells.length} cells, ${transistors} transistors: read ${read.toFixed(3)} s CPU, every row checked ${check.toFixed(3)} s CPU (${failing} not passing)`,
);
