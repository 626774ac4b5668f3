/**
 * Opening, saving, importing and exporting. Every read is validated first; a bad file gives a
 * message naming the file and the line or field, and the open design is left exactly as it was.
 */
import type { Design } from '../core/model/design.ts';
import { DEFAULT_TECHNOLOGY } from '../core/model/technology.ts';
import { DesignFileError, parseDesignFile, serializeDesign } from '../core/format/designFile.ts';
import { importSpice, SpiceImportError } from '../core/netlist-io/spiceImport.ts';
import { exportSpice } from '../core/netlist-io/spiceExport.ts';
import { exportVerilog } from '../core/netlist-io/verilogExport.ts';
import { exportTruthTableCsv } from '../core/netlist-io/csvExport.ts';
import { checkDesign } from '../core/analysis/check.ts';
import { sheetToSvg } from '../core/sheet/svg.ts';
import { EMPTY_SHEET } from '../core/sheet/edits.ts';
import { loadDesign, showMessage, store } from '../state/store.ts';
import { currentStage } from '../editor/stageRef.ts';
import { fitToView } from '../editor/actions.ts';
import { downloadText, downloadUrl, safeFileName } from './download.ts';

export const DESIGN_EXTENSION = '.railwise.json';
const SPICE_EXTENSIONS = ['.sp', '.spi', '.cir', '.net', '.cdl', '.spice'];
export const OPEN_ACCEPT = ['.json', ...SPICE_EXTENSIONS].join(',');
export const OPEN_INPUT_ID = 'railwise-open-file';

export type ExportKind = 'spice' | 'verilog' | 'csv' | 'svg' | 'png';

export function isSpiceFile(fileName: string): boolean {
  const lower = fileName.toLowerCase();
  return SPICE_EXTENSIONS.some((ext) => lower.endsWith(ext));
}

/** Reads a SPICE text into a design: the first cell, with a note naming the others in a library. */
export function designFromSpice(text: string, fileName: string): { design: Design; note: string | null } {
  const result = importSpice(text, fileName);
  const cell = result.cells[0];
  if (!cell) {
    const first = result.failed[0];
    throw first ? first.error : new SpiceImportError(fileName, 1, 'no cell could be read');
  }
  const others = result.cells.slice(1).map((c) => c.name);
  const failed = result.failed.map((f) => `${f.name} (${f.error.message})`);
  const note =
    others.length + failed.length === 0
      ? null
      : [
          others.length ? `also in the file: ${others.join(', ')}` : '',
          failed.length ? `not readable: ${failed.join('; ')}` : '',
        ]
          .filter(Boolean)
          .join('. ');
  const design: Design = {
    name: cell.name,
    technology: DEFAULT_TECHNOLOGY,
    netlist: cell.netlist,
    expectations: cell.expectations,
    sequences: [],
  };
  return { design, note };
}

/** Opens text as a design file or a SPICE netlist. Returns whether the design was replaced. */
export function openText(text: string, fileName: string): boolean {
  try {
    if (isSpiceFile(fileName)) {
      const { design, note } = designFromSpice(text, fileName);
      loadDesign(design);
      showMessage('info', `Imported ${design.name} from ${fileName}${note ? `. ${note}` : ''}`);
    } else {
      loadDesign(parseDesignFile(text, fileName));
      showMessage('info', `Opened ${fileName}`);
    }
    fitToView();
    return true;
  } catch (e) {
    if (e instanceof DesignFileError || e instanceof SpiceImportError) {
      showMessage('error', `Could not open: ${e.message}. Your design is unchanged.`);
      return false;
    }
    throw e;
  }
}

export async function openFile(file: File): Promise<boolean> {
  return openText(await file.text(), file.name);
}

export function pickAndOpen(): void {
  document.getElementById(OPEN_INPUT_ID)?.click();
}

export function saveDesign(): void {
  const { design } = store.getState();
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

/** Writes the export; problems (e.g. too many inputs for a truth table) become a message. */
export function exportDesign(kind: ExportKind): void {
  const { design } = store.getState();
  try {
    switch (kind) {
      case 'spice':
        return downloadText(
          safeFileName(design.name, '.sp'),
          exportSpice(design.netlist, design.technology, { expectations: design.expectations }),
          'text/plain',
        );
      case 'verilog':
        return downloadText(safeFileName(design.name, '.v'), exportVerilog(design.netlist), 'text/plain');
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

function exportPng(name: string): void {
  const stage = currentStage();
  if (!stage) throw new Error('the sheet is not on screen');
  downloadUrl(safeFileName(name, '.png'), stage.toDataURL({ pixelRatio: 2, mimeType: 'image/png' }));
}
