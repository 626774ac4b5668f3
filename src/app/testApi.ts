/**
 * A small window API for the end-to-end tests and the browser benchmark (and curious designers in
 * the console): read the store, convert sheet points to page coordinates so tests can click real
 * pixels, and draw a frame on demand. It only reads state and calls the same actions the UI calls.
 */
import { flushSync } from 'react-dom';
import { sheetToScreen, type Viewport } from '../state/viewport.ts';
import { currentDesign, setViewport, store, undo, redo } from '../state/store.ts';
import { toggleInput } from '../state/simulation.ts';
import { AUTO_SWEEP_VECTORS } from '../state/analysis.ts';
import { currentStage } from '../editor/stageRef.ts';
import type { Point } from '../core/sheet/types.ts';
import { AUTOSAVE_KEY, autosavedText, autosaveText } from './autosave.ts';
import { HISTORY_KEY, historyFor, MAX_STORED_STEPS } from './sessionHistory.ts';

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
  /** True once the autosave holds the design as it is now (expanded first when stored packed). */
  autosaveCaughtUp: () => Promise<boolean>;
  /** True once the session's stored undo history leads from the document as it is now, step for step. */
  historyCaughtUp: () => boolean;
  /** Runs an action, renders what it changed and draws every layer now: the work of one frame. */
  frame: (action: () => void) => void;
  setViewport: (v: Viewport) => void;
  toggleInput: (name: string) => void;
  /** True once the live vector is solved and the check a cell gets by itself has reported. */
  settled: () => boolean;
}

declare global {
  interface Window {
    __railwise?: RailwiseTestApi;
  }
}

function drawFrame(action: () => void): void {
  flushSync(action);
  const stage = currentStage();
  if (!stage) return;
  stage.draw();
  // Reading a pixel makes the browser rasterise what was drawn, so the time includes it.
  for (const layer of stage.getLayers()) layer.getContext().getImageData(0, 0, 1, 1);
}

function isSettled(): boolean {
  const s = store.getState();
  const sim = s.simulation;
  if (sim.live === null && sim.liveError === null) return false;
  const checkedByItself = 2 ** s.design.netlist.inputs.length <= AUTO_SWEEP_VECTORS;
  return !checkedByItself || sim.sweep.status === 'done' || sim.sweep.status === 'failed';
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
    autosaveCaughtUp: async () => (await autosavedText()) === autosaveText(currentDesign()),
    historyCaughtUp: () => {
      const { doc, history } = store.getState();
      const kept = historyFor(doc, sessionStorage.getItem(HISTORY_KEY));
      return kept !== null && kept.past.length === Math.min(history.past.length, MAX_STORED_STEPS);
    },
    frame: drawFrame,
    setViewport,
    toggleInput,
    settled: isSettled,
  };
}
