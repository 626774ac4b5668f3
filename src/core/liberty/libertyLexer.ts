/**
 * Tokens of the Liberty timing-library format (the group syntax as the format's public reference
 * manual describes it; from memory): `/* … *\/` comments (and `//` to the end of a line, which
 * some writers use), double-quoted strings, a backslash before a line break continues the line,
 * punctuation `( ) { } : ; ,`, and every other run of characters is a word (`table_lookup`,
 * `1.0`, `A[0]`).
 */

export interface Token {
  readonly kind: 'word' | 'string' | 'punct';
  readonly text: string;
  readonly line: number;
}

/** A file the reader cannot follow, with the 1-based line. */
export class LibertyError extends Error {
  override readonly name = 'LibertyError';
  constructor(
    readonly line: number,
    readonly detail: string,
  ) {
    super(`line ${line}: ${detail}`);
  }
}

const PUNCT = '(){}:;,';

export function libertyTokens(text: string): Token[] {
  const out: Token[] = [];
  let i = 0;
  let line = 1;
  const n = text.length;
  while (i < n) {
    const ch = text[i] as string;
    if (ch === '\n') {
      line++;
      i++;
    } else if (ch === ' ' || ch === '\t' || ch === '\r' || ch === '\f') i++;
    else if (ch === '\\') i = continuation(text, i);
    else if (ch === '/' && text[i + 1] === '*') {
      const end = text.indexOf('*/', i + 2);
      if (end < 0) throw new LibertyError(line, 'a /* comment is never closed');
      line += countLines(text, i, end);
      i = end + 2;
    } else if (ch === '/' && text[i + 1] === '/') {
      const end = text.indexOf('\n', i);
      i = end < 0 ? n : end;
    } else if (ch === '"') {
      const end = closingQuote(text, i + 1, line);
      out.push({ kind: 'string', text: text.slice(i + 1, end).replace(/\\\r?\n/g, ''), line });
      line += countLines(text, i, end);
      i = end + 1;
    } else if (PUNCT.includes(ch)) {
      out.push({ kind: 'punct', text: ch, line });
      i++;
    } else {
      const start = i;
      while (i < n && !isBreak(text[i] as string)) i++;
      out.push({ kind: 'word', text: text.slice(start, i), line });
    }
  }
  return out;
}

function isBreak(ch: string): boolean {
  return (
    ch === ' ' || ch === '\t' || ch === '\n' || ch === '\r' || ch === '"' || ch === '\\' || PUNCT.includes(ch)
  );
}

/** A backslash and the line break after it (white space may sit between) are skipped. */
function continuation(text: string, i: number): number {
  let j = i + 1;
  while (text[j] === ' ' || text[j] === '\t' || text[j] === '\r') j++;
  return text[j] === '\n' ? j : i + 1;
}

function closingQuote(text: string, from: number, line: number): number {
  for (let j = from; j < text.length; j++) {
    if (text[j] === '\\') j++;
    else if (text[j] === '"') return j;
  }
  throw new LibertyError(line, 'a quoted string is never closed');
}

function countLines(text: string, from: number, to: number): number {
  let count = 0;
  for (let j = from; j < to; j++) if (text.charCodeAt(j) === 10) count++;
  return count;
}
