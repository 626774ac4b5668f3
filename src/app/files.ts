/**
 * Opening, importing and exporting. Every read is validated first; a bad file gives a message
 * naming the file and the line or field, and the open design is left exactly as it was. The page
 * loads this module on first use (`fileCommands.ts`, which also holds save and new).
 */
import type { Design } from '../core/model/design.ts';
import { DesignFileError, parseDesignFile } from '../core/format/designFile.ts';
import { SpiceImportError } from '../core/netlist-io/spiceImport.ts';
import { cellsFromText, isSpiceFileName } from '../core/netlist-io/cellFiles.ts';
import { exportSpice } from '../core/netlist-io/spiceExport.ts';
import { exportVerilog } from '../core/netlist-io/verilogExport.ts';
import { exportTruthTableCsv } from '../core/netlist-io/csvExport.ts';
import { checkDesign } from '../core/analysis/check.ts';
import { sheetToSvg } from '../core/sheet/svg.ts';
import { EMPTY_SHEET } from '../core/sheet/edits.ts';
import { flushSync } from 'react-dom';
import { loadDesign, offerCells, setViewport, showMessage, store } from '../state/store.ts';
import { currentStage } from '../editor/stageRef.ts';
import { fitToView } from '../state/view.ts';
import { downloadText, downloadUrl, safeFileName } from './download.ts';
import { countOf } from '../core/view/plural.ts';
import { binaryRefusal } from '../core/format/binaryText.ts';
import { brief } from '../core/format/printable.ts';

export type ExportKind = 'spice' | 'verilog' | 'csv' | 'svg' | 'png';

export const isSpiceFile = isSpiceFileName;

export interface SpiceDesigns {
  /** One design per readable cell, in file order. */
  readonly designs: readonly Design[];
  /** Cells of a library that could not be read, each with its reason (file and line). */
  readonly failed: readonly string[];
}

/**
 * What an import changed or left out, as the design's notes (one per line under a heading naming
 * the file), kept with the design until the designer dismisses them: the same notes the command
 * line prints for the cell.
 */
export function importNotes(fileName: string, notes: readonly string[]): string | undefined {
  return notes.length === 0 ? undefined : [`Imported from ${fileName}:`, ...notes].join('\n');
}

/** Reads a SPICE text into designs, one per cell; throws when no cell at all can be read. */
export function designsFromSpice(text: string, fileName: string): SpiceDesigns {
  const loaded = cellsFromText(text, fileName).cells;
  const designs = loaded.flatMap((c): Design[] => {
    if (!('job' in c)) return [];
    const notes = importNotes(fileName, c.job.notes);
    return [
      {
        name: c.job.cell,
        technology: c.job.technology,
        netlist: c.job.netlist,
        expectations: c.job.expectations,
        sequences: [],
        ...(c.job.sheet === undefined ? {} : { sheet: c.job.sheet }),
        ...(notes === undefined ? {} : { notes }),
      },
    ];
  });
  const failed = loaded.flatMap((c) => ('failure' in c ? [c.failure] : []));
  if (designs.length === 0) {
    const first = failed[0];
    const line = first?.line ?? 1;
    const detail = (first?.message ?? 'no cell could be read').replace(`${fileName}:${line}: `, '');
    throw new SpiceImportError(fileName, line, detail);
  }
  return { designs, failed: failed.map((f) => (f.cell === null ? f.message : `${f.cell} (${f.message})`)) };
}

/**
 * Loads one imported cell and says where it came from. Cells of the file that could not be read
 * join the import's notes, so they stay in view with the rest until dismissed.
 */
export function loadImportedCell(design: Design, fileName: string, failed: readonly string[]): void {
  const unread = failed.map((f) => `not readable: ${f}`);
  const notes =
    unread.length === 0
      ? design.notes
      : (design.notes ?? `Imported from ${fileName}:`) + `\n${unread.join('\n')}`;
  loadDesign({ ...design, ...(notes === undefined ? {} : { notes }) });
  fitToView();
  const kept = notes === undefined ? 0 : notes.split('\n').length - 1;
  const where = kept === 0 ? '' : `; ${countOf(kept, 'note')} on what the import changed, under the sheet`;
  showMessage('info', `Imported ${design.name} from ${fileName}${where}`);
}

function openSpice(text: string, fileName: string): void {
  const { designs, failed } = designsFromSpice(text, fileName);
  // A library: let the designer pick the cell; nothing changes until they do.
  if (designs.length > 1) offerCells(fileName, designs, failed);
  else loadImportedCell(designs[0]!, fileName, failed);
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

/** Writes the export; problems (e.g. too many inputs for a truth table) become a message. */
export function exportDesign(kind: ExportKind): void {
  const { design } = store.getState();
  try {
    switch (kind) {
      case 'spice':
        return downloadText(
          safeFileName(design.name, '.sp'),
          exportSpice(design.netlist, design.technology, {
            expectations: design.expectations,
            ...(design.sheet === undefined ? {} : { sheet: design.sheet }),
          }),
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
