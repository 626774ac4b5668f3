/**
 * Every net's level at every step of a sequence, stored charge carried from step to step: what the
 * level strips draw. Solved apart from the check report because the strips want every net, not just
 * the outputs the report lists.
 */
import { compile } from '../compile/compile.ts';
import type { InputVector } from '../model/design.ts';
import type { Netlist } from '../model/netlist.ts';
import type { Technology } from '../model/technology.ts';
import { FLAG_DEGRADED, levelName } from '../solver/levels.ts';
import { Simulator, type SolveResult } from '../solver/simulator.ts';
import type { StepLevel } from './levelStrip.ts';

export function sequenceLevels(
  netlist: Netlist,
  technology: Technology,
  steps: readonly InputVector[],
): Record<string, StepLevel>[] {
  const compiled = compile(netlist, technology);
  const simulator = new Simulator(compiled);
  let previous: SolveResult | null = null;
  return steps.map((step) => {
    const result: SolveResult =
      previous === null ? simulator.solveFresh(step) : simulator.solveNext(step, previous);
    previous = result;
    const levels: Record<string, StepLevel> = {};
    compiled.netNames.forEach((name, n) => {
      levels[name] = {
        level: levelName(result.levels[n]),
        degraded: (result.flags[n] & FLAG_DEGRADED) !== 0,
      };
    });
    return levels;
  });
}
