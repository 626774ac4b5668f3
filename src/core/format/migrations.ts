/**
 * Numbered migrations of the design file. `MIGRATIONS[n]` turns a document of version n into one
 * of version n + 1; loading applies them in order up to the current version, so an old file is
 * never read by a schema it was not written for. To change the format: bump the version, add the
 * new schema, and append one migration here (with a test that loads a file of the old version).
 */
import { DESIGN_FORMAT_TAG } from './schema.ts';

export type RawDocument = Record<string, unknown>;

export interface Migration {
  readonly from: number;
  readonly describe: string;
  readonly up: (doc: RawDocument) => RawDocument;
  /** Where a field of the migrated document sits in a file of the old version (for messages). */
  readonly oldPath: (path: readonly PropertyKey[]) => readonly PropertyKey[];
}

function text(value: unknown): string | undefined {
  return typeof value === 'string' && value !== '' ? value : undefined;
}

export const MIGRATIONS: readonly Migration[] = [
  {
    from: 0,
    describe: 'a bare netlist object (devices, rails, inputs, outputs) becomes a netlist-only design',
    up: (doc) => ({
      format: DESIGN_FORMAT_TAG,
      version: 1,
      name: typeof doc['name'] === 'string' ? doc['name'] : 'cell',
      netlist: doc,
    }),
    oldPath: (path) => (path[0] === 'netlist' ? path.slice(1) : path),
  },
  {
    from: 1,
    describe: 'a one-cell design becomes a design whose only cell is that one, open on the sheet',
    up: ({ netlist, expectations, sequences, sheet, ...rest }) => {
      const named = typeof netlist === 'object' && netlist !== null ? (netlist as RawDocument)['name'] : '';
      const cell = text(named) ?? text(rest['name']) ?? 'cell';
      const body = { netlist, expectations, sequences, sheet };
      return { ...rest, version: 2, open: cell, cells: [{ name: cell, instances: [], ...body }] };
    },
    oldPath: (path) => (path[0] === 'cells' && path[1] === 0 ? path.slice(2) : path),
  },
];

export const CURRENT_DESIGN_VERSION = MIGRATIONS.length;

/**
 * The version a raw document claims: its `version` field when it carries the format tag, 0 for a
 * bare netlist, null when it is neither.
 */
export function documentVersion(doc: RawDocument): number | null {
  if (doc['format'] === DESIGN_FORMAT_TAG) {
    const v = doc['version'];
    return typeof v === 'number' && Number.isInteger(v) && v >= 0 ? v : null;
  }
  if (!('format' in doc) && Array.isArray(doc['devices'])) return 0;
  return null;
}

/** Applies every migration from `version` up to the current one; the input is not mutated. */
export function migrateToCurrent(doc: RawDocument, version: number): RawDocument {
  let current = doc;
  for (let v = version; v < CURRENT_DESIGN_VERSION; v++) {
    const step = MIGRATIONS[v];
    if (step === undefined || step.from !== v) throw new Error(`migration ${v} is missing`);
    current = step.up(current);
  }
  return current;
}

/** A path in the current version's document as a file of `version` spells it. */
export function pathInVersion(path: readonly PropertyKey[], version: number): readonly PropertyKey[] {
  let p = path;
  for (let v = CURRENT_DESIGN_VERSION - 1; v >= version; v--) p = MIGRATIONS[v]?.oldPath(p) ?? p;
  return p;
}
