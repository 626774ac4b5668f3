/**
 * SPICE-style numbers: `2u`, `740.00n`, `1.12e-06`, `10k`, `1meg`, with letters after the scale
 * factor ignored as units (`10pF`, `2.5V`), case-insensitive (common practice, no source).
 *
 * Values are rebuilt as a decimal string and handed to `Number` once, so `1.5u` read in µm is
 * exactly 1.5 and not 1.5 × 1e-6 × 1e6 with its rounding error: import → export → import must be
 * the identity on the netlist.
 */

/** Powers of ten of the scale factors, longest first so `meg` and `mil` win over `m`. */
const SCALE_FACTORS: readonly (readonly [string, number])[] = [
  ['meg', 6],
  ['mil', NaN], // 25.4 µm: not a power of ten, handled apart
  ['t', 12],
  ['g', 9],
  ['k', 3],
  ['m', -3],
  ['u', -6],
  ['µ', -6],
  ['n', -9],
  ['p', -12],
  ['f', -15],
  ['a', -18],
];

const NUMBER_PATTERN = /^([+-]?(?:\d+\.?\d*|\.\d+))(?:e([+-]?\d+))?([a-zµ]*)$/i;

/**
 * The value of a SPICE number in units of 10^targetExponent (0 for SI units, -6 for µm when the
 * text is in metres); null when the text is not a number.
 */
export function spiceValue(text: string, targetExponent = 0): number | null {
  const m = NUMBER_PATTERN.exec(text.trim());
  if (!m) return null;
  const [, mantissa = '0', exp = '0', letters = ''] = m;
  const lower = letters.toLowerCase();
  const scale = SCALE_FACTORS.find(([suffix]) => lower.startsWith(suffix));
  if (scale?.[0] === 'mil') return milValue(mantissa, exp, targetExponent);
  const power = Number(exp) + (scale ? scale[1] : 0) - targetExponent;
  return Number(`${mantissa}e${power}`);
}

function milValue(mantissa: string, exp: string, targetExponent: number): number {
  return Number(`${mantissa}e${Number(exp) - 6 - targetExponent}`) * 25.4;
}

/** Engineering suffixes tried when writing, largest first. */
const WRITE_SUFFIXES: readonly (readonly [string, number])[] = [
  ['meg', 6],
  ['k', 3],
  ['', 0],
  ['m', -3],
  ['u', -6],
  ['n', -9],
  ['p', -12],
  ['f', -15],
];

/**
 * Writes `value` (in units of 10^valueExponent) with the engineering suffix that reads most
 * naturally, checked to read back to exactly the same number; falls back to plain exponent form.
 */
export function formatSpiceNumber(value: number, valueExponent = 0): string {
  for (const [suffix, power] of WRITE_SUFFIXES) {
    const shift = valueExponent - power;
    const scaled = shiftDecimal(value, shift);
    if (Math.abs(scaled) < 1 || Math.abs(scaled) >= 1000) continue;
    const text = `${Number(scaled.toPrecision(15))}${suffix}`;
    if (spiceValue(text, valueExponent) === value) return text;
  }
  const [mantissa, exp = '0'] = String(value).split('e');
  return `${mantissa}e${Number(exp) + valueExponent}`;
}

/** value × 10^shift, exact to the decimal digits of `value`. */
function shiftDecimal(value: number, shift: number): number {
  const [mantissa, exp = '0'] = String(value).split('e');
  return Number(`${mantissa}e${Number(exp) + shift}`);
}
