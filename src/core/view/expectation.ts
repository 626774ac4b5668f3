/**
 * Where the editor marks a problem in an expected function as it is typed. Whether the text is usable
 * is decided in core/expect (`problems.ts`).
 */

/** The extent of the token at `position`: a name, or one character, so the mark covers what was typed. */
export function tokenSpan(text: string, position: number): [number, number] {
  const at = Math.max(0, Math.min(position, text.length));
  const name = /^[A-Za-z_][\w.[\]]*/.exec(text.slice(at));
  return [at, at + Math.max(1, name?.[0].length ?? 1)];
}
