import type { ReactNode } from 'react';

interface SectionProps {
  readonly title: string;
  readonly testId: string;
  readonly open?: boolean;
  /** A short figure shown beside the title even when the section is folded. */
  readonly badge?: ReactNode;
  /** Told when the section is unfolded or folded (a view that computes only once seen). */
  readonly onToggle?: (open: boolean) => void;
  readonly children: ReactNode;
}

/** A foldable part of the side panel (a native disclosure: keyboard and screen readers work as-is). */
export function Section({ title, testId, open = true, badge, onToggle, children }: SectionProps) {
  return (
    <details
      className="rw-section"
      open={open}
      data-testid={testId}
      onToggle={onToggle && ((e) => onToggle(e.currentTarget.open))}
    >
      <summary>
        <span className="rw-section-title">{title}</span>
        {badge !== undefined && (
          <span className="rw-section-badge" data-testid={`${testId}-badge`}>
            {badge}
          </span>
        )}
      </summary>
      <div className="rw-section-body">{children}</div>
    </details>
  );
}
