/**
 * A headless editor for tests: the same controller and key handling the canvas uses, fed sheet
 * coordinates directly. No canvas, no DOM.
 */
import { createEditorController } from '../../src/editor/tools/controller.ts';
import { handleKey } from '../../src/app/keyboard.ts';
import { resetStore, store } from '../../src/state/store.ts';
import type { SheetDocument } from '../../src/state/document.ts';
import type { Point } from '../../src/core/sheet/types.ts';

export function headlessEditor(doc?: SheetDocument) {
  resetStore(doc);
  const ctl = createEditorController();
  const ev = (at: Point, shift = false, button = 0) => ({
    at,
    screen: { x: at.x * 20, y: at.y * 20 },
    shift,
    button,
  });
  return {
    ctl,
    state: store.getState,
    down: (x: number, y: number, shift = false) => ctl.down(ev({ x, y }, shift)),
    move: (x: number, y: number, shift = false) => ctl.move(ev({ x, y }, shift)),
    up: (x: number, y: number, shift = false) => ctl.up(ev({ x, y }, shift)),
    click(x: number, y: number, shift = false) {
      ctl.move(ev({ x, y }, shift));
      ctl.down(ev({ x, y }, shift));
      ctl.up(ev({ x, y }, shift));
    },
    drag(from: Point, to: Point, shift = false) {
      ctl.down(ev(from, shift));
      // A few frames, as a real pointer sends.
      for (let i = 1; i <= 4; i++)
        ctl.move(ev({ x: from.x + ((to.x - from.x) * i) / 4, y: from.y + ((to.y - from.y) * i) / 4 }, shift));
      ctl.up(ev(to, shift));
    },
    key(key: string, mods: { ctrl?: boolean; shift?: boolean } = {}) {
      const e = {
        key,
        ctrlKey: !!mods.ctrl,
        metaKey: false,
        shiftKey: !!mods.shift,
        altKey: false,
        target: null,
        preventDefault() {},
      } as unknown as KeyboardEvent;
      handleKey(e, ctl);
    },
  };
}
