/**
 * What the page opens on: the autosaved design when there is one, otherwise the demo, a NAND2
 * from the starter set, so the sheet is never empty.
 */
import { starterById, STARTERS } from '../core/starters/index.ts';
import { documentFromDesign } from '../state/document.ts';
import { resetStore, showMessage } from '../state/store.ts';
import {
  autosavedText,
  keepAside,
  openingDone,
  recovery,
  RESCUE_KEY,
  restoreAutosave,
  whenShown,
} from './autosave.ts';

export const DEMO_STARTER = 'nand2';

/**
 * Opens the first design. Asynchronous only for a long autosaved design, which is stored packed
 * and expanded off the page's thread before it is read.
 */
export async function openFirstDesign(storage: Storage = localStorage): Promise<void> {
  const restored = restoreAutosave(storage, await autosavedText(storage));
  const demo = (starterById(DEMO_STARTER) ?? STARTERS[0]!).design;
  try {
    resetStore(documentFromDesign(restored.design ?? demo));
  } catch (e) {
    // A stored design that cannot even be placed must not keep the page from opening.
    keepAside(storage);
    resetStore(documentFromDesign(demo));
    showMessage(
      'error',
      `The autosaved design could not be shown (${e instanceof Error ? e.message : String(e)}); its text is kept under "${RESCUE_KEY}" in this browser's storage.`,
    );
    return;
  }
  const { opening } = restored;
  if (opening !== undefined) whenShown(() => openingDone(opening, storage));
  if (restored.problem) showMessage('error', restored.problem);
  else if (!restored.design && recovery.getState().suspect === null) {
    showMessage(
      'info',
      'Welcome: this NAND2 is a starter cell. Press H for keys, or pick a part on the left and click the sheet.',
    );
  }
}
