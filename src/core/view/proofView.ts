/**
 * Words for a proof's answers (docs/semantics.md §10), shared by the workspace and the command line:
 * what each property says, and a counterexample vector written out.
 */
import type { PropertyQuery } from '../proof/properties.ts';

/** At most this many inputs are spelled out in a counterexample; the vector itself has them all. */
export const MAX_SHOWN_INPUTS = 24;

/** The property as a sentence about the cell: "Y follows its expected function". */
export function propertyTitle(q: PropertyQuery): string {
  const out = q.output ?? 'the cell';
  switch (q.property) {
    case 'function':
      return `${out} follows its expected function`;
    case 'no-static-current':
      return 'no static current from supply to ground, no short';
    case 'no-contention':
      return 'no contention';
    case 'no-floating':
      return `${out} never floats (unless Z is expected)`;
    case 'no-unknown':
      return `${out} never unknown (X)`;
    case 'no-degraded':
      return `${out} never degraded by a threshold drop`;
  }
}

/** `A=1 B=0`, the first `max` inputs, then how many more. */
export function vectorText(
  vector: Readonly<Record<string, 0 | 1>>,
  name: (pin: string) => string = (pin) => pin,
  max = MAX_SHOWN_INPUTS,
): string {
  const parts = Object.entries(vector).map(([pin, v]) => `${name(pin)}=${v}`);
  const more = parts.length - max;
  return more > 0 ? `${parts.slice(0, max).join(' ')} … (${more} more)` : parts.join(' ');
}
