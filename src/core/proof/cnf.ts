import { SatSolver } from './sat.ts';

/** The literal that is always true (variable 1, fixed by a unit clause); FALSE is its negation. */
export const TRUE = 1;
export const FALSE = -1;

/**
 * Tseitin encoding with constant folding and structural hashing: every gate made here gets one
 * variable and the clauses that make it equal to its function, and asking twice for the same gate
 * of the same literals returns the same literal. Literals are signed variable numbers of `sat`.
 */
export class Cnf {
  readonly sat = new SatSolver();
  private readonly gates = new Map<string, number>();

  constructor() {
    this.sat.newVar();
    this.sat.addClause([TRUE]);
  }

  fresh(): number {
    return this.sat.newVar();
  }

  /** The conjunction of the literals (TRUE when there are none). */
  and(literals: readonly number[]): number {
    const kept = new Set<number>();
    for (const lit of literals) {
      if (lit === FALSE || kept.has(-lit)) return FALSE;
      if (lit !== TRUE) kept.add(lit);
    }
    if (kept.size === 0) return TRUE;
    if (kept.size === 1) return kept.values().next().value as number;
    const sorted = [...kept].sort((a, b) => a - b);
    const key = `&${sorted.join(',')}`;
    let v = this.gates.get(key);
    if (v === undefined) {
      v = this.sat.newVar();
      for (const lit of sorted) this.sat.addClause([-v, lit]);
      this.sat.addClause([v, ...sorted.map((lit) => -lit)]);
      this.gates.set(key, v);
    }
    return v;
  }

  /** The disjunction of the literals (FALSE when there are none). */
  or(literals: readonly number[]): number {
    return -this.and(literals.map((lit) => -lit));
  }

  /** If s then t else e. */
  ite(s: number, t: number, e: number): number {
    if (s === TRUE || t === e) return t;
    if (s === FALSE) return e;
    if (s < 0) return this.ite(-s, e, t);
    if (t === TRUE) return this.or([s, e]);
    if (t === FALSE) return this.and([-s, e]);
    if (e === TRUE) return this.or([-s, t]);
    if (e === FALSE) return this.and([s, t]);
    if (t === s) return this.or([s, e]);
    if (e === s) return this.and([s, t]);
    const key = `?${s},${t},${e}`;
    let v = this.gates.get(key);
    if (v === undefined) {
      v = this.sat.newVar();
      this.sat.addClause([-s, -t, v]);
      this.sat.addClause([-s, t, -v]);
      this.sat.addClause([s, -e, v]);
      this.sat.addClause([s, e, -v]);
      // Redundant, but they let propagation conclude v when both branches agree.
      this.sat.addClause([-t, -e, v]);
      this.sat.addClause([t, e, -v]);
      this.gates.set(key, v);
    }
    return v;
  }

  xor(a: number, b: number): number {
    return this.ite(a, -b, b);
  }

  /**
   * The function of `controls` whose value at assignment e (bit i = controls[i]) is truth[e] != 0,
   * built as a reduced ordered decision diagram (control 0 decided last) whose nodes are `ite` gates,
   * so equal sub-functions share one literal.
   */
  truthTable(controls: readonly number[], truth: Uint8Array): number {
    let row: number[] = Array.from(truth, (bit) => (bit ? TRUE : FALSE));
    for (const control of controls) {
      const next = new Array<number>(row.length >> 1);
      for (let j = 0; j < next.length; j++) next[j] = this.ite(control, row[2 * j + 1]!, row[2 * j]!);
      row = next;
    }
    return row[0]!;
  }
}
