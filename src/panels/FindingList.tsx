import type { Finding } from '../core/analysis/report.ts';
import { chainText } from '../core/view/highlight.ts';
import { formatCurrent, formatPower } from '../core/view/format.ts';

interface FindingListProps {
  readonly findings: readonly Finding[];
  readonly onPick: (finding: Finding) => void;
  readonly empty: string;
  readonly testId: string;
}

/** Errors carry a filled diamond, warnings a hollow triangle: the severity reads without colour. */
const SEVERITY_GLYPH = { error: '◆', warning: '△' } as const;

/** Path and figures, unless the message already spells out the path. */
function detail(finding: Finding): string | null {
  if (finding.path !== null && finding.message.includes(chainText(finding.path))) return null;
  const parts: string[] = [];
  if (finding.path !== null) parts.push(chainText(finding.path));
  if (finding.current !== undefined) parts.push(formatCurrent(finding.current));
  if (finding.watts !== undefined) parts.push(formatPower(finding.watts));
  return parts.length === 0 ? null : parts.join(' · ');
}

/** Findings as buttons: picking one highlights its nets and devices on the sheet. */
export function FindingList({ findings, onPick, empty, testId }: FindingListProps) {
  if (findings.length === 0) {
    return (
      <p className="rw-clean" data-testid={testId}>
        ✓ {empty}
      </p>
    );
  }
  return (
    <ul className="rw-findings" data-testid={testId}>
      {findings.map((f, i) => {
        const more = detail(f);
        return (
          <li key={`${f.kind}-${i}`}>
            <button type="button" className={`rw-finding rw-sev-${f.severity}`} onClick={() => onPick(f)}>
              <span className="rw-severity" aria-label={f.severity}>
                {SEVERITY_GLYPH[f.severity]}
              </span>
              <span className="rw-finding-kind">{f.rule ?? f.kind}</span>
              <span className="rw-finding-text">{f.message}</span>
              {more !== null && <span className="rw-detail">{more}</span>}
            </button>
          </li>
        );
      })}
    </ul>
  );
}
