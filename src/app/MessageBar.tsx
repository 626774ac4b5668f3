import { dismissMessage, useStore } from '../state/store.ts';

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
      {issues.map((i, k) => (
        <div key={k} className="rw-message rw-warning" data-testid="sheet-issue">
          Sheet: {i.message}
        </div>
      ))}
    </div>
  );
}
