import MiniSat from 'logic-solver/minisat_wrapper.js';

/** The SAT solver could not finish: its fixed heap ran out (asm.js MiniSat has 64 MB). */
export class SatLimitError extends Error {
  override readonly name = 'SatLimitError';
}

/**
 * Clauses over numbered variables (1, 2, …; a negative number is the variable's negation), solved by
 * logic-solver's MiniSat. Clauses are kept permanently; a query assumes literals for one solve only.
 */
export class SatSolver {
  private readonly minisat = new MiniSat();
  private vars = 0;
  private clauses = 0;
  private unsat = false;

  get variableCount(): number {
    return this.vars;
  }

  get clauseCount(): number {
    return this.clauses;
  }

  newVar(): number {
    return ++this.vars;
  }

  addClause(literals: number[]): void {
    this.clauses++;
    if (!this.guard(() => this.minisat.addClause(literals))) this.unsat = true;
  }

  /**
   * A model of the clauses with every assumed literal true, as a value per variable (index 0
   * unused), or null when there is none.
   */
  solve(assumptions: readonly number[]): boolean[] | null {
    if (this.unsat) return null;
    const query = this.newVar();
    for (const lit of assumptions) this.addClause([-query, lit]);
    this.minisat.ensureVar(this.vars);
    const found = this.guard(() => this.minisat.solveAssuming(query));
    const model = found ? this.guard(() => this.minisat.getSolution()).map((v) => v === true) : null;
    this.minisat.retireVar(query);
    return model;
  }

  /** asm.js aborts by throwing a string; it becomes a SatLimitError. */
  private guard<T>(step: () => T): T {
    try {
      return step();
    } catch (e) {
      if (e instanceof Error) throw e;
      throw new SatLimitError(`the SAT solver stopped: ${String(e).slice(0, 200)}`);
    }
  }
}
