import { Component, type ReactNode } from 'react';
import { openingFailed } from './autosave.ts';

interface State {
  readonly error: Error | null;
}

/**
 * Keeps a rendering fault from blanking the page: the design is already autosaved, so the message
 * says so and offers a reload.
 */
export class ErrorBoundary extends Component<{ children: ReactNode }, State> {
  override state: State = { error: null };

  static getDerivedStateFromError(error: Error): State {
    return { error };
  }

  /** A design that breaks the page is never saved over the last one that worked. */
  override componentDidCatch(): void {
    openingFailed();
  }

  override render() {
    if (!this.state.error) return this.props.children;
    return (
      <div className="rw-crash" role="alert">
        <h1>Something in the page went wrong</h1>
        <p>Your last working design is autosaved in this browser. Reload to continue from it.</p>
        <pre>{this.state.error.message}</pre>
        <button type="button" onClick={() => location.reload()}>
          Reload
        </button>
      </div>
    );
  }
}
