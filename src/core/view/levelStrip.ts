/**
 * Strips of levels over sequence steps for chosen nets: consecutive steps with the same look merge
 * into one run, so a latch holding its state reads as one long bar and every change is an edge.
 */
import type { Level } from '../analysis/report.ts';
import { lookOf, type LookName } from './visualLanguage.ts';

export interface StepLevel {
  readonly level: Level;
  readonly degraded: boolean;
}

export interface StripRun {
  /** First step of the run (0-based). */
  readonly start: number;
  /** One past the last step. */
  readonly end: number;
  readonly level: Level;
  readonly look: LookName;
}

export interface LevelStrip {
  readonly net: string;
  readonly runs: readonly StripRun[];
}

/** Runs of one net; a step that lacks the net counts as X (nothing is known about it). */
export function stripRuns(levels: readonly (StepLevel | undefined)[]): StripRun[] {
  const runs: StripRun[] = [];
  levels.forEach((step, i) => {
    const state = step ?? { level: 'X', degraded: false };
    const look = lookOf(state).name;
    const last = runs[runs.length - 1];
    if (last !== undefined && last.look === look && last.end === i) {
      runs[runs.length - 1] = { ...last, end: i + 1 };
    } else {
      runs.push({ start: i, end: i + 1, level: state.level, look });
    }
  });
  return runs;
}

/** One strip per chosen net, over steps given as net → level maps. */
export function levelStrips(
  steps: readonly Readonly<Record<string, StepLevel>>[],
  nets: readonly string[],
): LevelStrip[] {
  return nets.map((net) => ({ net, runs: stripRuns(steps.map((s) => s[net])) }));
}

/** The level of a net at a step, read back from its runs (for hover and tests). */
export function levelAt(strip: LevelStrip, step: number): Level | undefined {
  return strip.runs.find((r) => r.start <= step && step < r.end)?.level;
}
