/**
 * One row of the library view per cell of a design: its pins, transistor count (flattened), the
 * expected function or, where there is none, the function it computes, and the check result
 * (docs/semantics.md §3–§4). A cell that cannot be flattened or checked is a row that says why:
 * never a pass.
 */
import type { Design } from '../document/design.ts';
import { cellDesign } from '../hierarchy/cellDesign.ts';
import { HierarchyError } from '../hierarchy/flatten.ts';
import { ExpressionError } from '../expect/parse.ts';
import { foundFunctions, type FoundFunction } from './foundFunction.ts';
import { expressionProblem } from '../expect/problems.ts';
import { checkSweep } from './check.ts';
import type { CheckReport, FindingKind } from './report.ts';
import { SweepLimitError } from './vectors.ts';

export type LibraryStatus = 'pass' | 'fail' | 'unusable';

export interface LibraryRow {
  readonly cell: string;
  readonly inputs: readonly string[];
  readonly outputs: readonly string[];
  /** NMOS and PMOS after flattening. */
  readonly transistors: number;
  readonly instances: number;
  readonly expectations: Readonly<Record<string, string>>;
  /** What each output computes, read off the sweep. */
  readonly found: readonly FoundFunction[];
  readonly status: LibraryStatus;
  readonly errors: number;
  readonly warnings: number;
  /** Findings by kind, only those that occur. */
  readonly kinds: Readonly<Partial<Record<FindingKind, number>>>;
  /** Why the cell could not be checked, or notes of the check. */
  readonly message: string | null;
}

/** Checks one cell of the design: flatten, sweep with its usable expected functions, read its function. */
export function checkLibraryCell(design: Design, name: string): LibraryRow {
  const cell = design.cells.find((c) => c.name === name);
  const base = {
    cell: name,
    inputs: cell?.netlist.inputs ?? [],
    outputs: cell?.netlist.outputs ?? [],
    transistors: 0,
    instances: cell?.instances.length ?? 0,
    expectations: cell?.expectations ?? {},
    found: [],
    errors: 0,
    warnings: 0,
    kinds: {},
  };
  try {
    const one = cellDesign(design, name);
    const { inputs, outputs } = one.netlist;
    const usable = Object.fromEntries(
      Object.entries(one.expectations).filter(
        ([out, text]) => outputs.includes(out) && expressionProblem(text, inputs) === null,
      ),
    );
    const report = checkSweep(one.netlist, { technology: one.technology, expectations: usable });
    const skipped = Object.keys(one.expectations).length - Object.keys(usable).length;
    return {
      ...base,
      transistors: one.netlist.devices.filter((d) => d.kind === 'nmos' || d.kind === 'pmos').length,
      ...verdict(report),
      found: foundFunctions(report),
      message: skipped > 0 ? `${skipped} expected function(s) do not parse and were not checked` : null,
    };
  } catch (e) {
    if (e instanceof HierarchyError || e instanceof SweepLimitError || e instanceof ExpressionError)
      return { ...base, status: 'unusable', message: e.message };
    throw e;
  }
}

function verdict(report: CheckReport): Pick<LibraryRow, 'status' | 'errors' | 'warnings' | 'kinds'> {
  const kinds: Partial<Record<FindingKind, number>> = {};
  for (const f of report.findings) kinds[f.kind] = (kinds[f.kind] ?? 0) + 1;
  const { errors, warnings } = report.summary;
  return { status: errors > 0 ? 'fail' : 'pass', errors, warnings, kinds };
}
