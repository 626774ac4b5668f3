import { useEffect, useRef, type ReactNode } from 'react';

/** A modal box over the page; Escape or the close button dismisses it. */
export function Dialog({
  title,
  onClose,
  children,
}: {
  title: string;
  onClose: () => void;
  children: ReactNode;
}) {
  const close = useRef<HTMLButtonElement>(null);
  useEffect(() => close.current?.focus(), []);
  return (
    <div className="rw-backdrop" onMouseDown={(e) => e.target === e.currentTarget && onClose()}>
      <div
        className="rw-dialog"
        role="dialog"
        aria-modal="true"
        aria-label={title}
        onKeyDown={(e) => {
          e.stopPropagation();
          if (e.key === 'Escape') onClose();
        }}
      >
        <header>
          <h2>{title}</h2>
          <button ref={close} type="button" onClick={onClose} aria-label="Close">
            ×
          </button>
        </header>
        {children}
      </div>
    </div>
  );
}
