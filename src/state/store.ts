/**
 * The application store: one vanilla zustand store of slices (document, history, selection,
 * viewport, interaction, simulation, messages), a thin React hook, and actions as
 * module functions. Its API for panels, the overlay and tests is documented in ./README.md.
 *
 * Everything that changes the document goes through `commitDoc` (one undo step) or a gesture
 * (`beginGesture` → `previewDoc`… → `endGesture` | `cancelGesture`); `applyDoc` is the one place
 * the design is derived from the document, and the one place `revision` and `netlistRevision` move.
 */
import { createStore } from 'zustand/vanilla';
import { useStore as useZustand } from 'zustand';
import type { Cell, CellDesign, Design } from '../core/document/design.ts';
import type { ItemIds } from '../core/sheet/selection.ts';
import type { SheetIssue } from '../core/sheet/toNetlist.ts';
import type { Clip } from '../core/sheet/clipboard.ts';
import type { PartKind, Point } from '../core/sheet/types.ts';
import { NO_ITEMS } from '../core/sheet/selection.ts';
import { deriveDesign, documentFromDesign, type SheetDocument, type SheetGeometry } from './document.ts';
import { designOfDocument, followOpenCell, withFields } from './documentCells.ts';
import { EMPTY_HISTORY, recordStep, redoStep, undoStep, type HistoryState } from './history.ts';
import { EMPTY_SELECTION, pruneSelection, type SelectionState } from './selection.ts';
import { DEFAULT_VIEWPORT, type Viewport } from './viewport.ts';
import { DEFAULT_TECHNOLOGY } from '../core/model/technology.ts';
import { samePlainData } from '../core/model/plainData.ts';
import { EMPTY_SHEET } from '../core/sheet/edits.ts';
import { INITIAL_SIMULATION, type SimulationState } from './simulationSlice.ts';

/** The tool in hand: select (and drag, box-select, wire from a pin), place a part, or draw wires. */
export type Tool =
  | { readonly mode: 'select' }
  | { readonly mode: 'place'; readonly kind: PartKind }
  | { readonly mode: 'wire' };

/** Transient drawing of a gesture in progress: never saved, never undone. */
export type Gesture =
  | { readonly type: 'box'; readonly from: Point; readonly to: Point }
  | { readonly type: 'wiring'; readonly points: readonly Point[]; readonly cursor: Point }
  | { readonly type: 'ghost'; readonly kind: PartKind; readonly at: Point }
  | { readonly type: 'pin'; readonly at: Point };

/**
 * A line for the designer under the sheet. Errors stay until dismissed (they say what was left
 * unchanged); warnings and information are about the document as it was, so the next change of the
 * document clears them.
 */
export interface Message {
  readonly kind: 'error' | 'warning' | 'info';
  readonly text: string;
}

/** Where an edit made contacts on purpose, or would have made or cut them and was refused. */
export interface ContactMarks {
  readonly kind: 'made' | 'refused';
  readonly at: readonly Point[];
}

export interface RailwiseState {
  readonly doc: SheetDocument;
  /** The open cell, derived from `doc` by applyDoc (instances flattened); never edited directly. */
  readonly design: CellDesign;
  /** The open cell as the design holds it (own devices, instances), derived with `design`. */
  readonly openCell: Cell;
  readonly geometry: SheetGeometry;
  readonly issues: readonly SheetIssue[];
  /** +1 on every committed document change (edit, undo, redo, open, end or cancel of a drag). */
  readonly revision: number;
  /** The revision at which the derived netlist or the technology last changed. */
  readonly netlistRevision: number;
  readonly history: HistoryState;
  readonly selection: SelectionState;
  readonly viewport: Viewport;
  readonly tool: Tool;
  readonly gesture: Gesture | null;
  readonly clipboard: Clip | null;
  readonly message: Message | null;
  /** Drawn on the sheet until the document next changes (docs/semantics.md §1). */
  readonly contactMarks: ContactMarks | null;
  readonly overlay: 'help' | 'about' | null;
  /** Size of the sheet area in pixels, kept by the canvas for fit-to-view. */
  readonly screen: { readonly width: number; readonly height: number };
  readonly simulation: SimulationState;
}

