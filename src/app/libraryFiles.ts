/**
 * Attaching a Liberty file to the opened design, from the library view (docs/semantics.md §4): its
 * cells' published functions become the expected functions of the design's cells of the same name,
 * as one undoable step. A file that cannot be read gives a message naming the file and line, and
 * the design is left as it was.
 */
import { attachLibertyFunctions } from '../core/liberty/designFunctions.ts';
import { readLiberty } from '../core/liberty/libertyCells.ts';
import { LibertyError } from '../core/liberty/libertyLexer.ts';
import { currentDesign, loadDesign, showMessage } from '../state/store.ts';

export const LIBERTY_INPUT_ID = 'railwise-attach-liberty';

export function attachLibertyText(text: string, fileName: string): boolean {
  try {
    const attached = attachLibertyFunctions(currentDesign(), readLiberty(text), fileName);
    loadDesign(attached.design);
    const notes = attached.notes.length === 0 ? '' : ` Notes: ${attached.notes.join('; ')}`;
    showMessage('info', `Expected functions from ${fileName} for ${attached.matched} cells.${notes}`);
    return true;
  } catch (e) {
    if (!(e instanceof LibertyError)) throw e;
    showMessage('error', `Could not read ${fileName}:${e.line}: ${e.detail}. Your design is unchanged.`);
    return false;
  }
}

export async function attachLibertyFile(file: File): Promise<boolean> {
  return attachLibertyText(await file.text(), file.name);
}
