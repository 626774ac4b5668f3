/**
 * The hit-test index of the current sheet, rebuilt only when the sheet object changes (edits
 * replace it; pointer moves do not), so hovering over a large sheet costs a look-up, not a rebuild.
 */
import type { Sheet } from '../../core/sheet/types.ts';
import { buildIndex, type SheetIndex } from '../../core/sheet/hitTest.ts';

const cache = new WeakMap<Sheet, SheetIndex>();

export function indexFor(sheet: Sheet): SheetIndex {
  let index = cache.get(sheet);
  if (!index) {
    index = buildIndex(sheet);
    cache.set(sheet, index);
  }
  return index;
}
