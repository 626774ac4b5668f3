/**
 * CPU time of what the library view does with an 80-cell library of about 2,000 transistors: read
 * the netlist into a design, then check every cell (the worker's library job); then descending into
 * an instance and back through the store. `npm run bench:library`.
 */
import { cpuUsage } from 'node:process';
import { importSpice } from '../src/core/netlist-io/spiceImport.ts';
import { designFromImport } from '../src/core/netlist-io/spiceDesign.ts';
import { DEFAULT_TECHNOLOGY } from '../src/core/model/technology.ts';
import { checkLibraryCell } from '../src/core/analysis/libraryCheck.ts';
import { tidewaterLibrary } from './generators/library.ts';
import { loadDesign, resetStore } from '../src/state/store.ts';
import { ascendTo, descendInto } from '../src/state/navigation.ts';

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

// Descending into an instance and back, as the page's store does it (derivation, placement of the
// cell, names of the placement), on a top cell that places four chains in a row. The same library.
const chain = design.cells[0]!;
const top = {
  name: 'tw_top',
  netlist: { name: 'tw_top', devices: [], rails: [], inputs: ['A', 'B'], outputs: ['Y'] },
  instances: [0, 1, 2, 3].map((k) => ({
    name: `X${k}`,
    cell: chain.name,
    pins: { A: k === 0 ? 'A' : `m${k}`, B: 'B', Y: k === 3 ? 'Y' : `m${k + 1}`, vdd: 'vdd', gnd: 'gnd' },
  })),
  expectations: {},
  sequences: [],
};
resetStore();
loadDesign({ ...design, cells: [...design.cells, top], open: 'tw_top' });
descendInto('X2');
ascendTo(0);
const trips = 50;
const trip = cpuSeconds(() => {
  for (let i = 0; i < trips; i++) {
    descendInto('X2');
    ascendTo(0);
  }
});
console.log(
  `descend into an instance and back (store only, no drawing): ${((trip / trips) * 1000).toFixed(1)} ms CPU per round trip`,
);
