/**
 * Splits SPICE text into logical lines: `*` comment lines dropped, `$` and `;` inline comments cut,
 * `+` continuation lines joined to the line they continue. Each logical line keeps the number of
 * its first physical line (1-based), which every error message names.
 *
 * Comments of the form `* railwise: KEY VALUE…` are our own directives (expected functions, pin
 * directions, rail names) and are kept as directive lines.
 */

export interface LogicalLine {
  readonly line: number;
  readonly text: string;
  readonly kind: 'statement' | 'directive';
}

const DIRECTIVE = /^\*\s*railwise:\s*(.*)$/i;

/** An inline comment starts at `$` or `;` at the start of the line or after white space. */
const INLINE_COMMENT = /(^|\s)[$;].*$/;

export function logicalLines(text: string): LogicalLine[] {
  const out: { line: number; text: string; kind: LogicalLine['kind'] }[] = [];
  // A byte-order mark, as some editors on Windows write, is not part of the first line.
  const physical = text.replace(/^\uFEFF/, '').split(/\r\n|\r|\n/);
  physical.forEach((raw, i) => {
    const trimmed = raw.trim();
    const directive = DIRECTIVE.exec(trimmed);
    if (directive) {
      out.push({ line: i + 1, text: (directive[1] ?? '').trim(), kind: 'directive' });
      return;
    }
    if (trimmed === '' || trimmed.startsWith('*')) return;
    const body = trimmed.replace(INLINE_COMMENT, '').trim();
    if (body.startsWith('+')) {
      const previous = lastStatement(out);
      if (previous === undefined) {
        throw new ContinuationError(i + 1);
      }
      previous.text = `${previous.text} ${body.slice(1).trim()}`.trim();
      return;
    }
    if (body !== '') out.push({ line: i + 1, text: body, kind: 'statement' });
  });
  return out;
}

function lastStatement(lines: { line: number; text: string; kind: LogicalLine['kind'] }[]) {
  for (let i = lines.length - 1; i >= 0; i--) {
    const l = lines[i];
    if (l?.kind === 'statement') return l;
  }
  return undefined;
}

/** A `+` line with nothing before it to continue. */
export class ContinuationError extends Error {
  override readonly name = 'ContinuationError';
  constructor(readonly line: number) {
    super('a "+" continuation line with no line before it to continue');
  }
}

/**
 * Splits a statement into tokens. `W = 1u` becomes `W=1u`; parentheses and commas are white space
 * (they group `.model` parameters and source functions, which are read by keyword).
 */
export function tokens(text: string): string[] {
  return text
    .replace(/\s*=\s*/g, '=')
    .split(/[\s(),]+/)
    .filter((t) => t !== '');
}
