/**
 * Opening, importing and exporting. Every read is validated first; a bad file gives a message
 * naming the file and the line or field, and the open design is left exactly as it was. The page
 * loads this module on first use (`fileCommands.ts`, which also holds save and new).
 */
import type { Design } from '../core/document/design.ts';
import { DEFAULT_TECHNOLOGY } from '../core/model/technology.ts';
import { DesignFileError, parseDesignFile } from '../core/format/designFile.ts';
import { importSpice, SpiceImportError } from '../core/netlist-io/spiceImport.ts';
import { designFromImport } from '../core/netlist-io/spiceDesign.ts';
import { openLibraryView } from '../state/library.ts';
import { isSpiceFileName } from '../core/netlist-io/cellFiles.ts';
import { exportSpice } from '../core/netlist-io/spiceExport.ts';
import { exportVerilog } from '../core/netlist-io/verilogExport.ts';
import { exportSpiceDesign } from '../core/netlist-io/spiceDesignExport.ts';
import { exportVerilogDesign } from '../core/netlist-io/verilogDesignExport.ts';
import { exportTruthTableCsv } from '../core/netlist-io/csvExport.ts';
import { checkDesign } from '../core/analysis/check.ts';
import { sheetToSvg } from '../core/sheet/svg.ts';
import { EMPTY_SHEET } from '../core/sheet/edits.ts';
import { flushSync } from 'react-dom';
import { currentDesign, loadDesign, setViewport, showMessage, store } from '../state/store.ts';
import { currentStage } from '../editor/stageRef.ts';
import { fitToView } from '../state/view.ts';
import { downloadText, downloadUrl, safeFileName } from './download.ts';
import { countOf } from '../core/view/plural.ts';
import { binaryRefusal } from '../core/format/binaryText.ts';
import { brief } from '../core/text/printable.ts';

export type ExportKind = 'spice' | 'verilog' | 'csv' | 'svg' | 'png';

export const isSpiceFile = isSpiceFileName;

export interface SpiceDesign {
  /** Every cell of the file, each keeping the instances it places, in file order. */
  readonly design: Design;
  /** Cells of a library that could not be read, each with its reason (file and line). */
  readonly failed: readonly string[];
  /** Several top-level cells: shown as a library. */
  readonly library: boolean;
}

/**
 * What an import changed or left out, as the design's notes (one per line under a heading naming
 * the file), kept with the design until the designer dismisses them: the same notes the command
 * line prints for each cell.
 */
export function importNotes(fileName: string, notes: readonly string[]): string | undefined {
  return notes.length === 0 ? undefined : [`Imported from ${fileName}:`, ...notes].join('\n');
}

/** Reads a SPICE text into one design of all its cells; throws when no cell at all can be read. */
export function designFromSpice(text: string, fileName: string): SpiceDesign {
  const imported = importSpice(text, fileName);
  // A cell only the checks cannot flatten is kept; its check says why.
  const failed = imported.failed.map((f) => `${f.name} (${f.error.message})`);
  const name = fileName.replace(/^.*[\\/]/, '').replace(/\.[^.]+$/, '') || 'design';
  const read = designFromImport(imported, DEFAULT_TECHNOLOGY, name);
  if (read.cells.length === 0) {
    const first = imported.failed[0]?.error;
    if (first !== undefined) throw first;
    throw new SpiceImportError(fileName, 1, 'no cell could be read');
  }
  // Each cell's notes, named by the cell when the file holds several.
  const several = imported.cells.length > 1;
  const cellNotes = imported.cells.flatMap((c) => c.notes.map((n) => (several ? `${c.name}: ${n}` : n)));
  const unread = failed.map((f) => `not readable: ${f}`);
  const notes = importNotes(fileName, [...new Set([...imported.notes, ...cellNotes]), ...unread]);
  const design = notes === undefined ? read : { ...read, notes };
  return { design, failed, library: imported.isLibrary };
}

