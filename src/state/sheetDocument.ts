/**
 * What the designer edits, as the store holds it (the document slice, `document.ts`). Its own file so
 * the helpers over a document's cells (`documentCells.ts`) and the slice that calls them do not import
 * each other.
 */
import type { Cell } from '../core/document/design.ts';
import type { Instance, Sequence } from '../core/model/design.ts';
import type { Technology } from '../core/model/technology.ts';
import type { Sheet } from '../core/sheet/types.ts';

/**
 * The open cell's fields at the top (what the editor and the panels read), the design's other
 * cells beside them. A one-cell design leaves the optional fields out.
 */
export interface SheetDocument {
  /** The open cell's name. */
  readonly name: string;
  readonly technology: Technology;
  readonly expectations: Readonly<Record<string, string>>;
  readonly sequences: readonly Sequence[];
  readonly notes?: string;
  readonly sheet: Sheet;
  /** Instances the open cell places that are not drawn on its sheet. */
  readonly instances?: readonly Instance[];
  readonly globals?: readonly string[];
  /** The design's other cells, in order; the open cell sits at `openAt` among them. */
  readonly cells?: readonly Cell[];
  readonly openAt?: number;
  /** The design's own name (the file name on save); the open cell's name when absent. */
  readonly designName?: string;
  /**
   * The open cell seen inside another (descended into): the cell analysed, and the instance names
   * from it down to the open cell. Levels and findings are then the top cell's, named as it names them.
   */
  readonly context?: SheetContext;
}

export interface SheetContext {
  readonly top: string;
  readonly instances: readonly string[];
}
