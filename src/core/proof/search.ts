import type { VectorChecker } from '../analysis/check.ts';
import type { Finding, VectorReport } from '../analysis/report.ts';
import type { InputVector } from '../model/design.ts';
import { recordOf } from '../model/records.ts';
import { FALSE, type Cnf } from './cnf.ts';
import type { CellEncoding } from './encodeCell.ts';

/**
 * Vectors outside the encoding that are replayed in the engine for one question before it is left
 * unknown. Replays are kept for later questions about the same cells, which try them first.
 */
export const MAX_REPLAYS = 64;

/** One cell of a search: its encoding and the engine that replays vectors on it. */
export interface Side {
  readonly cell: CellEncoding;
  readonly checker: VectorChecker;
}

/** A vector replayed in the engine on every side: each side's report and findings. */
export interface Replay {
  readonly vector: InputVector;
  readonly rows: readonly VectorReport[];
  readonly findings: readonly (readonly Finding[])[];
}

/** The groups a question depends on, per side, and whether it reads devices between two sources. */
export interface Scope {
  readonly groups: readonly (readonly number[])[];
  readonly bridges: boolean;
}

export type Outcome =
  | { readonly kind: 'holds' }
  | { readonly kind: 'violated'; readonly replay: Replay }
  | { readonly kind: 'unknown'; readonly reason: string };

/**
 * Looks for a vector where something goes wrong (docs/semantics.md §10): first where the encoding
 * describes the engine exactly, then among the vectors it does not describe, each replayed in the
 * engine. "violated" always comes with an engine replay that shows it; "holds" only when the solver
 * finds no vector at all.
 */
export class Search {
  private readonly replays = new Map<string, Replay>();
  private readonly blockers = new Map<string, string | null>();
  /** The first side's encoding, whose input literals every side shares. */
  private readonly first: CellEncoding;

  constructor(
    private readonly cnf: Cnf,
    private readonly sides: readonly Side[],
    private readonly inputs: readonly string[],
  ) {
    const [side] = sides;
    if (side === undefined) throw new RangeError('a search needs at least one cell');
    this.first = side.cell;
  }

  /** `violated` is the solver's literal; `confirm` reads the replay and says whether it really is. */
  find(violated: number, scope: Scope, confirm: (replay: Replay) => boolean): Outcome {
    const blocker = this.blocker(scope);
    if (blocker !== null) return { kind: 'unknown', reason: `out of scope for proofs: ${blocker}` };
    const outside = this.outside(scope);
    const inside = this.cnf.sat.solve([violated, -outside]);
    if (inside !== null) {
      const replay = this.replay(inside);
      if (confirm(replay)) return { kind: 'violated', replay };
      return {
        kind: 'unknown',
        reason: `the proof and the engine disagree at ${label(replay.vector)}: a fault in Railwise`,
      };
    }
    if (outside === FALSE) return { kind: 'holds' };
    return this.searchOutside(outside, scope, confirm);
  }

  /** The vectors the encoding does not describe: earlier replays first, then new ones. */
  private searchOutside(outside: number, scope: Scope, confirm: (replay: Replay) => boolean): Outcome {
    for (const replay of this.replays.values()) if (confirm(replay)) return { kind: 'violated', replay };
    const active = this.cnf.fresh();
    for (const replay of this.replays.values()) this.exclude(active, replay.vector);
    let first: string | null = null;
    for (let tries = 0; tries < MAX_REPLAYS; tries++) {
      const model = this.cnf.sat.solve([outside, active]);
      if (model === null) return { kind: 'holds' };
      const replay = this.replay(model);
      if (confirm(replay)) return { kind: 'violated', replay };
      first ??= `${label(replay.vector)}: ${this.whyOutside(model, scope)}`;
      this.exclude(active, replay.vector);
    }
    const reason = `the tables do not describe the engine at some vectors (${first}); the ${MAX_REPLAYS} replayed show no violation, the rest were not tried`;
    return { kind: 'unknown', reason };
  }

