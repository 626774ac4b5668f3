/**
 * Placing a part: a ghost follows the pointer (snapped); a click places the part and selects it.
 * Shift-click keeps the tool for another of the same kind; otherwise the select tool returns.
 */
import type { PartKind } from '../../core/sheet/types.ts';
import { snapPoint } from '../../core/sheet/geometry.ts';
import { addPart } from '../../core/sheet/edits.ts';
import { commitDoc, setGesture, setSelection, store } from '../../state/store.ts';
import type { ToolMachine } from './types.ts';

export function createPlaceTool(kind: PartKind, onDone: () => void): ToolMachine {
  return {
    name: 'place',
    state: () => 'ghost',
    down() {},
    move(e) {
      setGesture({ type: 'ghost', kind, at: snapPoint(e.at) });
    },
    up(e) {
      if (e.button !== 0) return;
      commitDoc((doc) => ({ ...doc, sheet: addPart(doc.sheet, { kind, at: snapPoint(e.at) }) }));
      const parts = store.getState().doc.sheet.parts;
      setSelection({ parts: [parts[parts.length - 1]!.id], wires: [] });
      if (!e.shift) {
        setGesture(null);
        onDone();
      }
    },
    cancel() {
      setGesture(null);
      onDone();
      return true;
    },
  };
}
