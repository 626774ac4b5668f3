import { parsedExpectations, VectorChecker } from '../analysis/check.ts';
import { compile } from '../compile/compile.ts';
import type { Netlist } from '../model/netlist.ts';
import { DEFAULT_TECHNOLOGY, type Technology } from '../model/technology.ts';
import { Cnf } from './cnf.ts';
import { decide, type PropertyResult } from './decide.ts';
import { CellEncoding } from './encodeCell.ts';
import { SatLimitError } from './sat.ts';
import { Search } from './search.ts';
import { propertyChecks } from './violations.ts';

export interface ProofOptions {
  readonly technology?: Technology;
  /** Expected function per output, as expression text (docs/semantics.md §4). */
  readonly expectations?: Readonly<Record<string, string>>;
  /** Table bound for this proof (default MAX_TABLE_CONTROLS); groups past it are encoded structurally. */
  readonly maxControls?: number;
  /** Called with (done, total) after each property; return false to stop. */
  readonly onProgress?: (done: number, total: number) => boolean | void;
}

export interface ProofReport {
  readonly properties: readonly PropertyResult[];
  readonly notes: readonly string[];
}

/**
 * Proves or refutes every property of docs/semantics.md §10 for all 0/1 vectors of a cell at once.
 * Throws what a check throws for unusable input (ExpressionError, CompileError).
 */
export function proveCell(netlist: Netlist, options: ProofOptions = {}): ProofReport {
  const technology = options.technology ?? DEFAULT_TECHNOLOGY;
  const expectations = new Map(parsedExpectations(netlist, options.expectations));
  const { expectations: texts, maxControls } = options;
  const checker = new VectorChecker(netlist, {
    technology,
    ...(texts === undefined ? {} : { expectations: texts }),
  });
  const cnf = new Cnf();
  const cell = new CellEncoding(
    cnf,
    compile(netlist, technology),
    new Map(),
    maxControls === undefined ? {} : { maxControls },
  );
  const checks = propertyChecks(cnf, cell, expectations);
  const search = new Search(cnf, [{ cell, checker }], netlist.inputs);
  const properties: PropertyResult[] = [];
  let halted: string | null = null;
  for (const p of checks) {
    if (
      halted === null &&
      properties.length > 0 &&
      options.onProgress?.(properties.length, checks.length) === false
    )
      halted = 'stopped before this property was decided';
    if (halted === null) {
      try {
        properties.push(decide(search, p));
        continue;
      } catch (e) {
        if (!(e instanceof SatLimitError)) throw e;
        halted = e.message;
      }
    }
    properties.push({ property: p.property, output: p.output, holds: null, reason: halted });
  }
  options.onProgress?.(checks.length, checks.length);
  return { properties, notes: encodingNotes(cell) };
}

/** How the cell was encoded: groups past the table bound, and the size of the formula. */
function encodingNotes(cell: CellEncoding): string[] {
  const structural = cell.tables.shapes.filter((s) => cell.tables.binary(s.index).kind === 'none').length;
  const total = cell.tables.shapes.length;
  return structural > 0
    ? [`${structural} of ${total} groups encoded structurally (past the table bound)`]
    : [];
}
