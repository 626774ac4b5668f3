// @vitest-environment happy-dom
// Our own persistence of the undo history (docs/semantics.md §8); no published source applies.
import { describe, expect, it } from 'vitest';
import { headlessEditor } from '../editor/headless.ts';
import { HISTORY_KEY, historyFor, startSessionHistory } from '../../src/app/sessionHistory.ts';
import { memoryStorage } from '../memoryStorage.ts';

describe('writing the undo history', () => {
  it('keeps the last step when the page goes away before it was idle', () => {
    const storage = memoryStorage();
    const ed = headlessEditor();
    const stop = startSessionHistory(storage);
    ed.key('1');
    ed.click(0, 0);
    ed.key('1');
    ed.click(6, 0);
    window.dispatchEvent(new Event('pagehide'));
    const kept = historyFor(ed.state().doc, storage.getItem(HISTORY_KEY));
    expect(kept?.past).toEqual(ed.state().history.past);
    stop();
  });
});
