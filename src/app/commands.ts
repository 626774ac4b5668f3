/**
 * Every user action, registered once and dispatched alike from the toolbar, the keyboard and the
 * help overlay. The key map is Railwise's own: / finds any part by name, number keys place the
 * first nine in shelf order, Q turns, F flips, J joins (wires), V views all; the usual system
 * shortcuts for clipboard and history.
 */
import { openLibraryView } from '../state/library.ts';
import type { PartKind } from '../core/sheet/types.ts';
import { SHELF_KINDS, partSpec } from '../core/sheet/parts/index.ts';
import {
  copySelection,
  cutSelection,
  deleteSelection,
  duplicateSelection,
  mirrorSelection,
  nudgeSelection,
  pasteClipboard,
  rotateSelection,
  selectAll,
  startPlacing,
  startWiring,
} from '../editor/actions.ts';
import { stepVector } from '../state/simulation.ts';
import { redo, setOverlay, undo } from '../state/store.ts';
import { fitToView, zoomBy } from '../state/view.ts';
import { exportLater, newDesign, pickAndOpen, saveDesign } from './fileCommands.ts';
import type { ExportKind } from './files.ts';
import { shareCurrentDesign } from './shareLink.ts';

export interface KeyBinding {
  /** KeyboardEvent.key, compared case-insensitively. */
  readonly key: string;
  readonly ctrl?: boolean;
  readonly shift?: boolean;
}

export interface Command {
  readonly id: string;
  readonly label: string;
  readonly group: 'Parts' | 'Edit' | 'View' | 'Analysis' | 'File' | 'Help';
  readonly keys: readonly KeyBinding[];
  readonly run: () => void;
}

/** Enter jumps to the side form's first field, so renaming needs no mouse. */
function focusNameField(): void {
  if (typeof document === 'undefined') return;
  const field = document.querySelector<HTMLInputElement>('input[data-field="name"], #field-cell');
  field?.focus();
  field?.select();
}

/** The search box of the parts shelf, which `/` focuses. */
export const PART_SEARCH_ID = 'part-search';

function focusPartSearch(): void {
  if (typeof document === 'undefined') return;
  document.getElementById(PART_SEARCH_ID)?.focus();
}

/** The number keys place the first nine kinds in shelf order; every kind is found by the search. */
export function placeKeyOf(kind: PartKind): string | null {
  const index = SHELF_KINDS.indexOf(kind);
  return index >= 0 && index < 9 ? String(index + 1) : null;
}

function placeCommand(kind: PartKind): Command {
  const key = placeKeyOf(kind);
  return {
    id: `place-${kind}`,
    label: `Place ${partSpec(kind).title}`,
    group: 'Parts',
    keys: key === null ? [] : [{ key }],
    run: () => startPlacing(kind),
  };
}

function exportCommand(kind: ExportKind, label: string): Command {
  return {
    id: `export-${kind}`,
    label: `Export ${label}`,
    group: 'File',
    keys: [],
    run: () => void exportLater(kind),
  };
}

