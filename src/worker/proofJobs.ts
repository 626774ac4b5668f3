/**
 * The proof jobs (docs/semantics.md §10): every property of the cell for all vectors, and the cell
 * against a cell of a file. Plain functions over the core, like jobs.ts; what the core refuses (a
 * cell that does not compile, an unreadable file, pins that differ) comes back as words in `error`.
 */
import { cellsFromText } from '../core/netlist-io/cellFiles.ts';
import { compareCells } from '../core/proof/compare.ts';
import { proveCell } from '../core/proof/prove.ts';
import { usableExpectations } from '../core/expect/problems.ts';
import { throttled } from './jobs.ts';
import type {
  CompareJob,
  CompareResult,
  JobProgress,
  JobResult,
  ProofJob,
  ProofLaneJob,
  ProofResult,
} from './protocol.ts';

function words(error: unknown): string {
  return error instanceof Error ? error.message : String(error);
}

export function proof(
  job: ProofJob,
  onProgress: (done: number, total: number) => void,
): Pick<ProofResult, 'report' | 'error'> {
  const { expectations, notes } = usableExpectations(job.cell.netlist, job.cell.expectations);
  try {
    const report = proveCell(job.cell.netlist, {
      technology: job.cell.technology,
      expectations,
      onProgress: (done, total) => void onProgress(done, total),
    });
    return { report: { ...report, notes: [...notes, ...report.notes] }, error: null };
  } catch (error) {
    return { report: null, error: `proof: ${words(error)}` };
  }
}

type Compared = Pick<CompareResult, 'file' | 'other' | 'comparison' | 'choices' | 'error'>;

export function compare(job: CompareJob): Compared {
  const base = { file: job.file.name, other: job.other, comparison: null, choices: [], error: null };
  try {
    const loaded = cellsFromText(job.file.text, job.file.name).cells;
    const named = (c: (typeof loaded)[number]): string | null =>
      'job' in c ? c.job.cell : 'failure' in c ? c.failure.cell : c.skipped.cell;
    if (job.other === null && loaded.length > 1)
      return { ...base, choices: loaded.flatMap((c) => named(c) ?? []) };
    const picked = job.other === null ? loaded[0] : loaded.find((c) => named(c) === job.other);
    if (picked === undefined) return { ...base, error: `${job.file.name}: no cell ${job.other ?? ''}` };
    if ('failure' in picked) return { ...base, error: picked.failure.message };
    if ('skipped' in picked) return { ...base, error: picked.skipped.reason };
    const comparison = compareCells(job.cell, picked.job);
    return { ...base, other: picked.job.cell, comparison };
  } catch (error) {
    return { ...base, error: words(error) };
  }
}

/** Runs a proof or compare job. */
export function runProofJob(job: ProofLaneJob, onProgress: (p: JobProgress) => void = () => {}): JobResult {
  const started = performance.now();
  const elapsed = (): number => performance.now() - started;
  switch (job.kind) {
    case 'proof': {
      const outcome = proof(job, throttled(onProgress));
      return { kind: 'proof', revision: job.revision, ...outcome, elapsedMs: elapsed() };
    }
    case 'compare':
      return { kind: 'compare', revision: job.revision, ...compare(job), elapsedMs: elapsed() };
  }
}
