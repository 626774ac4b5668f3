/**
 * Splits SPICE text into logical lines: `*` comment lines dropped, `$` and `;` inline comments cut,
 * `+` continuation lines joined to the line they continue. Each logical line keeps the number of
 * its first physical line (1-based), which every error message names.
 *
 * Comments of the form `* railwise: KEY VALUE…` are our own directives (expected functions, pin
 * directions, rail names) and are kept as directive lines. CDL's `*.SCALE VALUE` comment is kept
 * as a `scale` line (docs/semantics.md §6).
 */

export interface LogicalLine {
  readonly line: number;
  readonly text: string;
  readonly kind: 'statement' | 'directive' | 'scale';
}

const DIRECTIVE = /^\*\s*railwise:\s*(.*)$/i;
const CDL_SCALE = /^\*\.scale\s+(.*)$/i;

/** An inline comment starts at `$` or `;` at the start of the line or after white space. */
const INLINE_COMMENT = /(^|\s)[$;].*$/;

interface Pending {
  readonly line: number;
  readonly kind: LogicalLine['kind'];
  /** The line's pieces, joined once at the end: joining as we go is quadratic in the pieces. */
  readonly parts: string[];
}

export function logicalLines(text: string): LogicalLine[] {
  const out: Pending[] = [];
  let lastStatement: Pending | undefined;
  // A byte-order mark, as some editors on Windows write, is not part of the first line.
  const physical = text.replace(/^\uFEFF/, '').split(/\r\n|\r|\n/);
  for (let i = 0; i < physical.length; i++) {
    const trimmed = (physical[i] as string).trim();
    const special = specialComment(trimmed, i + 1);
    if (special !== null) {
      out.push(special);
      continue;
    }
    if (trimmed === '' || trimmed.startsWith('*')) continue;
    const body = trimmed.replace(INLINE_COMMENT, '').trim();
    if (body.startsWith('+')) {
      if (lastStatement === undefined) throw new ContinuationError(i + 1);
      const rest = body.slice(1).trim();
      if (rest !== '') lastStatement.parts.push(rest);
      continue;
    }
    if (body === '') continue;
    lastStatement = { line: i + 1, kind: 'statement', parts: [body] };
    out.push(lastStatement);
  }
  return out.map((p) => ({ line: p.line, kind: p.kind, text: p.parts.join(' ') }));
}

function specialComment(trimmed: string, line: number): Pending | null {
  const directive = DIRECTIVE.exec(trimmed);
  if (directive) return { line, kind: 'directive', parts: [(directive[1] ?? '').trim()] };
  const scale = CDL_SCALE.exec(trimmed);
  if (scale) return { line, kind: 'scale', parts: [(scale[1] ?? '').trim()] };
  return null;
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
