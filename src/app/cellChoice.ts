/**
 * The cells of an imported library, waiting for the designer to pick one. Kept apart from the
 * document store: nothing is loaded (and nothing undoable happens) until a cell is chosen.
 */
import { createStore } from 'zustand/vanilla';
import { useStore as useZustand } from 'zustand';
import type { Design } from '../core/model/design.ts';

export interface CellChoice {
  readonly fileName: string;
  readonly designs: readonly Design[];
  readonly failed: readonly string[];
}

export const cellChoice = createStore<{ choice: CellChoice | null }>()(() => ({ choice: null }));

export function offerCells(fileName: string, designs: readonly Design[], failed: readonly string[]): void {
  cellChoice.setState({ choice: { fileName, designs, failed } });
}

export function closeCellChoice(): void {
  cellChoice.setState({ choice: null });
}

export function useCellChoice(): CellChoice | null {
  return useZustand(cellChoice, (s) => s.choice);
}
