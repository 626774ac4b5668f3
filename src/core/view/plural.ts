/**
 * Counts as every panel and message writes them: "1 device", "2 devices", "0 errors". English
 * plural by -s unless the noun's plural is given ("1 match", "2 matches"). Whole numbers of five
 * digits or more are grouped by thousands ("65,536 vectors"); four digits stay as they are.
 */
export function wholeNumber(n: number | bigint): string {
  return (typeof n === 'bigint' ? n >= 10_000n || n <= -10_000n : Math.abs(n) >= 10_000)
    ? n.toLocaleString('en-US')
    : String(n);
}

export function countOf(n: number | bigint, singular: string, plural = `${singular}s`): string {
  return `${wholeNumber(n)} ${n === 1 || n === 1n ? singular : plural}`;
}