export const BLANK_DOCUMENT: SheetDocument = {
  name: 'untitled',
  technology: DEFAULT_TECHNOLOGY,
  expectations: {},
  sequences: [],
  sheet: EMPTY_SHEET,
};

function initialState(doc: SheetDocument): RailwiseState {
  const derived = deriveDesign(doc);
  return {
    doc,
    ...derived,
    revision: 0,
    netlistRevision: 0,
    history: EMPTY_HISTORY,
    selection: EMPTY_SELECTION,
    viewport: DEFAULT_VIEWPORT,
    tool: { mode: 'select' },
    gesture: null,
    clipboard: null,
    message: null,
    contactMarks: null,
    overlay: null,
    screen: { width: 800, height: 600 },
    simulation: INITIAL_SIMULATION,
  };
}

export const store = createStore<RailwiseState>()(() => initialState(BLANK_DOCUMENT));

export function useStore<T>(selector: (s: RailwiseState) => T): T {
  return useZustand(store, selector);
}

/** Test helper and start-up: starts over from a document, every slice at its initial state. */
export function resetStore(doc: SheetDocument = BLANK_DOCUMENT): void {
  store.setState(initialState(doc), true);
}

/**
 * Swaps in a new document: derives the design (keeping the netlist object when it did not change),
 * bumps the revision, and the netlist revision when the netlist or technology changed.
 */
function applyDoc(doc: SheetDocument, history: HistoryState): void {
  const s = store.getState();
  const derived = deriveDesign(doc, s.design);
  const revision = s.revision + 1;
  const circuitChanged =
    derived.design.netlist !== s.design.netlist || derived.design.technology !== s.design.technology;
  store.setState({
    doc,
    ...derived,
    history,
    revision,
    netlistRevision: circuitChanged ? revision : s.netlistRevision,
    selection: { ...s.selection, selected: pruneSelection(s.selection.selected, doc.sheet) },
    message: s.message?.kind === 'error' ? s.message : null,
    contactMarks: null,
  });
}

/**
 * Shows another document without an undo step: navigation between cells, not an edit, so undo
 * still takes back the last edit (and with it the cell it was made in).
 */
export function showDocument(doc: SheetDocument): void {
  if (store.getState().history.gestureStart !== null) cancelGesture();
  applyDoc(doc, store.getState().history);
  store.setState({ selection: EMPTY_SELECTION, gesture: null });
}

/** The one way to change the document as a single undo step. Returns false when nothing changed. */
export function commitDoc(update: (doc: SheetDocument) => SheetDocument): boolean {
  const s = store.getState();
  const base = s.history.gestureStart ?? s.doc;
  const next = followOpenCell(s.doc, update(s.doc), s.openCell);
  if (next.name !== s.doc.name && (next.cells ?? []).some((c) => c.name === next.name)) {
    showMessage('error', `Another cell of this design is named ${next.name}: the open cell keeps its name.`);
    return false;
  }
  if (next === s.doc && s.history.gestureStart === null) return false;
  applyDoc(next, recordStep(s.history, base));
  return true;
}

export function beginGesture(): void {
  const s = store.getState();
  if (s.history.gestureStart === null) store.setState({ history: { ...s.history, gestureStart: s.doc } });
}

/**
 * Shows a step of a gesture (a drag frame) without recording it. Only the drawing changes: the
 * design is re-derived, and the revision bumped, once when the gesture ends, which keeps drags
 * smooth on large sheets and spares the analysis from solving every frame.
 */
export function previewDoc(doc: SheetDocument): void {
  store.setState({ doc });
}

/** Ends the gesture as one undo step (or none, if the document ended where it began). */
export function endGesture(): void {
  const s = store.getState();
  const start = s.history.gestureStart;
  if (start === null) return;
  if (samePlainData(start, s.doc)) {
    applyDoc(start, { ...s.history, gestureStart: null });
    return;
  }
  applyDoc(s.doc, recordStep(s.history, start));
}

