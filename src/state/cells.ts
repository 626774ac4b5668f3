/**
 * Adding to the hierarchy from the app, each an undo step (docs/semantics.md §1): a new empty cell
 * in the open design, and an instance of another cell placed in the open one as a symbol on its
 * sheet (core/hierarchy/instanceParts.ts).
 */
import type { Cell } from '../core/document/design.ts';
import type { Instance } from '../core/model/design.ts';
import { designSizer } from '../core/hierarchy/flatten.ts';
import { EMPTY_SHEET } from '../core/sheet/edits.ts';
import { commitDoc, currentDesign, loadDesign, setSelection, showMessage, store } from './store.ts';
import { revealItems } from './view.ts';
import { freeSpot, instancePart, symbolPins } from '../core/hierarchy/instanceParts.ts';
import { nextPartId } from '../core/sheet/naming.ts';

function unusedName(prefix: string, taken: ReadonlySet<string>): string {
  let n = 1;
  while (taken.has(`${prefix}${n}`)) n++;
  return `${prefix}${n}`;
}

/** Adds an empty cell to the design and puts it on the sheet; returns its name. */
export function addCell(): string {
  const design = currentDesign();
  const name = unusedName('cell', new Set(design.cells.map((c) => c.name)));
  const cell: Cell = {
    name,
    netlist: { name, devices: [], rails: [], inputs: [], outputs: [] },
    instances: [],
    expectations: {},
    sequences: [],
    sheet: EMPTY_SHEET,
  };
  loadDesign({ ...design, cells: [...design.cells, cell], open: name });
  return name;
}

/**
 * Places an instance of `cellName` in the open cell: its symbol, generated from the cell's pins, at
 * a free spot of the sheet (touching nothing), its pins unwired until the designer wires them as for
 * any part. A placement that would make a cell place itself is refused with the loop named.
 */
export function placeInstance(cellName: string): Instance | null {
  const { doc, openCell } = store.getState();
  const design = currentDesign();
  const placed = design.cells.find((c) => c.name === cellName);
  if (placed === undefined) return null;
  const taken = new Set([
    ...openCell.instances.map((i) => i.name),
    ...openCell.netlist.devices.map((d) => d.name),
    ...doc.sheet.parts.map((p) => p.name),
  ]);
  const instance: Instance = { name: unusedName('X', taken), cell: cellName, pins: {} };
  const open: Cell = { ...openCell, instances: [...openCell.instances, instance] };
  const cells = new Map(design.cells.map((c) => [c.name, c.name === open.name ? open : c]));
  const problem = designSizer(cells).problem(open);
  if (problem?.kind === 'cycle') {
    showMessage('error', `Not placed: ${problem.message}.`);
    return null;
  }
  const pins = symbolPins(placed.netlist);
  const first = instancePart(nextPartId(doc.sheet), instance.name, placed, { x: 0, y: 0 }, pins);
  const part = { ...first, ...freeSpot(doc.sheet, first) };
  commitDoc((d) => (d === doc ? { ...d, sheet: { ...d.sheet, parts: [...d.sheet.parts, part] } } : d));
  setSelection({ parts: [part.id], wires: [] });
  revealItems({ parts: [part.id], wires: [] });
  showMessage(
    'info',
    `Placed ${instance.name} (${cellName}): wire its pins as for any part; double-click it to descend`,
  );
  return instance;
}
