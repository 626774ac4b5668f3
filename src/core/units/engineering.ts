// Indexes read here are in range by construction, so `!` marks them (no run-time cost).
/**
 * Engineering notation for every figure the user reads (panels, part labels, the command line): a
 * value scaled to an SI prefix so that 1 ≤ |mantissa| < 1000, printed with three significant
 * figures (the precision a switch-level estimate deserves).
 */

const PREFIXES: readonly { readonly exponent: number; readonly symbol: string }[] = [
  { exponent: 9, symbol: 'G' },
  { exponent: 6, symbol: 'M' },
  { exponent: 3, symbol: 'k' },
  { exponent: 0, symbol: '' },
  { exponent: -3, symbol: 'm' },
  { exponent: -6, symbol: 'µ' },
  { exponent: -9, symbol: 'n' },
  { exponent: -12, symbol: 'p' },
  { exponent: -15, symbol: 'f' },
];

/** `engineering(1.234e-4, 'A')` → `'123 µA'`; zero prints as `'0 A'`, NaN as `'?'`. */
export function engineering(value: number, unit: string): string {
  if (Number.isNaN(value)) return '?';
  if (value === 0) return `0 ${unit}`;
  const magnitude = Math.abs(value);
  const prefix =
    PREFIXES.find((p) => magnitude >= 10 ** p.exponent * 0.9995) ?? PREFIXES[PREFIXES.length - 1]!;
  const mantissa = value / 10 ** prefix.exponent;
  return `${Number(mantissa.toPrecision(3))} ${prefix.symbol}${unit}`;
}
