import { countOf } from '../core/view/plural.ts';
import { dismissMessage, useStore } from '../state/store.ts';
import { DesignNotes } from './DesignNotes.tsx';

/** Drawing problems shown at once; more would crowd the line under the sheet. */
const MAX_ISSUES = 3;

/**
 * The line under the sheet (never over it): the latest message, the notes kept with the design
 * (what an import changed) and the drawing's problems.
 * Errors stay until dismissed and say what was left unchanged; warnings and information clear when
 * the document next changes (the store does that); drawing problems show while they exist.
 */
export function MessageBar() {
  const message = useStore((s) => s.message);
  const issues = useStore((s) => s.issues);
  return (
    <div className="rw-messages" aria-live="polite" data-testid="messages">
      {message ? (
        <div
          className={`rw-message rw-${message.kind}`}
          role={message.kind === 'info' ? 'status' : 'alert'}
          data-testid="message"
          data-kind={message.kind}
        >
          <span>{message.text}</span>
          <button type="button" onClick={dismissMessage} aria-label="Dismiss message">
            ×
          </button>
        </div>
      ) : null}
      <DesignNotes />
      {issues.slice(0, MAX_ISSUES).map((i, k) => (
        <div key={k} className="rw-message rw-warning" data-testid="sheet-issue">
          Sheet: {i.message}
        </div>
      ))}
      {issues.length > MAX_ISSUES ? (
        <div className="rw-message rw-warning">
          …and {countOf(issues.length - MAX_ISSUES, 'more drawing problem')}.
        </div>
      ) : null}
    </div>
  );
}
