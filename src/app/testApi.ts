/**
 * A small window API for the end-to-end tests (and curious designers in the console): read the
 * store and convert sheet points to page coordinates so tests can click real pixels. It only
 * reads state and calls the same actions the UI calls.
 */
import { sheetToScreen } from '../state/viewport.ts';
import { store, undo, redo } from '../state/store.ts';
import type { Point } from '../core/sheet/types.ts';
import { AUTOSAVE_KEY } from './autosave.ts';

export interface RailwiseTestApi {
  state: typeof store.getState;
  netlist: () => unknown;
  /** The level the sheet overlay paints on a net for the vector shown (from the simulation slice). */
  overlayLevel: (net: string) => string | null;
  /** Page (client) coordinates of a sheet grid point. */
  toPage: (p: Point) => Point;
  undo: typeof undo;
  redo: typeof redo;
  autosaveKey: string;
}

declare global {
  interface Window {
    __railwise?: RailwiseTestApi;
  }
}

export function installTestApi(): void {
  window.__railwise = {
    state: store.getState,
    netlist: () => store.getState().design.netlist,
    overlayLevel: (net) => store.getState().simulation.live?.net(net)?.level ?? null,
    toPage(p) {
      const canvas = document.querySelector('[data-testid="sheet"]');
      const box = canvas?.getBoundingClientRect() ?? { left: 0, top: 0 };
      const s = sheetToScreen(store.getState().viewport, p);
      return { x: box.left + s.x, y: box.top + s.y };
    },
    undo,
    redo,
    autosaveKey: AUTOSAVE_KEY,
  };
}