function openSpice(text: string, fileName: string): void {
  const { design, library } = designFromSpice(text, fileName);
  loadDesign(design);
  fitToView();
  const kept = design.notes === undefined ? 0 : design.notes.split('\n').length - 1;
  const where = kept === 0 ? '' : `; ${countOf(kept, 'note')} on what the import changed, under the sheet`;
  const what = design.cells.length > 1 ? `${design.cells.length} cells` : design.open;
  showMessage('info', `Imported ${what} from ${fileName}${where}`);
  // A library: the table of its cells, where any one opens onto the sheet.
  if (library) openLibraryView();
}

/** Opens text as a design file or a SPICE netlist. Returns false when the file was refused. */
export function openText(text: string, fileName: string): boolean {
  const binary = binaryRefusal(fileName, text);
  if (binary !== null) {
    showMessage('error', `Could not open ${binary}. Your design is unchanged.`);
    return false;
  }
  try {
    if (isSpiceFile(fileName)) return (openSpice(text, fileName), true);
    loadDesign(parseDesignFile(text, fileName));
    showMessage('info', `Opened ${fileName}`);
    fitToView();
    return true;
  } catch (e) {
    // Known errors name the file and line or field; anything else is still a message, never a crash.
    const known = e instanceof DesignFileError || e instanceof SpiceImportError;
    // A short, printable excerpt: whatever the file held, the message stays one readable line.
    const detail = brief(e instanceof Error ? e.message : String(e));
    showMessage(
      'error',
      `Could not open${known ? '' : ` ${fileName}`}: ${detail}. Your design is unchanged.`,
    );
    return false;
  }
}

export async function openFile(file: File): Promise<boolean> {
  return openText(await file.text(), file.name);
}

/** A design of several cells keeps its hierarchy (one `.subckt` per cell); one cell exports alone. */
function spiceText(): string {
  const whole = currentDesign();
  if (whole.cells.length > 1) return exportSpiceDesign(whole);
  const { design } = store.getState();
  return exportSpice(design.netlist, design.technology, {
    expectations: design.expectations,
    ...(design.sheet === undefined ? {} : { sheet: design.sheet }),
  });
}

/** One module per cell for a design of several cells, else the one cell's module. */
function verilogText(): string {
  const whole = currentDesign();
  return whole.cells.length > 1 ? exportVerilogDesign(whole) : exportVerilog(store.getState().design.netlist);
}

/** Writes the export; problems (e.g. too many inputs for a truth table) become a message. */
export function exportDesign(kind: ExportKind): void {
  const { design } = store.getState();
  try {
    switch (kind) {
      case 'spice':
        return downloadText(safeFileName(design.name, '.sp'), spiceText(), 'text/plain');
      case 'verilog':
        return downloadText(safeFileName(design.name, '.v'), verilogText(), 'text/plain');
      case 'csv':
        return downloadText(
          safeFileName(design.name, '.csv'),
          exportTruthTableCsv(checkDesign(design)),
          'text/csv',
        );
      case 'svg':
        return downloadText(
          safeFileName(design.name, '.svg'),
          sheetToSvg(design.sheet ?? EMPTY_SHEET),
          'image/svg+xml',
        );
      case 'png':
        return exportPng(design.name);
    }
  } catch (e) {
    showMessage('error', `Export failed: ${e instanceof Error ? e.message : String(e)}`);
  }
}

/**
 * The whole cell as a picture: the scene draws only what is on screen, so the view is fitted to
 * the cell (rendered synchronously), captured at twice the screen resolution, then put back.
 */
function exportPng(name: string): void {
  const stage = currentStage();
  if (!stage) throw new Error('the sheet is not on screen');
  const before = store.getState().viewport;
  flushSync(() => fitToView());
  try {
    downloadUrl(safeFileName(name, '.png'), stage.toDataURL({ pixelRatio: 2, mimeType: 'image/png' }));
  } finally {
    setViewport(before);
  }
}
