/**
 * Moving between the cells of a design (docs/semantics.md §1, hierarchy): open any cell on its own,
 * descend into an instance of the open cell to see and edit the cell it places with the levels it
 * has there, go back up a path, and go to where a hierarchical name (`X1.X2.n5`) lives. None of these
 * is an undo step: they change what is shown, not the design.
 */
import type { Instance } from '../core/model/design.ts';
import { cellsByName } from '../core/hierarchy/cellDesign.ts';
import { locateName } from '../core/hierarchy/paths.ts';
import { documentFromDesign, type SheetContext } from './document.ts';
import { currentDesign, showDocument, showMessage, store } from './store.ts';

/** The path shown above the sheet: the top cell, then each instance descended into. */
export interface PathStep {
  readonly instance: string | null;
  readonly cell: string;
}

function show(cell: string, context: SheetContext | null): boolean {
  const design = currentDesign();
  if (!design.cells.some((c) => c.name === cell)) return false;
  const doc = documentFromDesign({ ...design, open: cell });
  showDocument(context === null || context.instances.length === 0 ? doc : { ...doc, context });
  const placed = store.getState().openCell.instances;
  const undrawn = store.getState().doc.instances?.length ?? 0;
  if (undrawn > 0)
    showMessage(
      'info',
      `${cell} places ${placed.map((i) => `${i.name} (${i.cell})`).join(', ')}, not drawn on this sheet: descend into them from the Instances list`,
    );
  return true;
}

/** Opens a cell on its own (not inside any other). */
export function openCellOnSheet(name: string): boolean {
  if (store.getState().doc.name === name && store.getState().doc.context === undefined) return false;
  return show(name, null);
}

/** The top cell and the instances from it down to the open cell. */
export function sheetPath(): PathStep[] {
  const { doc } = store.getState();
  const context = doc.context;
  if (context === undefined) return [{ instance: null, cell: doc.name }];
  const cells = cellsByName(currentDesign());
  const steps: PathStep[] = [{ instance: null, cell: context.top }];
  let cell = cells.get(context.top);
  for (const name of context.instances) {
    const step: Instance | undefined = cell?.instances.find((i) => i.name === name);
    if (step === undefined) break;
    steps.push({ instance: name, cell: step.cell });
    cell = cells.get(step.cell);
  }
  return steps;
}

/** Descends into an instance of the open cell, keeping the top cell analysed. */
export function descendInto(instance: string): boolean {
  const { doc, openCell } = store.getState();
  const step = openCell.instances.find((i) => i.name === instance);
  if (step === undefined) return false;
  const top = doc.context?.top ?? doc.name;
  return show(step.cell, { top, instances: [...(doc.context?.instances ?? []), instance] });
}

/** Goes back up to the given step of the path (0 is the top cell). */
export function ascendTo(level: number): boolean {
  const path = sheetPath();
  const target = path[level];
  if (target === undefined || level === path.length - 1) return false;
  const context = store.getState().doc.context;
  const instances = (context?.instances ?? []).slice(0, level);
  return show(target.cell, { top: context?.top ?? target.cell, instances });
}

/**
 * Shows the cell where a hierarchical name of the analysed cell lives, descending (or going back
 * up) as needed. False when the name is already on this sheet or nowhere in the design.
 */
export function goToName(name: string): boolean {
  const { doc, geometry } = store.getState();
  if (name in geometry.deviceParts || Object.values(geometry.wireNets).includes(name)) return false;
  const top = doc.context?.top ?? doc.name;
  const found = locateName(cellsByName(currentDesign()), top, name);
  if (found === null) return false;
  const instances = found.path.map((i) => i.name);
  const here = doc.context?.instances ?? [];
  if (instances.length === here.length && instances.every((n, i) => n === here[i])) return false;
  return show(found.cell, { top, instances });
}
