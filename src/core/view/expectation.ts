/** Checking an expected function as it is typed, for the editor's in-place error mark. */
import { ExpressionError, parseExpression } from '../expect/parse.ts';

export interface ExpressionProblem {
  /** What is wrong, without the position (the editor marks the token instead). */
  readonly message: string;
  /** 0-based column of the offending token. */
  readonly position: number;
}

/**
 * Null when the text parses over these names (a cell's inputs and outputs: `expressionNames`);
 * otherwise the first problem and where it is.
 */
export function expressionProblem(text: string, names: readonly string[]): ExpressionProblem | null {
  try {
    parseExpression(text, names);
    return null;
  } catch (error) {
    if (!(error instanceof ExpressionError)) throw error;
    // The error's message repeats the column and source for the command line; the editor shows both itself.
    const message = error.message.replace(/ at column \d+ of "[\s\S]*"$/, '');
    return { message, position: error.position };
  }
}

/** The extent of the token at `position`: a name, or one character, so the mark covers what was typed. */
export function tokenSpan(text: string, position: number): [number, number] {
  const at = Math.max(0, Math.min(position, text.length));
  const name = /^[A-Za-z_][\w.[\]]*/.exec(text.slice(at));
  return [at, at + Math.max(1, name?.[0].length ?? 1)];
}
