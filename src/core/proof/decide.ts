import type { Finding } from '../analysis/report.ts';
import { evaluateExpression } from '../expect/evaluate.ts';
import { recordOf } from '../model/records.ts';
import { violates } from './properties.ts';
import type { Replay, Search } from './search.ts';
import type { PropertyCheck } from './violations.ts';

/** A property's answer (docs/semantics.md §10). */
export interface PropertyResult {
  readonly property: PropertyCheck['property'];
  readonly output: string | null;
  /** True: holds for all 2^n vectors; false: `vector` violates it; null: not decided (`reason`). */
  readonly holds: boolean | null;
  /** The counterexample, {pin: 0 | 1}. */
  readonly vector?: Readonly<Record<string, 0 | 1>>;
  /** The findings of the counterexample's replay in the engine. */
  readonly findings?: readonly Finding[];
  readonly reason?: string;
}

/** Decides one property of one cell: holds, a counterexample the engine confirms, or unknown. */
export function decide(search: Search, p: PropertyCheck): PropertyResult {
  const base = { property: p.property, output: p.output };
  const confirm = (replay: Replay): boolean => {
    const expected = p.expected === null ? undefined : evaluateExpression(p.expected, replay.vector);
    return violates(p, replay.rows[0]!, expected);
  };
  const outcome = search.find(p.violated, { groups: [p.groups], bridges: p.bridges }, confirm);
  switch (outcome.kind) {
    case 'holds':
      return { ...base, holds: true };
    case 'unknown':
      return { ...base, holds: null, reason: outcome.reason };
    case 'violated':
      return {
        ...base,
        holds: false,
        vector: bits(outcome.replay),
        findings: outcome.replay.findings[0] ?? [],
      };
  }
}

/** A replayed vector as {pin: 0 | 1}. */
export function bits(replay: Replay): Readonly<Record<string, 0 | 1>> {
  return recordOf(Object.entries(replay.vector).map(([name, v]) => [name, v === '1' ? 1 : 0] as const));
}
