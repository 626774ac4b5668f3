import type { CompiledNetlist } from '../compile/compile.ts';
import { Schedule } from '../solver/schedule.ts';
import { TableBench } from './build.ts';
import { groupShapes, groupsOfNets, type GroupShape } from './shape.ts';
import { GroupSignatures, SignatureMap } from './signature.ts';
import {
  MAX_TABLE_CONTROLS,
  MAX_TABLE_WORK,
  MAX_TERNARY_CONTROLS,
  type GroupTable,
  type NoTable,
} from './table.ts';

export interface TableOptions {
  /** Inputs left undriven (Z): they are nets of the groups rather than controls. Default: none. */
  readonly undriven?: ReadonlySet<number>;
  /** Bound on a binary table's controls; default MAX_TABLE_CONTROLS. */
  readonly maxControls?: number;
  /** Bound on a ternary table's controls; default MAX_TERNARY_CONTROLS. */
  readonly maxTernaryControls?: number;
  /** The schedule to evaluate groups with, when the caller has one for these undriven inputs. */
  readonly schedule?: Schedule;
}

/**
 * The component tables of one compiled netlist (docs/semantics.md §10): every group's shape at once,
 * each group's table built the first time it is asked for, once for all groups that are identical up
 * to renaming of nets (signature.ts). Tables are exact for what they key on:
 * an entry is what the solver writes for that group in sweep mode when every control sits exactly
 * at the entry's level (0 V, VDD, or unknown for ternary tables).
 */
export class ComponentTables {
  readonly schedule: Schedule;
  readonly shapes: readonly GroupShape[];
  /** Group of each net, -1 for sources (rails and driven inputs). */
  readonly groupOfNet: Int32Array;
  private readonly bench: TableBench;
  private readonly binaryTables = new Map<number, GroupTable | NoTable>();
  private readonly ternaryTables = new Map<number, GroupTable | NoTable>();
  private readonly signatures: GroupSignatures;
  /** Per signature, the first group built with it, for each kind of table: identical groups share it. */
  private readonly builtBinary = new SignatureMap<GroupTable | NoTable>();
  private readonly builtTernary = new SignatureMap<GroupTable | NoTable>();
  /** Tables a group received from an identical group instead of evaluating its own. */
  shared = 0;
  private readonly maxControls: number;
  private readonly maxTernary: number;

  constructor(
    readonly compiled: CompiledNetlist,
    options: TableOptions = {},
  ) {
    this.schedule = options.schedule ?? Schedule.build(compiled, options.undriven ?? new Set());
    const { topology } = this.schedule;
    this.groupOfNet = groupsOfNets(topology);
    this.shapes = groupShapes(compiled, topology, (s) => !this.schedule.isSimpleGroup(s), this.groupOfNet);
    this.bench = new TableBench(compiled, this.schedule);
    this.signatures = new GroupSignatures(compiled, topology);
    this.maxControls = options.maxControls ?? MAX_TABLE_CONTROLS;
    this.maxTernary = options.maxTernaryControls ?? MAX_TERNARY_CONTROLS;
  }

  /** Group s's table with every control at 0 V or VDD (2^k entries), or why it has none. */
  binary(s: number): GroupTable | NoTable {
    return this.lookup(this.binaryTables, this.builtBinary, s, false, this.maxControls);
  }

  /** Group s's table with controls also at X (3^k entries), for dual-rail lanes, or why it has none. */
  ternary(s: number): GroupTable | NoTable {
    return this.lookup(this.ternaryTables, this.builtTernary, s, true, this.maxTernary);
  }

  private lookup(
    cache: Map<number, GroupTable | NoTable>,
    bySignature: SignatureMap<GroupTable | NoTable>,
    s: number,
    ternary: boolean,
    bound: number,
  ): GroupTable | NoTable {
    let found = cache.get(s);
    if (found === undefined) {
      const shape = this.shapes[s];
      if (shape === undefined) throw new RangeError(`no group ${s}: the cell has ${this.shapes.length}`);
      const signature = this.signatures.of(shape);
      const twin = signature === null ? undefined : bySignature.get(signature);
      // A twin's entries are by position, so they read the same for this group's nets and controls.
      found = twin === undefined ? make(this.bench, shape, ternary, bound) : withShape(twin, shape);
      if (twin?.kind === 'table') this.shared++;
      if (signature !== null && twin === undefined) bySignature.set(signature, found);
      cache.set(s, found);
    }
    return found;
  }
}

/** A twin's table or refusal, read for `shape` (written out: a spread copy was slow on first runs). */
function withShape(twin: GroupTable | NoTable, shape: GroupShape): GroupTable | NoTable {
  if (twin.kind === 'none') return { kind: 'none', shape, reason: twin.reason };
  const { ternary, entries, states, flags, volts, current, clean, cleanObserved } = twin;
  return { kind: 'table', shape, ternary, entries, states, flags, volts, current, clean, cleanObserved };
}

function make(bench: TableBench, shape: GroupShape, ternary: boolean, bound: number): GroupTable | NoTable {
  const reason = refusal(shape, ternary, bound);
  return reason === null ? bench.build(shape, ternary) : { kind: 'none', shape, reason };
}

function refusal(shape: GroupShape, ternary: boolean, bound: number): string | null {
  const k = shape.controls.length;
  if (k > bound) return `${k} controls exceed the table bound of ${bound}`;
  const work = (ternary ? 3 : 2) ** k * Math.max(1, shape.elements.length);
  if (work > MAX_TABLE_WORK)
    return `${k} controls over ${shape.elements.length} elements exceed the table work bound of ${MAX_TABLE_WORK} element evaluations`;
  return null;
}
