/**
 * Placing a part: a ghost follows the pointer (snapped); a click places the part and selects it.
 * Its pins connect to the pins and wires they land on (marked on the sheet); a spot where a pin
 * would join two nets is refused (../arrange.ts). Shift-click keeps the tool for another of the same
 * kind; otherwise the select tool returns.
 */
import type { PartKind } from '../../core/sheet/types.ts';
import { snapPoint } from '../../core/sheet/geometry.ts';
import { addPart } from '../../core/sheet/edits.ts';
import { setGesture, setSelection, store } from '../../state/store.ts';
import { placePart } from '../arrange.ts';
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
      const next = addPart(store.getState().doc.sheet, { kind, at: snapPoint(e.at) });
      const placed = next.parts[next.parts.length - 1]!.id;
      if (!placePart(next, placed)) return;
      setSelection({ parts: [placed], wires: [] });
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
