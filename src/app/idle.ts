/**
 * Work that can wait for the page to be idle (saving, mostly): run in an idle callback so it never
 * delays a frame or a key press, but within `timeoutMs` even on a page that is never idle.
 */
export function whenIdle(work: () => void, timeoutMs = 1000): () => void {
  if (typeof requestIdleCallback === 'function') {
    const id = requestIdleCallback(() => work(), { timeout: timeoutMs });
    return () => cancelIdleCallback(id);
  }
  const id = setTimeout(work, Math.min(timeoutMs, 200));
  return () => clearTimeout(id);
}

/**
 * Work that waits for a pause as well: run `delayMs` after it is asked for, then when the page is
 * idle (`whenIdle`), so a burst of changes is handled once and work the change itself started (its
 * check, its drawing) goes first. Returns the function that cancels it at either stage.
 */
export function afterPause(work: () => void, delayMs: number, idleWithinMs = 1000): () => void {
  let cancelIdle: (() => void) | null = null;
  const id = setTimeout(() => (cancelIdle = whenIdle(work, idleWithinMs)), delayMs);
  return () => {
    clearTimeout(id);
    cancelIdle?.();
  };
}
