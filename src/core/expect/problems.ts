/** Whether an expected function can be used: it parses over the cell's names and names an output. */
import { expressionNames } from './names.ts';
import { ExpressionError, parseExpression } from './parse.ts';
import { nameRecord } from '../model/records.ts';
import type { Netlist } from '../model/netlist.ts';

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

/**
 * Expected functions a check can use: those of existing outputs that parse. The rest become notes,
 * so renaming a pin never takes the whole table away.
 */
export function usableExpectations(
  netlist: Netlist,
  given: Readonly<Record<string, string>>,
): { expectations: Record<string, string>; notes: string[] } {
  const { outputs } = netlist;
  const names = expressionNames(netlist);
  const expectations = nameRecord<string>(); // an output may be called __proto__
  const notes: string[] = [];
  for (const [output, text] of Object.entries(given)) {
    const problem = outputs.includes(output)
      ? expressionProblem(text, names)
      : { message: 'not an output', position: 0 };
    if (problem === null) expectations[output] = text;
    else notes.push(`expected function of ${output} ignored: ${problem.message}`);
  }
  return { expectations, notes };
}
