/**
 * The file commands as the shell calls them. Opening a design file from the page's storage needs
 * none of the file readers and writers (the SPICE reader, the exporters): `files.ts` holds those and
 * loads on first use, so start-up parses less. A failure to load it is a message, never a crash.
 */
import { serializeDesign } from '../core/format/designFile.ts';
import { EMPTY_SHEET } from '../core/sheet/edits.ts';
import { currentDesign, loadDesign, showMessage, store } from '../state/store.ts';
import { downloadText, safeFileName } from './download.ts';
import type * as Files from './files.ts';
import type { ExportKind } from './files.ts';

export const DESIGN_EXTENSION = '.railwise.json';
export const OPEN_INPUT_ID = 'railwise-open-file';

/** Runs `use` with the file readers and writers, loaded the first time they are needed. */
function withFiles(what: string, use: (files: typeof Files) => unknown): Promise<void> {
  return import('./files.ts').then(
    (files) => void use(files),
    (e: unknown) =>
      showMessage(
        'error',
        `Could not ${what}: ${e instanceof Error ? e.message : String(e)}. Your design is unchanged.`,
      ),
  );
}

export function openFileLater(file: File): Promise<void> {
  return withFiles(`open ${file.name}`, (files) => files.openFile(file));
}

export function exportLater(kind: ExportKind): Promise<void> {
  return withFiles(`export ${kind}`, (files) => files.exportDesign(kind));
}

/** The browser's file dialog; the readers load while the designer picks (a failure shows on open). */
export function pickAndOpen(): void {
  document.getElementById(OPEN_INPUT_ID)?.click();
  import('./files.ts').catch(() => {});
}

/** Saves every cell of the design (the open one as edited), not just the one on the sheet. */
export function saveDesign(): void {
  const design = currentDesign();
  downloadText(safeFileName(design.name, DESIGN_EXTENSION), serializeDesign(design), 'application/json');
}

export function newDesign(): void {
  const { doc } = store.getState();
  loadDesign({
    name: 'untitled',
    technology: doc.technology,
    netlist: { name: 'untitled', devices: [], rails: [], inputs: [], outputs: [] },
    expectations: {},
    sequences: [],
    sheet: EMPTY_SHEET,
  });
}
