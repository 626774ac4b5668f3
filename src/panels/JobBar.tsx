import type { JobProgress } from '../worker/protocol.ts';

interface JobBarProps {
  readonly label: string;
  readonly progress: JobProgress;
  readonly onCancel: () => void;
}

/** Shown only for long jobs: how far the worker is, and a way out. */
export function JobBar({ label, progress, onCancel }: JobBarProps) {
  const fraction = progress.total === 0 ? 0 : progress.done / progress.total;
  return (
    <div className="rw-job" data-testid="job-bar" role="status">
      <span>{label}</span>
      <progress value={progress.done} max={Math.max(progress.total, 1)} aria-label={`${label} progress`} />
      <span className="rw-muted">{Math.round(fraction * 100)} %</span>
      <button type="button" onClick={onCancel} data-testid="job-cancel">
        Cancel
      </button>
    </div>
  );
}