export const COMMANDS: readonly Command[] = [
  {
    id: 'find-part',
    label: 'Find any part by name: type, then Enter to place it',
    group: 'Parts',
    keys: [{ key: '/' }],
    run: focusPartSearch,
  },
  ...SHELF_KINDS.map(placeCommand),
  {
    id: 'vector-previous',
    label: 'Previous input vector',
    group: 'Analysis',
    keys: [{ key: '[' }],
    run: () => stepVector(-1),
  },
  {
    id: 'vector-next',
    label: 'Next input vector',
    group: 'Analysis',
    keys: [{ key: ']' }],
    run: () => stepVector(1),
  },
  {
    id: 'wire',
    label: 'Draw a wire (or drag from any pin)',
    group: 'Parts',
    keys: [{ key: 'j' }],
    run: startWiring,
  },
  {
    id: 'rotate',
    label: 'Turn a quarter clockwise',
    group: 'Edit',
    keys: [{ key: 'q' }],
    run: rotateSelection,
  },
  { id: 'mirror', label: 'Flip left–right', group: 'Edit', keys: [{ key: 'f' }], run: mirrorSelection },
  {
    id: 'delete',
    label: 'Delete',
    group: 'Edit',
    keys: [{ key: 'Delete' }, { key: 'Backspace' }],
    run: deleteSelection,
  },
  {
    id: 'duplicate',
    label: 'Duplicate',
    group: 'Edit',
    keys: [{ key: 'd', ctrl: true }],
    run: duplicateSelection,
  },
  { id: 'copy', label: 'Copy', group: 'Edit', keys: [{ key: 'c', ctrl: true }], run: copySelection },
  { id: 'cut', label: 'Cut', group: 'Edit', keys: [{ key: 'x', ctrl: true }], run: cutSelection },
  {
    id: 'paste',
    label: 'Paste',
    group: 'Edit',
    keys: [{ key: 'v', ctrl: true }],
    run: () => pasteClipboard(),
  },
  {
    id: 'select-all',
    label: 'Select everything',
    group: 'Edit',
    keys: [{ key: 'a', ctrl: true }],
    run: selectAll,
  },
  { id: 'undo', label: 'Undo', group: 'Edit', keys: [{ key: 'z', ctrl: true }], run: () => void undo() },
  {
    id: 'redo',
    label: 'Redo',
    group: 'Edit',
    keys: [
      { key: 'z', ctrl: true, shift: true },
      { key: 'y', ctrl: true },
    ],
    run: () => void redo(),
  },
  {
    id: 'rename',
    label: 'Edit the selected part (name field)',
    group: 'Edit',
    keys: [{ key: 'Enter' }],
    run: focusNameField,
  },
  {
    id: 'nudge-left',
    label: 'Nudge left',
    group: 'Edit',
    keys: [{ key: 'ArrowLeft' }],
    run: () => nudgeSelection(-1, 0),
  },
  {
    id: 'nudge-right',
    label: 'Nudge right',
    group: 'Edit',
    keys: [{ key: 'ArrowRight' }],
    run: () => nudgeSelection(1, 0),
  },
  {
    id: 'nudge-up',
    label: 'Nudge up',
    group: 'Edit',
    keys: [{ key: 'ArrowUp' }],
    run: () => nudgeSelection(0, -1),
  },
  {
    id: 'nudge-down',
    label: 'Nudge down',
    group: 'Edit',
    keys: [{ key: 'ArrowDown' }],
    run: () => nudgeSelection(0, 1),
  },
  { id: 'fit', label: 'View the whole cell', group: 'View', keys: [{ key: 'v' }], run: fitToView },
  {
    id: 'zoom-in',
    label: 'Zoom in',
    group: 'View',
    keys: [{ key: '=' }, { key: '+' }],
    run: () => zoomBy(1.25),
  },
  { id: 'zoom-out', label: 'Zoom out', group: 'View', keys: [{ key: '-' }], run: () => zoomBy(0.8) },
  { id: 'new', label: 'New empty sheet', group: 'File', keys: [], run: newDesign },
  {
    id: 'open',
    label: 'Open a design or SPICE netlist…',
    group: 'File',
    keys: [{ key: 'o', ctrl: true }],
    run: pickAndOpen,
  },
  {
    id: 'cells',
    label: 'Cells of this design, each checked',
    group: 'File',
    keys: [],
    run: openLibraryView,
  },
  { id: 'save', label: 'Save design file', group: 'File', keys: [{ key: 's', ctrl: true }], run: saveDesign },
  {
    id: 'share-link',
    label: 'Share a link to this design',
    group: 'File',
    keys: [],
    run: () => void shareCurrentDesign(),
  },
  exportCommand('spice', 'SPICE netlist'),
  exportCommand('verilog', 'Verilog (switch primitives)'),
  exportCommand('csv', 'truth table (CSV)'),
  exportCommand('svg', 'drawing (SVG)'),
  exportCommand('png', 'picture (PNG)'),
  {
    id: 'help',
    label: 'Keys and mouse',
    group: 'Help',
    keys: [{ key: '?', shift: true }, { key: 'h' }],
    run: () => setOverlay('help'),
  },
  { id: 'about', label: 'About Railwise', group: 'Help', keys: [], run: () => setOverlay('about') },
];

export function commandById(id: string): Command {
  const c = COMMANDS.find((x) => x.id === id);
  if (!c) throw new Error(`no command ${id}`);
  return c;
}

/** Human form of a binding: "Ctrl+Shift+Z", "Q", "Del". */
export function describeKey(k: KeyBinding): string {
  const names: Record<string, string> = {
    Delete: 'Del',
    Backspace: '⌫',
    ArrowLeft: '←',
    ArrowRight: '→',
    ArrowUp: '↑',
    ArrowDown: '↓',
  };
  const key = names[k.key] ?? (k.key.length === 1 ? k.key.toUpperCase() : k.key);
  return [k.ctrl ? 'Ctrl' : '', k.shift && k.key !== '?' ? 'Shift' : '', key].filter(Boolean).join('+');
}

/** The command a key event asks for; Ctrl and Cmd are the same, Shift must match where it is named. */
export function commandForKey(
  e: Pick<KeyboardEvent, 'key' | 'ctrlKey' | 'metaKey' | 'shiftKey'>,
): Command | null {
  const ctrl = e.ctrlKey || e.metaKey;
  const key = e.key.toLowerCase();
  const matches = (b: KeyBinding) =>
    b.key.toLowerCase() === key && !!b.ctrl === ctrl && (b.shift === undefined || b.shift === e.shiftKey);
  // Prefer a binding that names Shift exactly (Ctrl+Shift+Z over Ctrl+Z).
  const exact = COMMANDS.find((c) => c.keys.some((b) => matches(b) && b.shift === e.shiftKey));
  return exact ?? COMMANDS.find((c) => c.keys.some((b) => matches(b) && b.shift !== false)) ?? null;
}
