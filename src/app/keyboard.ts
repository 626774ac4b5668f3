/**
 * Keyboard dispatch: a key press runs its registered command unless the designer is typing in a
 * field. Escape first cancels a gesture in progress, then clears the selection or closes a box.
 */
import type { EditorController } from '../editor/tools/controller.ts';
import { clearSelection, setOverlay, store } from '../state/store.ts';
import { commandForKey } from './commands.ts';

function isTyping(target: EventTarget | null): boolean {
  // Guarded so the headless tests (no DOM) can feed key events too.
  if (typeof HTMLElement === 'undefined' || !(target instanceof HTMLElement)) return false;
  return target.isContentEditable || ['INPUT', 'TEXTAREA', 'SELECT'].includes(target.tagName);
}

/** Enter and Space on a focused button belong to the button (keyboard users press them). */
function isButtonPress(e: KeyboardEvent): boolean {
  if (typeof HTMLElement === 'undefined' || !(e.target instanceof HTMLElement)) return false;
  return (e.key === 'Enter' || e.key === ' ') && ['BUTTON', 'A', 'SUMMARY'].includes(e.target.tagName);
}

export function handleKey(e: KeyboardEvent, controller: EditorController): void {
  if (isTyping(e.target) || isButtonPress(e) || e.altKey) return;
  if (e.key === 'Escape') {
    if (store.getState().overlay !== null) setOverlay(null);
    else if (!controller.cancel()) clearSelection();
    e.preventDefault();
    return;
  }
  if (store.getState().overlay !== null) return;
  const command = commandForKey(e);
  if (!command) return;
  e.preventDefault();
  command.run();
}
