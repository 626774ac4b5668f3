/**
 * The sheet's live solve: one compiled netlist and simulator per document revision, each input toggle
 * solved from the previous result so stored charge carries over as it would on silicon (a latch keeps
 * its state when its inputs release it). A new netlist starts from an unknown state.
 */
import { solvedVectorFindings } from '../analysis/check.ts';
import type { Finding } from '../analysis/report.ts';
import { compile, type CompiledNetlist } from '../compile/compile.ts';
import type { InputVector } from '../model/design.ts';
import type { Netlist } from '../model/netlist.ts';
import type { Technology } from '../model/technology.ts';
import { Simulator, type SolveResult } from '../solver/simulator.ts';

export class LiveSession {
  readonly compiled: CompiledNetlist;
  private readonly simulator: Simulator;
  private last: SolveResult | null = null;

  constructor(
    readonly netlist: Netlist,
    readonly technology: Technology,
  ) {
    this.compiled = compile(netlist, technology);
    this.simulator = new Simulator(this.compiled);
  }

  /** Solves a vector, carrying charge from the vector solved before it. */
  solve(vector: InputVector): SolveResult {
    this.last =
      this.last === null ? this.simulator.solveFresh(vector) : this.simulator.solveNext(vector, this.last);
    return this.last;
  }

  /** Applies steps in order from an unknown state; returns the result at the last one. */
  replay(steps: readonly InputVector[]): SolveResult | null {
    this.last = null;
    let result: SolveResult | null = null;
    for (const step of steps) result = this.solve(step);
    return result;
  }

  /**
   * The findings of the vector solved last, as a sweep row lists them; for cells too wide to sweep.
   * `expectations` must be usable ones (usableExpectations). Null before the first solve.
   */
  findingsOfLast(expectations: Readonly<Record<string, string>>): Finding[] | null {
    return this.last === null
      ? null
      : solvedVectorFindings(this.netlist, this.simulator, this.last, expectations);
  }

  /** Forgets stored charge: the next vector starts from an unknown state, as after power-up. */
  reset(): void {
    this.last = null;
  }
}
