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

/**
 * The logical lines one at a time, so a caller that reads them in order never holds them all. A
 * statement, and the directive lines after it, are yielded when the next statement starts: a `+`
 * line may still continue it until then.
 */
export function* logicalLines(text: string): Generator<LogicalLine> {
  let queued: Pending[] = [];
  let lastStatement: Pending | undefined;
  let line = 0;
  // A byte-order mark, as some editors on Windows write, is not part of the first line.
  for (const raw of physicalLines(text.replace(/^\uFEFF/, ''))) {
    line++;
    const trimmed = raw.trim();
    const special = specialComment(trimmed, line);
    if (special !== null) {
      queued.push(special);
      continue;
    }
    if (trimmed === '' || trimmed.startsWith('*')) continue;
    const body = trimmed.replace(INLINE_COMMENT, '').trim();
    if (body.startsWith('+')) {
      if (lastStatement === undefined) throw new ContinuationError(line);
      const rest = body.slice(1).trim();
      if (rest !== '') lastStatement.parts.push(rest);
      continue;
    }
    if (body === '') continue;
    yield* queued.map(finished);
    lastStatement = { line, kind: 'statement', parts: [body] };
    queued = [lastStatement];
  }
  yield* queued.map(finished);
}

function finished(p: Pending): LogicalLine {
  return {
    line: p.line,
    kind: p.kind,
    text: p.parts.length === 1 ? (p.parts[0] as string) : p.parts.join(' '),
  };
}

/** The physical lines of a text (`\r\n`, `\r` or `\n` ends one), without an array of them all. */
function* physicalLines(text: string): Generator<string> {
  const end = /\r\n|\r|\n/g;
  let from = 0;
  for (let m = end.exec(text); m !== null; m = end.exec(text)) {
    yield text.slice(from, m.index);
    from = end.lastIndex;
  }
  yield text.slice(from);
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