/** Escape during a gesture: back to where it began, nothing recorded. */
export function cancelGesture(): void {
  const s = store.getState();
  store.setState({ gesture: null });
  if (s.history.gestureStart === null) return;
  applyDoc(s.history.gestureStart, { ...s.history, gestureStart: null });
}

export function undo(): boolean {
  const s = store.getState();
  if (s.history.gestureStart !== null) cancelGesture();
  const r = undoStep(store.getState().history, store.getState().doc);
  if (r) applyDoc(r.doc, r.history);
  return r !== null;
}

export function redo(): boolean {
  const s = store.getState();
  const r = redoStep(s.history, s.doc);
  if (r) applyDoc(r.doc, r.history);
  return r !== null;
}

/** Puts back an undo history kept across a reload (the document itself is already in place). */
export function restoreHistory(past: readonly SheetDocument[], future: readonly SheetDocument[]): void {
  store.setState({ history: { past, future, gestureStart: null } });
}

/** The whole design as it would be saved: every cell, the open one as drawn. */
export function currentDesign(): Design {
  const s = store.getState();
  return designOfDocument(s.doc, s.openCell);
}

/**
 * Opens a design (file, starter, import; one cell alone is a design of its own) as one undoable
 * step, so nothing drawn is lost.
 */
export function loadDesign(design: Design | CellDesign): void {
  const doc = documentFromDesign(design);
  commitDoc(() => doc);
  store.setState({ selection: EMPTY_SELECTION, gesture: null });
}

export type DesignFields = Partial<
  Pick<SheetDocument, 'name' | 'technology' | 'expectations' | 'sequences' | 'notes'>
>;

/** Changes the open cell's fields (descended, expected functions and sequences go to the top cell). */
export function setDesignFields(patch: DesignFields): void {
  commitDoc((doc) => withFields(doc, patch));
}

/** Drops the notes kept with the design (one undo step). */
export function dismissNotes(): void {
  commitDoc(({ notes: _dismissed, ...doc }) => doc);
}

export function setSelection(selected: ItemIds): void {
  const s = store.getState();
  store.setState({ selection: { ...s.selection, selected } });
}

export function clearSelection(): void {
  setSelection(NO_ITEMS);
}

export function selectDevices(names: readonly string[]): void {
  const { geometry } = store.getState();
  const parts = names.flatMap((n) => geometry.deviceParts[n] ?? []);
  setSelection({ parts, wires: [] });
}

export function selectNets(names: readonly string[]): void {
  const { geometry } = store.getState();
  const nets = new Set(names);
  const wires = Object.entries(geometry.wireNets).flatMap(([id, net]) => (nets.has(net) ? [id] : []));
  const parts = [...geometry.pinNets].flatMap(([key, net]) => (nets.has(net) ? [key.split('.')[0]!] : []));
  setSelection({ parts: [...new Set(parts)], wires });
}

export function setHighlight(h: { nets?: readonly string[]; devices?: readonly string[] }): void {
  const s = store.getState();
  store.setState({
    selection: { ...s.selection, highlight: { nets: h.nets ?? [], devices: h.devices ?? [] } },
  });
}

export function clearHighlight(): void {
  setHighlight({});
}

export function setViewport(viewport: Viewport): void {
  store.setState({ viewport });
}

export function setTool(tool: Tool): void {
  store.setState({ tool, gesture: null });
}

export function setGesture(gesture: Gesture | null): void {
  store.setState({ gesture });
}

export function showMessage(kind: Message['kind'], text: string): void {
  store.setState({ message: { kind, text } });
}

export function dismissMessage(): void {
  store.setState({ message: null, contactMarks: null });
}

export function setContactMarks(marks: ContactMarks | null): void {
  store.setState({ contactMarks: marks });
}

export function setOverlay(overlay: RailwiseState['overlay']): void {
  store.setState({ overlay });
}

export function setClipboard(clipboard: Clip | null): void {
  store.setState({ clipboard });
}

export function setScreen(width: number, height: number): void {
  const s = store.getState().screen;
  if (s.width !== width || s.height !== height) store.setState({ screen: { width, height } });
}
