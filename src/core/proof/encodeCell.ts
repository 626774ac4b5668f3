import { NMOS, PMOS, type CompiledNetlist } from '../compile/compile.ts';
import { classify, LEVEL_0, LEVEL_1 } from '../solver/levels.ts';
import { ComponentTables } from '../tables/componentTables.ts';
import { FALSE, TRUE, type Cnf } from './cnf.ts';
import type { GroupContext, GroupEncoding, LevelLits, RailLits } from './literals.ts';
import { encodeStructural } from './structural.ts';
import { encodeTabled } from './tabled.ts';

/** Literals of the devices joining two sources directly (bridges), which belong to no group. */
interface BridgeLits {
  readonly current: number;
  readonly unknown: number;
}

/**
 * One cell as CNF over its input pins (docs/semantics.md §10): every group of the engine in
 * evaluation order, from its table or, past the table bound, structurally. Inputs share variables
 * by name with whatever else the same `Cnf` holds (the other cell of an equivalence).
 */
export class CellEncoding {
  readonly tables: ComponentTables;
  readonly groups: GroupEncoding[] = [];
  private readonly rails = new Map<number, RailLits>();
  private readonly levels = new Map<number, LevelLits>();
  private readonly bridges: BridgeLits[];

  constructor(
    private readonly cnf: Cnf,
    readonly compiled: CompiledNetlist,
    private readonly inputs: Map<string, number>,
    options: { readonly maxControls?: number } = {},
  ) {
    this.tables = new ComponentTables(
      compiled,
      options.maxControls === undefined ? {} : { maxControls: options.maxControls },
    );
    for (const name of compiled.netlist.inputs) if (!inputs.has(name)) inputs.set(name, cnf.fresh());
    const context = this.context();
    const { topology } = this.tables.schedule;
    for (const shape of this.tables.shapes) {
      const table = this.tables.binary(shape.index);
      const group =
        table.kind === 'table'
          ? encodeTabled(cnf, table, context)
          : encodeStructural(cnf, compiled, topology, shape, context);
      for (const [n, r] of group.rails) this.rails.set(n, r);
      for (const [n, l] of group.levels) this.levels.set(n, l);
      this.groups.push(group);
    }
    this.bridges = Array.from(topology.bridges, (e) => this.bridge(e));
  }

  /** The variable of an input pin. */
  input(name: string): number | undefined {
    return this.inputs.get(name);
  }

  /** Rail literals of any net: a rail, an input pin, or a net that feeds a gate. */
  rail(n: number): RailLits {
    const v = this.compiled.railVolts[n];
    if (!Number.isNaN(v))
      return { high: v === this.compiled.tech.vdd ? TRUE : FALSE, low: v === 0 ? TRUE : FALSE };
    const pin = this.sourcePin(n);
    if (pin !== undefined) return { high: pin, low: -pin };
    const found = this.rails.get(n);
    if (found === undefined) throw new Error(`no rail literals for ${this.compiled.netNames[n]}`);
    return found;
  }

  /** Level literals of an output. */
  level(n: number): LevelLits {
    const { vil, vih } = this.compiled.tech;
    const v = this.compiled.railVolts[n]!;
    if (!Number.isNaN(v)) {
      const level = classify(v, vil, vih);
      return {
        l0: level === LEVEL_0 ? TRUE : FALSE,
        l1: level === LEVEL_1 ? TRUE : FALSE,
        lz: FALSE,
        degraded: FALSE,
      };
    }
    const pin = this.sourcePin(n);
    if (pin !== undefined) return { l0: -pin, l1: pin, lz: FALSE, degraded: FALSE };
    const found = this.levels.get(n);
    if (found === undefined) throw new Error(`no level literals for ${this.compiled.netNames[n]}`);
    return found;
  }

  /** The groups whose results decide these nets (their own and every group upstream through controls). */
  cone(nets: readonly number[]): number[] {
    const { groupOfNet, shapes } = this.tables;
    const seen = new Set<number>();
    const todo = nets.map((n) => groupOfNet[n]!).filter((s) => s >= 0);
    for (let s = todo.pop(); s !== undefined; s = todo.pop()) {
      if (seen.has(s)) continue;
      seen.add(s);
      for (const c of shapes[s]!.controls) if (groupOfNet[c]! >= 0) todo.push(groupOfNet[c]!);
    }
    return [...seen].sort((a, b) => a - b);
  }

  /** Every group: for properties of the whole cell. */
  allGroups(): number[] {
    return this.groups.map((_, s) => s);
  }

  /** True for the vectors where some of these groups (or, with `bridges`, a bridge) is not described. */
  unknown(groups: readonly number[], bridges = false): number {
    const lits = groups.map((s) => this.groups[s]!.unknown);
    return this.cnf.or(bridges ? [...lits, ...this.bridges.map((b) => b.unknown)] : lits);
  }

  /** Some device of the cell carries current. */
  current(): number {
    return this.cnf.or([...this.groups.map((g) => g.current), ...this.bridges.map((b) => b.current)]);
  }

  contention(): number {
    return this.cnf.or(this.groups.map((g) => g.contention));
  }

  private sourcePin(n: number): number | undefined {
    const { isSource } = this.tables.schedule.topology;
    return isSource[n] ? this.inputs.get(this.compiled.netNames[n]!) : undefined;
  }

  private context(): GroupContext {
    const c = this.compiled;
    const output = new Uint8Array(c.netCount);
    for (const o of c.outputNets) output[o] = 1;
    return {
      rail: (n) => this.rail(n),
      needsRail: (n) => c.netGates.start[n + 1]! > c.netGates.start[n]!,
      needsLevel: (n) => output[n] === 1,
      name: (n) => c.netNames[n] ?? `net ${n}`,
    };
  }

  /** A device between two sources: it carries current when on and its ends differ. */
  private bridge(e: number): BridgeLits {
    const c = this.compiled;
    const kind = c.chKind[e];
    const gate = kind === NMOS || kind === PMOS ? this.rail(c.chGate[e]!) : { high: TRUE, low: FALSE };
    const on = kind === NMOS ? gate.high : kind === PMOS ? gate.low : TRUE;
    const [a, b] = [c.chA[e]!, c.chB[e]!];
    const odd = (n: number): boolean =>
      !Number.isNaN(c.railVolts[n]!) && c.railVolts[n] !== 0 && c.railVolts[n] !== c.tech.vdd;
    const differ =
      odd(a) || odd(b)
        ? !Number.isNaN(c.railVolts[a]!) && !Number.isNaN(c.railVolts[b]!)
          ? c.railVolts[a] !== c.railVolts[b]
            ? TRUE
            : FALSE
          : TRUE
        : this.cnf.xor(this.rail(a).high, this.rail(b).high);
    return { current: this.cnf.and([on, differ]), unknown: this.cnf.and([-gate.high, -gate.low]) };
  }
}
