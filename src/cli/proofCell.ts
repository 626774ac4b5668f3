/**
 * `--prove`: a cell's proof as the JSON of docs/semantics.md §10, timed. Runs wherever the cell's
 * check runs (main thread or worker); unusable input throws as the check's does.
 */
import type { Finding } from '../core/analysis/report.ts';
import { proveCell } from '../core/proof/prove.ts';
import type { ProofProperty } from '../core/proof/properties.ts';
import type { CellJob } from './loadCells.ts';

export interface PropertyJson {
  readonly property: ProofProperty;
  readonly output: string | null;
  /** true: holds for every vector; false: `vector` violates it (`findings` from its replay); null: undecided (`reason`). */
  readonly holds: boolean | null;
  readonly vector?: Readonly<Record<string, 0 | 1>>;
  readonly findings?: readonly Finding[];
  readonly reason?: string;
}

export interface ProofJson {
  readonly properties: readonly PropertyJson[];
  readonly seconds: number;
  readonly notes: readonly string[];
}

export function cellProof(job: CellJob): ProofJson {
  const started = performance.now();
  const report = proveCell(job.netlist, { technology: job.technology, expectations: job.expectations });
  const seconds = Math.round(performance.now() - started) / 1000;
  return { properties: report.properties, seconds, notes: report.notes };
}

/** Every property holds for every vector. */
export function proved(proof: ProofJson): boolean {
  return proof.properties.every((p) => p.holds === true);
}
