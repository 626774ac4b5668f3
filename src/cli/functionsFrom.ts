/**
 * `--functions-from FILE.lib`: reads a Liberty file (the only filesystem access; the reading and
 * matching are in core/liberty) and offers its power pin names to the netlist reader and its
 * published functions to the loaded cells.
 */
import { readFileSync } from 'node:fs';
import { LibertyError } from '../core/liberty/libertyLexer.ts';
import { readLiberty } from '../core/liberty/libertyCells.ts';
import { powerNames } from '../core/liberty/cellFunctions.ts';
import { applyLibrary } from '../core/liberty/applyLibrary.ts';
import type { LoadedCell } from '../core/netlist-io/cellFiles.ts';
import { UsageError } from './usage.ts';

export interface FunctionSource {
  readonly supplyNames: readonly string[];
  readonly groundNames: readonly string[];
  apply(cells: readonly LoadedCell[], notes: string[], reportUnmatched: boolean): LoadedCell[];
}

export function libraryFunctions(file: string): FunctionSource {
  let text: string;
  try {
    text = readFileSync(file, 'utf8');
  } catch (e) {
    const reason = (e as NodeJS.ErrnoException).code === 'ENOENT' ? 'no such file' : (e as Error).message;
    throw new UsageError(`--functions-from ${file}: cannot read: ${reason}`);
  }
  try {
    const library = readLiberty(text);
    const { supply, ground } = powerNames(library);
    return {
      supplyNames: supply,
      groundNames: ground,
      apply: (cells, notes, reportUnmatched) => {
        const applied = applyLibrary(cells, library, file, reportUnmatched);
        notes.push(...applied.notes);
        return applied.cells;
      },
    };
  } catch (e) {
    if (e instanceof LibertyError) throw new UsageError(`--functions-from ${file}:${e.line}: ${e.detail}`);
    throw e;
  }
}
