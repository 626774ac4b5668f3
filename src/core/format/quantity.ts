/**
 * zod schemas for the numbers of a design file: finite and inside their physical range
 * (model/ranges.ts), with a message that gives the range and the value found (an infinity included,
 * which JSON makes of 1e400).
 */
import { z } from 'zod';
import { inRange, RANGES, rangeText, type Range } from '../model/ranges.ts';

export function quantity(range: Range) {
  const outside = (input: unknown): string => `${rangeText(range)}, not ${String(input)}`;
  return z
    .number({
      error: (issue) =>
        typeof issue.input === 'number' ? outside(issue.input) : `expected a number (${range.words})`,
    })
    .refine((v) => inRange(v, range), { error: (issue) => outside(issue.input) });
}

export const length = quantity(RANGES.length);
export const ohms = quantity(RANGES.ohms);
export const farads = quantity(RANGES.farads);
export const coordinate = quantity(RANGES.coordinate);

/** The range of a part's size field by its key (w, l, ohms, farads); any other stays a positive number. */
export function partField(key: string) {
  if (key === 'w' || key === 'l') return length;
  if (key === 'ohms') return ohms;
  if (key === 'farads') return farads;
  return z.number().positive();
}