  private outside(scope: Scope): number {
    return this.cnf.or(this.sides.map((side, i) => side.cell.unknown(scope.groups[i] ?? [], scope.bridges)));
  }

  /**
   * Why the question is out of reach: a group the encoding cannot describe at all, or one that some
   * described vector leaves holding stored state (a latch): proofs do not cover stored state.
   */
  private blocker(scope: Scope): string | null {
    for (const [i, groups] of scope.groups.entries()) {
      for (const s of groups) {
        const key = `${i}:${s}`;
        if (!this.blockers.has(key)) this.blockers.set(key, this.groupBlocker(this.sides[i]!.cell, s));
        const found = this.blockers.get(key);
        if (found) return found;
      }
    }
    return null;
  }

  private groupBlocker(cell: CellEncoding, s: number): string | null {
    const group = cell.groups[s]!;
    if (group.blocker !== null || group.storedState === FALSE) return group.blocker;
    const cone = cell.cone([cell.tables.shapes[s]!.nets[0]!]);
    const model = this.cnf.sat.solve([group.storedState, -cell.unknown(cone)]);
    if (model === null) return null;
    const at = label(this.replay(model).vector);
    return `${group.storedNets.join(', ')} hold stored state at ${at} (a latch or memory holding its value); proofs cover cells without stored state, so check it with a sequence`;
  }

  /** Under `active`, the solver may not choose this vector again. */
  private exclude(active: number, vector: InputVector): void {
    const lits = this.inputs.map((name) => {
      const x = this.first.input(name) as number;
      return vector[name] === '1' ? -x : x;
    });
    this.cnf.sat.addClause([-active, ...lits]);
  }

  private replay(model: boolean[]): Replay {
    const cell = this.first;
    const vector: InputVector = recordOf(
      this.inputs.map((name) => [name, model[cell.input(name) as number] ? '1' : '0'] as const),
    );
    const key = this.inputs.map((name) => vector[name]).join('');
    let replay = this.replays.get(key);
    if (replay === undefined) {
      const index = sweepIndex(vector, this.inputs);
      const rows = this.sides.map((side) => side.checker.check(vector, index ?? 0));
      const findings = rows.map((row) =>
        index === null ? row.findings.map((f) => ({ ...f, vector: null })) : row.findings,
      );
      replay = { vector, rows, findings };
      this.replays.set(key, replay);
    }
    return replay;
  }

  /** Which group a model leaves undescribed, and why: controls off the rails, or a ratioed fight. */
  private whyOutside(model: boolean[], scope: Scope): string {
    const value = (lit: number): boolean => (lit > 0 ? model[lit] === true : model[-lit] !== true);
    for (const [i, groups] of scope.groups.entries()) {
      const cell = this.sides[i]!.cell;
      const names = cell.compiled.netNames;
      for (const s of groups) {
        if (!value(cell.groups[s]!.unknown)) continue;
        const shape = cell.tables.shapes[s]!;
        const off = Array.from(shape.controls).filter(
          (n) => !value(cell.rail(n).high) && !value(cell.rail(n).low),
        );
        if (off.length > 0) return `${off.map((n) => names[n]).join(', ')} at neither 0 V nor VDD`;
        return `sources of both levels meet at ${names[shape.nets[0]!]}, a ratioed group past the table bound`;
      }
    }
    return 'a device between two sources has its gate at neither 0 V nor VDD';
  }
}

/** The vector's index in the sweep's order (first input most significant), or null past 2^53. */
function sweepIndex(vector: InputVector, inputs: readonly string[]): number | null {
  if (inputs.length > 52) return null;
  return inputs.reduce((k, name) => k * 2 + (vector[name] === '1' ? 1 : 0), 0);
}

/** `A=1 B=0 …`, the first twelve inputs. */
export function label(vector: InputVector): string {
  const parts = Object.entries(vector).map(([name, v]) => `${name}=${v}`);
  return parts.length > 12 ? `${parts.slice(0, 12).join(' ')} …` : parts.join(' ') || '(no inputs)';
}
