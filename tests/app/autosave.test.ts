// @vitest-environment happy-dom
/**
 * A design that cannot be opened is never saved over the last good one, and the next start offers
 * to discard it. Behaviour of our own app; no published source applies.
 */
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import {
  AUTOSAVE_KEY,
  beginOpening,
  OPENING_KEY,
  openingDone,
  recovery,
  RESCUE_KEY,
  restoreAutosave,
  settleSuspect,
  startAutosave,
  SUSPECT_KEY,
  suspectDesign,
} from '../../src/app/autosave.ts';
import { serializeDesign } from '../../src/core/format/designFile.ts';
import { designOfCell } from '../../src/core/hierarchy/cellDesign.ts';
import { starterById } from '../../src/core/starters/index.ts';
import { loadDesign } from '../../src/state/store.ts';
import { memoryStorage } from '../memoryStorage.ts';

const inverter = designOfCell(starterById('inverter')!.design);
const nand = designOfCell(starterById('nand2')!.design);

let storage: Storage;
beforeEach(() => {
  storage = memoryStorage();
  recovery.setState({ suspect: null });
});
afterEach(() => vi.useRealTimers());

describe('opening the autosaved design', () => {
  it('restores it and leaves a mark that is cleared once it has been shown', () => {
    storage.setItem(AUTOSAVE_KEY, serializeDesign(inverter));
    const restored = restoreAutosave(storage);
    expect(restored.design?.name).toBe(inverter.name);
    expect(storage.getItem(OPENING_KEY)).not.toBeNull();
    openingDone(restored.opening, storage);
    expect(storage.getItem(OPENING_KEY)).toBeNull();
  });

  it('sets aside a design whose opening never finished and offers it, losing nothing', async () => {
    storage.setItem(AUTOSAVE_KEY, serializeDesign(inverter));
    restoreAutosave(storage); // the page froze here: the mark was never cleared
    const next = restoreAutosave(storage);
    expect(next.design).toBeNull();
    expect(recovery.getState().suspect).toEqual({ name: inverter.name, what: 'autosave' });
    expect(storage.getItem(AUTOSAVE_KEY)).toBeNull();
    expect((await suspectDesign(storage))?.name).toBe(inverter.name);
    settleSuspect('discarded', storage);
    expect(storage.getItem(SUSPECT_KEY)).toBeNull();
    expect(storage.getItem(RESCUE_KEY)).toBe(serializeDesign(inverter));
    expect(recovery.getState().suspect).toBeNull();
  });

  it('after a shared link that never finished opening, shows your own design and says so', () => {
    storage.setItem(AUTOSAVE_KEY, serializeDesign(inverter));
    beginOpening('link', 'hostile', storage);
    const restored = restoreAutosave(storage);
    expect(restored.design?.name).toBe(inverter.name);
    expect(restored.problem).toMatch(/shared link "hostile" did not finish opening/);
  });
});

describe('saving while a design is being opened', () => {
  it('writes nothing until the opening is done, then the latest design', () => {
    vi.useFakeTimers();
    storage.setItem(AUTOSAVE_KEY, serializeDesign(inverter));
    const stop = startAutosave(storage);
    const token = beginOpening('link', nand.name, storage);
    loadDesign(nand);
    vi.advanceTimersByTime(5_000);
    expect(storage.getItem(AUTOSAVE_KEY)).toBe(serializeDesign(inverter));
    openingDone(token, storage);
    vi.advanceTimersByTime(1_000);
    expect(JSON.parse(storage.getItem(AUTOSAVE_KEY) ?? '{}')).toMatchObject({ name: nand.name });
    stop();
  });
});
