import type { InputValue, InputVector } from '../model/design.ts';
import { SequenceError } from './check.ts';

/**
 * Reads a sequence written as steps separated by `;`, each a list of `NAME=VALUE` with VALUE one of
 * 0 1 X Z: `"CLK=0 D=1; CLK=1; CLK=0 D=0"`. Names are checked against the inputs.
 */
export function parseSequenceText(text: string, inputs: readonly string[]): InputVector[] {
  const steps = text.split(';').map((s) => s.trim());
  if (steps.length > 0 && steps[steps.length - 1] === '') steps.pop();
  return steps.map((step, i) => {
    if (step === '') throw new SequenceError(`step ${i + 1} is empty`);
    const vector: Record<string, InputValue> = {};
    for (const item of step.split(/[\s,]+/)) {
      const m = /^([^=\s]+)=([01XZxz])$/.exec(item);
      if (!m) throw new SequenceError(`step ${i + 1}: '${item}' is not NAME=0|1|X|Z`);
      if (!inputs.includes(m[1])) throw new SequenceError(`step ${i + 1}: '${m[1]}' is not an input`);
      vector[m[1]] = m[2].toUpperCase() as InputValue;
    }
    return vector;
  });
}
