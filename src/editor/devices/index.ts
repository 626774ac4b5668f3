/**
 * The registry of part painters, keyed like the core part specs. Every kind names its painter
 * here; `SYMBOL_PAINTER` draws any kind from its spec (symbol and text), so a kind needs a painter
 * of its own only to draw something its spec cannot describe.
 */
import type { PartKind, SheetPart } from '../../core/sheet/types.ts';
import type { PartText } from '../../core/sheet/parts/index.ts';
import { shownTexts, traceSymbol, type TextDetail } from './symbolPainter.ts';

export interface PartPainter {
  /** Adds the part's outline (or, with `filled`, its filled shapes) to a path in sheet units. */
  readonly trace: (path: CanvasPath, part: SheetPart, filled: boolean) => void;
  /** Its text lines at a level of detail. */
  readonly texts: (part: SheetPart, detail: TextDetail) => PartText[];
}

export const SYMBOL_PAINTER: PartPainter = { trace: traceSymbol, texts: shownTexts };

export const PART_PAINTERS: Readonly<Record<PartKind, PartPainter>> = {
  nmos: SYMBOL_PAINTER,
  pmos: SYMBOL_PAINTER,
  resistor: SYMBOL_PAINTER,
  capacitor: SYMBOL_PAINTER,
  vdd: SYMBOL_PAINTER,
  gnd: SYMBOL_PAINTER,
  input: SYMBOL_PAINTER,
  output: SYMBOL_PAINTER,
  label: SYMBOL_PAINTER,
  diode: SYMBOL_PAINTER,
  instance: SYMBOL_PAINTER,
};
