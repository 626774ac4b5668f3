/**
 * Checks loaded cells against a library's published functions (docs/semantics.md §4): each cell
 * takes its pins and expected functions from the Liberty cell of the same name; sequential cells
 * are set aside with the reason (a sweep from unknown charge cannot check a flip-flop's function);
 * a cell the library does not describe, and a library cell no file holds, get a note.
 */
import type { LoadedCell } from '../netlist-io/cellFiles.ts';
import { assignPins, PinError } from '../netlist-io/pins.ts';
import type { LibertyCell, LibertyLibrary } from './libertyCells.ts';
import { cellFunctions } from './cellFunctions.ts';

export interface AppliedLibrary {
  readonly cells: LoadedCell[];
  /** Notes about the run: library cells that no file holds. */
  readonly notes: string[];
}

export function applyLibrary(
  cells: readonly LoadedCell[],
  library: LibertyLibrary,
  source: string,
  reportUnmatched: boolean,
): AppliedLibrary {
  const byName = new Map(library.cells.map((c) => [c.name.toLowerCase(), c]));
  const seen = new Set<string>();
  const out = cells.map((c): LoadedCell => {
    if (!('job' in c)) return c;
    const lib = byName.get(c.job.cell.toLowerCase());
    if (lib !== undefined) seen.add(lib.name.toLowerCase());
    return applyOne(c.job, lib, source);
  });
  const missing = library.cells.filter((c) => !seen.has(c.name.toLowerCase())).map((c) => c.name);
  const notes =
    reportUnmatched && missing.length > 0
      ? [`${missing.length} cells of ${source} are in no netlist given: ${missing.join(', ')}`]
      : [];
  return { cells: out, notes };
}

type Job = Extract<LoadedCell, { job: unknown }>['job'];

function applyOne(job: Job, lib: LibertyCell | undefined, source: string): LoadedCell {
  if (lib === undefined)
    return {
      job: {
        ...job,
        notes: [...job.notes, `no cell ${job.cell} in ${source}: checked without its published function`],
      },
    };
  if (lib.sequential !== null) {
    const reason = `sequential (a ${lib.sequential} group in ${source}, line ${lib.line}): a sweep from unknown charge cannot check its function`;
    return { skipped: { file: job.file, cell: job.cell, reason } };
  }
  const f = cellFunctions(lib, job.netlist, source);
  const notes = [...job.notes, ...f.notes];
  let netlist = job.netlist;
  if (!job.pinsNamed && (f.inputs.length > 0 || f.outputs.length > 0)) {
    try {
      netlist = assignPins(netlist, { inputs: f.inputs, outputs: f.outputs });
      notes.push(
        `pins from ${source}: inputs ${f.inputs.join(', ') || 'none'}; outputs ${f.outputs.join(', ') || 'none'}`,
      );
    } catch (e) {
      if (!(e instanceof PinError)) throw e;
      notes.push(`pins of ${source} not used: ${e.message}`);
    }
  }
  const expectations = { ...job.expectations, ...f.expectations };
  const expectationLines = Object.fromEntries(
    Object.entries(job.expectationLines).filter(([output]) => !(output in f.expectations)),
  );
  if (Object.keys(f.expectations).length === 0)
    notes.push(`no output of ${job.cell} has a function in ${source}`);
  return { job: { ...job, netlist, expectations, expectationLines, notes } };
}
