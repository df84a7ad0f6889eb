import { Component, type ErrorInfo, type ReactNode } from 'react';

interface State {
  error: Error | null;
}

/** Last line of defence around the whole app (providers included): a plain message and a retry that re-mounts. */
export class AppErrorBoundary extends Component<{ children: ReactNode }, State> {
  state: State = { error: null };

  static getDerivedStateFromError(error: Error): State {
    return { error };
  }

  componentDidCatch(error: Error, info: ErrorInfo) {
    console.error('Slotwise stopped with an error', error, info.componentStack);
  }

  render() {
    if (!this.state.error) return this.props.children;
    return (
      <main className="mx-auto flex max-w-xl flex-col gap-4 px-4 py-16" role="alert">
        <h1 className="text-2xl font-semibold tracking-tight">Slotwise stopped unexpectedly</h1>
        <p className="text-ink-soft">Nothing you saved is lost. Try again; if it keeps happening, reload the page.</p>
        <div className="flex gap-2">
          <button
            type="button"
            className="min-h-11 rounded-lg bg-accent px-4 text-sm font-medium text-accent-ink focus-ring"
            onClick={() => this.setState({ error: null })}
          >
            Try again
          </button>
          <button
            type="button"
            className="min-h-11 rounded-lg border border-paper-line bg-paper-raised px-4 text-sm font-medium focus-ring"
            onClick={() => window.location.reload()}
          >
            Reload the page
          </button>
        </div>
      </main>
    );
  }
}
