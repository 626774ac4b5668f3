/**
 * Types for the part of logic-solver that Railwise uses: its MiniSat (compiled to asm.js), driven
 * with clauses of signed variable numbers. The package ships no types.
 */
declare module 'logic-solver/minisat_wrapper.js' {
  export default class MiniSat {
    /** Makes variables 1…v exist even if no clause names them. */
    ensureVar(v: number): void;
    /** Adds a clause of signed variable numbers; false when the clauses are already unsatisfiable. */
    addClause(terms: number[]): boolean;
    solve(): boolean;
    /** Solves with variable v assumed true. */
    solveAssuming(v: number): boolean;
    /** The last model: index v is variable v's value (index 0 unused). */
    getSolution(): (boolean | null)[];
    /** Variable v is never assumed again (MiniSat adds the unit clause ¬v). */
    retireVar(v: number): void;
  }
}
