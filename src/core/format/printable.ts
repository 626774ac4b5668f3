/**
 * Text that is safe to show or to write into another file: control characters, format characters
 * (bidirectional overrides among them), line and paragraph separators, unusual spaces and lone
 * surrogates are written as escapes, so a name can never start a new line in an exported netlist,
 * move the cursor of a terminal or reorder what a reader sees. Letters of every script stay as
 * they are. The escapes are the ones JSON uses (`\n`, `\r`, `\t`, `\u001b`), one per UTF-16 unit.
 */

/** Anything other than a plain space in Unicode's "other" (C*) and "separator" (Z*) categories. */
const UNSAFE = /[\p{C}\p{Z}]/gu;
const SHORT: Readonly<Record<string, string>> = { '\n': '\\n', '\r': '\\r', '\t': '\\t' };

function escape(ch: string): string {
  if (ch === ' ') return ch;
  const short = SHORT[ch];
  if (short !== undefined) return short;
  let out = '';
  for (let k = 0; k < ch.length; k++) out += `\\u${ch.charCodeAt(k).toString(16).padStart(4, '0')}`;
  return out;
}

/** The text with every unsafe character escaped; a backslash stays a backslash (for reading only). */
export function printable(text: string): string {
  return text.replace(UNSAFE, escape);
}

/** True when `printable` would change nothing. */
export function isPrintable(text: string): boolean {
  UNSAFE.lastIndex = 0;
  for (const m of text.matchAll(UNSAFE)) if (m[0] !== ' ') return false;
  return true;
}

/**
 * The text as a double-quoted JSON string on one line with nothing unsafe in it: `JSON.parse` gives
 * back exactly the original, lone surrogates included.
 */
export function quoted(text: string): string {
  return `"${text.replace(/[\\"]/g, (c) => `\\${c}`).replace(UNSAFE, escape)}"`;
}

/** Reads back what `quoted` wrote; null when the text is not one JSON string. */
export function unquoted(text: string): string | null {
  try {
    const value: unknown = JSON.parse(text);
    return typeof value === 'string' ? value : null;
  } catch {
    return null;
  }
}

/**
 * Printable text of at most about `max` characters: a longer one keeps its start and end with the
 * number of characters left out between, so a message quoting a megabyte of garbage stays a line.
 */
export function brief(text: string, max = 400): string {
  const safe = printable(text);
  if (safe.length <= max) return safe;
  const head = Math.floor(max * 0.75);
  const tail = max - head;
  return `${safe.slice(0, head)} … (${safe.length - max} characters left out) … ${safe.slice(-tail)}`;
}
