/**
 * Fresh ids and names, derived from the sheet itself so that edits stay pure functions:
 * the same sheet always yields the same next id.
 */
import type { PartKind, Sheet } from './types.ts';
import { partSpec } from './parts/index.ts';

function maxSuffix(values: Iterable<string>, prefix: string): number {
  let max = 0;
  const re = new RegExp(`^${prefix.replace(/[$]/g, '\\$')}(\\d+)$`);
  for (const v of values) {
    const m = re.exec(v);
    if (m) max = Math.max(max, Number(m[1]));
  }
  return max;
}

/** Next part id (`p1`, `p2`, …) and wire id (`w1`, …), after the largest in use. */
export function nextPartId(sheet: Sheet, offset = 0): string {
  return `p${
    maxSuffix(
      sheet.parts.map((p) => p.id),
      'p',
    ) +
    1 +
    offset
  }`;
}

export function nextWireId(sheet: Sheet, offset = 0): string {
  return `w${
    maxSuffix(
      sheet.wires.map((w) => w.id),
      'w',
    ) +
    1 +
    offset
  }`;
}

/**
 * The name a new part of this kind gets, by its spec's naming rule: devices are numbered per
 * prefix (N1, N2, …); rails take their one name; pins and labels take the next unused letter, then
 * numbered names.
 */
export function nextPartName(sheet: Sheet, kind: PartKind, offset = 0): string {
  const naming = partSpec(kind).naming;
  const names = sheet.parts.map((p) => p.name);
  switch (naming.type) {
    case 'fixed':
      return naming.name;
    case 'numbered':
      return `${naming.prefix}${maxSuffix(names, naming.prefix) + 1 + offset}`;
    case 'letters': {
      const used = new Set(names);
      let skipped = 0;
      for (const letter of naming.letters) {
        if (used.has(letter)) continue;
        if (skipped++ === offset) return letter;
      }
      return `${naming.prefix}${maxSuffix(names, naming.prefix) + 1 + offset}`;
    }
  }
}

/** Net names that users may type: letters, digits, `_ . [ ] < > : / -`, starting with a letter or `_`. */
export const NET_NAME_PATTERN = /^[A-Za-z_][A-Za-z0-9_.[\]<>:/-]*$/;
