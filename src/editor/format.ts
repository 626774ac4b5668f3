/** Engineering notation for part values: 10k, 4.7k, 10f, 1.5p (SI prefixes, trade shorthand). */
const PREFIXES: readonly [number, string][] = [
  [1e9, 'G'],
  [1e6, 'M'],
  [1e3, 'k'],
  [1, ''],
  [1e-3, 'm'],
  [1e-6, 'µ'],
  [1e-9, 'n'],
  [1e-12, 'p'],
  [1e-15, 'f'],
  [1e-18, 'a'],
];

export function engineering(value: number, unit = ''): string {
  if (value === 0 || !Number.isFinite(value)) return `${value}${unit}`;
  const [scale, prefix] = PREFIXES.find(([s]) => Math.abs(value) >= s) ?? PREFIXES[PREFIXES.length - 1]!;
  const n = value / scale;
  return `${Number(n.toPrecision(3))}${prefix}${unit}`;
}
