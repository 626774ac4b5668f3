/**
 * Editing actions on the current selection, as plain functions shared by the toolbar, the
 * keyboard and the tests. Each document change is one undo step (commitDoc). Turn, Flip and the
 * nudges never change connectivity (./arrange.ts); duplicate and paste land in free space.
 */
import type { PartKind, Sheet } from '../core/sheet/types.ts';
import { deleteItems, SheetEditError, updatePart, type PartPatch } from '../core/sheet/edits.ts';
import { mirrorItems, moveItems, rotateItems } from '../core/sheet/transform.ts';
import { copyItems, pasteClip } from '../core/sheet/clipboard.ts';
import { freeOffset } from '../core/sheet/freeSpace.ts';
import { isEmptyItems, type ItemIds } from '../core/sheet/selection.ts';
import { commitDoc, setClipboard, setSelection, setTool, showMessage, store } from '../state/store.ts';
import { judgeSheet, refuse } from './arrange.ts';

const selected = (): ItemIds => store.getState().selection.selected;

function editSelection(edit: (sheet: Sheet, ids: ItemIds) => Sheet): void {
  const ids = selected();
  if (isEmptyItems(ids)) return;
  commitDoc((doc) => ({ ...doc, sheet: edit(doc.sheet, ids) }));
}

/** An arrangement of the selection, carried out only if it keeps the circuit as it is. */
function arrangeSelection(verb: string, edit: (sheet: Sheet, ids: ItemIds) => Sheet): void {
  const ids = selected();
  if (isEmptyItems(ids)) return;
  const next = edit(currentSheet(), ids);
  const verdict = judgeSheet(next);
  if (verdict.unasked.length > 0) refuse(verb, verdict);
  else commitDoc((doc) => ({ ...doc, sheet: next }));
}

function currentSheet(): Sheet {
  return store.getState().doc.sheet;
}

export function rotateSelection(): void {
  arrangeSelection('Turn', rotateItems);
}

export function mirrorSelection(): void {
  arrangeSelection('Flip', mirrorItems);
}

export function deleteSelection(): void {
  editSelection(deleteItems);
  setSelection({ parts: [], wires: [] });
}

export function nudgeSelection(dx: number, dy: number): void {
  arrangeSelection('Nudge', (sheet, ids) => moveItems(sheet, ids, dx, dy));
}

export function copySelection(): void {
  if (!isEmptyItems(selected())) setClipboard(copyItems(currentSheet(), selected()));
}

export function cutSelection(): void {
  copySelection();
  deleteSelection();
}

/**
 * Pastes the clipboard at the nearest spot beside where it was copied where it touches nothing
 * (core/sheet/freeSpace.ts), and selects it. Copied names (pins, rails, labels) still join their
 * nets by name.
 */
export function pasteClipboard(): void {
  const clip = store.getState().clipboard;
  if (!clip || (clip.parts.length === 0 && clip.wires.length === 0)) return;
  let pasted: ItemIds = { parts: [], wires: [] };
  commitDoc((doc) => {
    const offset = freeOffset(doc.sheet, clip.parts, clip.wires) ?? { x: 0, y: 0 };
    const r = pasteClip(doc.sheet, clip, offset.x, offset.y);
    pasted = r.pasted;
    return { ...doc, sheet: r.sheet };
  });
  setSelection(pasted);
  // A second paste lands further on, not on top of the first.
  setClipboard(copyItems(currentSheet(), pasted));
}

export function duplicateSelection(): void {
  if (isEmptyItems(selected())) return;
  copySelection();
  pasteClipboard();
}

export function selectAll(): void {
  const sheet = currentSheet();
  setSelection({ parts: sheet.parts.map((p) => p.id), wires: sheet.wires.map((w) => w.id) });
}

export function startPlacing(kind: PartKind): void {
  setTool({ mode: 'place', kind });
}

export function startWiring(): void {
  setTool({ mode: 'wire' });
}

/** Changes part properties from the form; a bad value is a message, and the sheet is unchanged. */
export function editPart(partId: string, patch: PartPatch): boolean {
  try {
    commitDoc((doc) => ({ ...doc, sheet: updatePart(doc.sheet, partId, patch) }));
    return true;
  } catch (e) {
    if (e instanceof SheetEditError) {
      showMessage('error', e.message);
      return false;
    }
    throw e;
  }
}
