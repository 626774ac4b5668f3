// Indexes read here are in range by construction, so `!` marks them (no run-time cost).
/**
 * Every net's level at every step of a sequence, for the level strips: an observer of the sequence
 * check's own solve pass (core/analysis/pass.ts), so the strips and the report come from the same
 * solves. The strips want every net, not just the outputs the report lists.
 */
import type { SolveObserver } from '../analysis/pass.ts';
import { FLAG_DEGRADED, levelName } from '../solver/levels.ts';
import type { SolveResult } from '../solver/simulator.ts';
import type { StepLevel } from './levelStrip.ts';
import { nameRecord } from '../model/records.ts';

export class StepLevelRecorder implements SolveObserver {
  readonly steps: Record<string, StepLevel>[] = [];

  add(result: SolveResult): void {
    const levels = nameRecord<StepLevel>();
    result.compiled.netNames.forEach((name, n) => {
      levels[name] = {
        level: levelName(result.levels[n]!),
        degraded: (result.flags[n]! & FLAG_DEGRADED) !== 0,
      };
    });
    this.steps.push(levels);
  }
}
