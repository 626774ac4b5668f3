/**
 * Finding a part kind by what the designer types: every typed word must begin a word of the kind's
 * title, its kind name or its search words. Kinds whose title begins with the text come first,
 * the rest keep shelf order, so "p" offers PMOS before the pins and "ground" finds the GND rail.
 */
import { SHELF_KINDS, partSpec, type PartKind } from './index.ts';

function wordsOf(kind: PartKind): string[] {
  const spec = partSpec(kind);
  return `${spec.title} ${kind} ${spec.searchWords}`
    .toLowerCase()
    .split(/[\s-]+/)
    .filter(Boolean);
}

export function findPartKinds(query: string): PartKind[] {
  const typed = query
    .toLowerCase()
    .split(/[\s-]+/)
    .filter(Boolean);
  const matches = SHELF_KINDS.filter((kind) => {
    const words = wordsOf(kind);
    return typed.every((t) => words.some((w) => w.startsWith(t)));
  });
  const text = query.trim().toLowerCase();
  const leads = (kind: PartKind) => partSpec(kind).title.toLowerCase().startsWith(text);
  return [...matches.filter(leads), ...matches.filter((k) => !leads(k))];
}
