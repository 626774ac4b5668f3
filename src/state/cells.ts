/**
 * Adding to the hierarchy from the app, each an undo step (docs/semantics.md §1): a new empty cell
 * in the open design, and an instance of another cell placed in the open one. Until instances have
 * symbols of their own on the sheet, a placed instance is wired by name: each of its pins to the net
 * of the same name in this cell (draw a net label or pin of that name to connect it).
 */
import type { Cell, Instance } from '../core/model/design.ts';
import { designSizer } from '../core/hierarchy/flatten.ts';
import { EMPTY_SHEET } from '../core/sheet/edits.ts';
import { commitDoc, currentDesign, loadDesign, showMessage, store } from './store.ts';

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
 * Places an instance of `cellName` in the open cell, its pins wired to the nets of the same names.
 * A placement that would make a cell place itself is refused with the loop named.
 */
export function placeInstance(cellName: string): Instance | null {
  const { doc, openCell } = store.getState();
  const design = currentDesign();
  const placed = design.cells.find((c) => c.name === cellName);
  if (placed === undefined) return null;
  const taken = new Set([
    ...openCell.instances.map((i) => i.name),
    ...openCell.netlist.devices.map((d) => d.name),
  ]);
  const pins = [...placed.netlist.inputs, ...placed.netlist.outputs];
  const instance: Instance = {
    name: unusedName('X', taken),
    cell: cellName,
    pins: Object.fromEntries(pins.map((p) => [p, p])),
  };
  const open: Cell = { ...openCell, instances: [...openCell.instances, instance] };
  const cells = new Map(design.cells.map((c) => [c.name, c.name === open.name ? open : c]));
  const problem = designSizer(cells).problem(open);
  if (problem?.kind === 'cycle') {
    showMessage('error', `Not placed: ${problem.message}.`);
    return null;
  }
  commitDoc((d) => (d === doc ? { ...d, instances: open.instances } : d));
  showMessage(
    'info',
    `Placed ${instance.name} (${cellName}); its pins join the nets named ${pins.join(', ') || 'nothing'}`,
  );
  return instance;
}
