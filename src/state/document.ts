/**
 * The document slice: what the designer edits and what undo restores. The netlist is never
 * stored here; it is derived from the sheet on every change, so the two cannot disagree.
 */
import type { Design, Sequence } from '../core/model/design.ts';
import type { Technology } from '../core/model/technology.ts';
import type { Sheet } from '../core/sheet/types.ts';
import { sheetToNetlist, type DerivedNetlist, type SheetIssue } from '../core/sheet/toNetlist.ts';
import { autoPlace } from '../core/sheet/autoPlace.ts';
import { samePlainData } from '../core/model/plainData.ts';
import { nameRecord } from '../core/model/records.ts';

export interface SheetDocument {
  readonly name: string;
  readonly technology: Technology;
  readonly expectations: Readonly<Record<string, string>>;
  readonly sequences: readonly Sequence[];
  readonly notes?: string;
  readonly sheet: Sheet;
}

/** Drawing facts the analysis overlay needs to paint levels onto the sheet. */
export interface SheetGeometry {
  /** Net name of every wire, by wire id. */
  readonly wireNets: Readonly<Record<string, string>>;
  /** Net name of every part pin, keyed `partId.pin` (pins: gate, drain, source, a, b, net). */
  readonly pinNets: ReadonlyMap<string, string>;
  /** Device name of every device part, by part id. */
  readonly partDevices: Readonly<Record<string, string>>;
  /** The inverse: part id of every device name. */
  readonly deviceParts: Readonly<Record<string, string>>;
  readonly junctions: readonly { readonly x: number; readonly y: number }[];
  /** Wire ends that touch nothing, marked on the sheet as unfinished wiring. */
  readonly openEnds: readonly { readonly x: number; readonly y: number }[];
}

export interface DerivedDesign {
  readonly design: Design;
  readonly geometry: SheetGeometry;
  readonly issues: readonly SheetIssue[];
}

/**
 * The netlist of a sheet, remembered per sheet object: an edit that is judged before it is committed
 * (docs/semantics.md §1) derives its result once, and the commit reuses it.
 */
const derivedSheets = new WeakMap<Sheet, { readonly name: string; readonly derived: DerivedNetlist }>();

export function derivedSheet(sheet: Sheet, name: string): DerivedNetlist {
  const known = derivedSheets.get(sheet);
  if (known !== undefined && known.name === name) return known.derived;
  const derived = sheetToNetlist(sheet, name);
  derivedSheets.set(sheet, { name, derived });
  return derived;
}

/**
 * The design of a document: the netlist derived from the sheet. With the design derived before, an
 * unchanged netlist or technology keeps its old object, so "did the circuit change?" is one identity
 * test for everything downstream (moving a part re-derives an equal netlist).
 */
export function deriveDesign(doc: SheetDocument, before: Design | null = null): DerivedDesign {
  const d = derivedSheet(doc.sheet, doc.name);
  const deviceParts = nameRecord<string>();
  for (const [partId, device] of Object.entries(d.partDevices)) deviceParts[device] ??= partId;
  const design: Design = {
    name: doc.name,
    technology: kept(before?.technology, doc.technology),
    netlist: kept(before?.netlist, d.netlist),
    expectations: doc.expectations,
    sequences: doc.sequences,
    sheet: doc.sheet,
    ...(doc.notes === undefined ? {} : { notes: doc.notes }),
  };
  return {
    design,
    geometry: {
      wireNets: d.wireNets,
      pinNets: d.pinNets,
      partDevices: d.partDevices,
      deviceParts,
      junctions: d.junctions,
      openEnds: d.openEnds,
    },
    issues: d.issues,
  };
}

/** The earlier object when it equals the new one, so unchanged parts keep their identity. */
function kept<T>(earlier: T | undefined, next: T): T {
  return earlier !== undefined && samePlainData(earlier, next) ? earlier : next;
}

/** A design as the editor holds it; a design without a drawing is placed automatically. */
export function documentFromDesign(design: Design): SheetDocument {
  return {
    name: design.name,
    technology: design.technology,
    expectations: design.expectations,
    sequences: design.sequences,
    ...(design.notes === undefined ? {} : { notes: design.notes }),
    sheet: design.sheet ?? autoPlace(design.netlist),
  };
}
