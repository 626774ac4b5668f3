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
