/**
 * Routes pointer events to the tool in hand. Headless: the canvas feeds it sheet coordinates, and
 * tests feed it the same way without a canvas.
 */
import type { PartKind, Point } from '../../core/sheet/types.ts';
import { setGesture, setTool, store, type Tool } from '../../state/store.ts';
import type { ToolMachine, ToolPointer } from './types.ts';
import { createSelectTool } from './selectTool.ts';
import { createWireTool, type WireTool } from './wireTool.ts';
import { createPlaceTool } from './placeTool.ts';

export interface EditorController {
  down(e: ToolPointer): void;
  move(e: ToolPointer): void;
  up(e: ToolPointer): void;
  /** Escape: cancels the running gesture; returns false when there was none. */
  cancel(): boolean;
  /** Name and state of the active machine, for tests and the status line. */
  describe(): string;
}

export function createEditorController(): EditorController {
  const backToSelect = (): void => setTool({ mode: 'select' });
  let wire: WireTool = createWireTool(backToSelect);
  // Wiring started from a pin in the select tool runs the wire machine until it ends.
  const select = createSelectTool((at: Point) => {
    wire = createWireTool(backToSelect);
    setTool({ mode: 'wire' });
    wire.start(at);
  });
  let placing: { kind: PartKind; tool: ToolMachine } | null = null;
  const active = (tool: Tool): ToolMachine => {
    switch (tool.mode) {
      case 'select':
        return select;
      case 'wire':
        return wire;
      case 'place':
        if (placing?.kind !== tool.kind)
          placing = { kind: tool.kind, tool: createPlaceTool(tool.kind, backToSelect) };
        return placing.tool;
    }
  };
  const current = (): ToolMachine => active(store.getState().tool);
  return {
    down: (e) => current().down(e),
    move: (e) => current().move(e),
    up: (e) => current().up(e),
    cancel() {
      const handled = current().cancel();
      if (store.getState().tool.mode !== 'select') {
        setGesture(null);
        backToSelect();
        return true;
      }
      return handled;
    },
    describe: () => `${current().name}:${current().state()}`,
  };
}
