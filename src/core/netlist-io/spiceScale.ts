/**
 * Scale directives (docs/semantics.md §6): transistor W and L are multiplied by the scale, as the
 * SPICE family does with `.option scale=…` and `.scale …`, and CDL with its `*.SCALE` comment
 * (`*.SCALE METER` for sizes in metres, `*.SCALE MICRON` for micrometres; from memory). A file
 * with no directive whose sizes are all implausible in metres is read in micrometres, with a note.
 */
import { spiceValue } from '../units/spiceNumber.ts';
import { rangeProblem } from './valueRanges.ts';

export interface Scale {
  /** Metres per unit of the numbers written for W and L. */
  readonly factor: number;
  readonly line: number;
  /** How it was given, for notes: `.option scale=`, `.scale`, `*.SCALE`, `--scale`, `guessed`. */
  readonly form: string;
}

const WORDS: Readonly<Record<string, number>> = {
  meter: 1,
  meters: 1,
  metre: 1,
  metres: 1,
  micron: 1e-6,
  microns: 1e-6,
  micrometer: 1e-6,
  micrometre: 1e-6,
  um: 1e-6,
};

export function readScale(text: string, line: number, form: string, fail: (detail: string) => never): Scale {
  const word = WORDS[text.trim().toLowerCase()];
  const factor = word ?? spiceValue(text);
  if (factor === null) return fail(`${form} ${text}: give a number such as 1e-6 (or METER, MICRON)`);
  const problem = rangeProblem('scale', factor);
  if (problem !== null) return fail(`${form} ${text} ${problem}`);
  return { factor, line, form };
}

/**
 * A length as written, in micrometres under `factor` metres per unit. Powers of ten are applied to
 * the decimal exponent, so `w=650000u` under 1e-6 is exactly 0.65 µm (import → export → import stays
 * the identity); other factors multiply.
 */
export function scaledMicrons(text: string, factor: number): number | null {
  const exponent = Math.round(Math.log10(factor));
  if (Number(`1e${exponent}`) === factor) return spiceValue(text, -6 - exponent);
  const metres = spiceValue(text);
  return metres === null ? null : metres * factor * 1e6;
}
