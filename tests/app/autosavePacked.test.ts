// @vitest-environment happy-dom
/**
 * A long design autosaves packed, when the page is idle, and reads back the same. Behaviour of our
 * own app (no published source applies to the values); gzip (RFC 1952) and base64 (RFC 4648) are
 * the browser's.
 */
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import {
  AUTOSAVE_KEY,
  autosavedText,
  autosaveText,
  openingDone,
  RESCUE_KEY,
  restoreAutosave,
  startAutosave,
} from '../../src/app/autosave.ts';
import { isPacked, PACKED_MARK } from '../../src/app/storedText.ts';
import { serializeDesign } from '../../src/core/format/designFile.ts';
import { currentDesign, loadDesign, resetStore } from '../../src/state/store.ts';
import { memoryStorage } from '../memoryStorage.ts';
import { longDesign } from './longDesign.ts';

let storage: Storage;
beforeEach(() => {
  storage = memoryStorage();
  resetStore();
});
afterEach(() => vi.useRealTimers());

async function saved(): Promise<string> {
  await vi.waitFor(() => expect(storage.getItem(AUTOSAVE_KEY)).not.toBeNull(), { timeout: 10_000 });
  return storage.getItem(AUTOSAVE_KEY)!;
}

describe('autosave of a long design', () => {
  it('is stored packed, and opens again as the same design', async () => {
    const stop = startAutosave(storage);
    openingDone(undefined, storage);
    const design = longDesign();
    loadDesign(design);
    const stored = await saved();
    stop();
    expect(isPacked(stored)).toBe(true);
    const text = await autosavedText(storage);
    expect(text).toBe(autosaveText(currentDesign()));
    // The design file without its indentation: the same document as a saved file.
    expect(JSON.parse(text!)).toEqual(JSON.parse(serializeDesign(currentDesign())));
    expect(text!.length).toBeLessThan(serializeDesign(currentDesign()).length / 2);
    expect(stored.length).toBeLessThan(text!.length / 5);
    const restored = restoreAutosave(storage, text);
    expect(restored.design?.cells[0]?.sheet).toEqual(design.sheet);
  });

  it('keeps a damaged packed value aside and says so, opening nothing from it', async () => {
    storage.setItem(AUTOSAVE_KEY, `${PACKED_MARK}AAAA`);
    const restored = restoreAutosave(storage, await autosavedText(storage));
    expect(restored.design).toBeNull();
    expect(restored.problem).toMatch(/could not be read.*compressed text is damaged/);
    expect(storage.getItem(RESCUE_KEY)).toBe(`${PACKED_MARK}AAAA`);
  });
});
