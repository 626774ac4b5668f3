import { dismissMessage, useStore } from '../state/store.ts';

/** Drawing problems shown at once; more would hide the sheet. */
const MAX_ISSUES = 3;

/** The latest message: errors stay until dismissed, and say what was left unchanged. */
export function MessageBar() {
  const message = useStore((s) => s.message);
  const issues = useStore((s) => s.issues);
  return (
    <div className="rw-messages" aria-live="polite">
      {message ? (
        <div
          className={`rw-message rw-${message.kind}`}
          role={message.kind === 'error' ? 'alert' : 'status'}
          data-testid="message"
        >
          <span>{message.text}</span>
          <button type="button" onClick={dismissMessage} aria-label="Dismiss message">
            ×
          </button>
        </div>
      ) : null}
      {issues.slice(0, MAX_ISSUES).map((i, k) => (
        <div key={k} className="rw-message rw-warning" data-testid="sheet-issue">
          Sheet: {i.message}
        </div>
      ))}
      {issues.length > MAX_ISSUES ? (
        <div className="rw-message rw-warning">…and {issues.length - MAX_ISSUES} more drawing problems.</div>
      ) : null}
    </div>
  );
}
