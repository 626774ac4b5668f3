import { classify, LEVEL_0, LEVEL_1 } from '../solver/levels.ts';
import type { SolveResult } from '../solver/simulator.ts';

export const ACTIVITY_CONVENTION =
  'α is the probability of a 0→1 transition on a net per clock cycle and P = α·C·VDD²·f ' +
  '(C·VDD·swing in place of C·VDD² where a level arrives degraded); with random activity every input ' +
  'is independent and equiprobable, a new vector each cycle, so α = p0·p1; with a sequence, α counts ' +
  '0→1 transitions between consecutive steps over the number of step changes.';

/** Per net: 0→1 probability per cycle, and the mean high level minus the mean low level, volts. */
export interface ActivityFigures {
  readonly activity: Float64Array;
  readonly swing: Float64Array;
}

/** 0, 1 or -1 (neither: X, or a floating net with no known charge) per net of one result. */
function levelsOf(result: SolveResult): Int8Array {
  const { vil, vih } = result.compiled.tech;
  return Int8Array.from(result.volts, (v) => {
    const level = classify(v, vil, vih);
    return level === LEVEL_0 ? 0 : level === LEVEL_1 ? 1 : -1;
  });
}

function swings(results: readonly SolveResult[], levels: readonly Int8Array[], nets: number): Float64Array {
  const sum = [new Float64Array(nets), new Float64Array(nets)];
  const count = [new Float64Array(nets), new Float64Array(nets)];
  results.forEach((r, k) => {
    for (let n = 0; n < nets; n++) {
      const level = levels[k][n];
      if (level < 0) continue;
      sum[level][n] += r.volts[n];
      count[level][n] += 1;
    }
  });
  return Float64Array.from({ length: nets }, (_, n) =>
    count[0][n] > 0 && count[1][n] > 0 ? sum[1][n] / count[1][n] - sum[0][n] / count[0][n] : 0,
  );
}

/**
 * Activity with independent, equiprobable inputs over a full sweep: each cycle draws a fresh vector,
 * so P(0→1) = P(0)·P(1). Vectors where a net is X or floating with no known charge count as neither.
 */
export function randomActivity(sweep: readonly SolveResult[]): ActivityFigures {
  const nets = sweep[0]?.compiled.netCount ?? 0;
  const levels = sweep.map(levelsOf);
  const ones = new Float64Array(nets);
  const zeros = new Float64Array(nets);
  for (const l of levels) {
    for (let n = 0; n < nets; n++) {
      if (l[n] === 1) ones[n]++;
      else if (l[n] === 0) zeros[n]++;
    }
  }
  const total = sweep.length;
  const activity = Float64Array.from({ length: nets }, (_, n) => (zeros[n] / total) * (ones[n] / total));
  return { activity, swing: swings(sweep, levels, nets) };
}

/** Activity counted over a sequence: 0→1 transitions between consecutive steps per step change. */
export function sequenceActivity(steps: readonly SolveResult[]): ActivityFigures {
  const nets = steps[0]?.compiled.netCount ?? 0;
  const levels = steps.map(levelsOf);
  const rises = new Float64Array(nets);
  for (let k = 1; k < levels.length; k++) {
    for (let n = 0; n < nets; n++) if (levels[k - 1][n] === 0 && levels[k][n] === 1) rises[n]++;
  }
  const changes = Math.max(1, steps.length - 1);
  return { activity: rises.map((r) => r / changes), swing: swings(steps, levels, nets) };
}
