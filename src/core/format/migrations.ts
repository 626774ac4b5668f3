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
