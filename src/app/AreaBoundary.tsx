import { Component, Suspense, type ReactNode } from 'react';

/** Shows a failure in one area plainly (the rest of the workbench keeps working). */
class AreaErrorBoundary extends Component<{ children: ReactNode }, { error: Error | null }> {
  override state = { error: null as Error | null };
  static getDerivedStateFromError(error: Error) {
    return { error };
  }
  override render() {
    if (this.state.error) {
      return (
        <section className="panel" role="alert">
          <h2>This area failed to open</h2>
          <p>{this.state.error.message}</p>
          <p className="muted">Your data is not affected. Reload the page to try again.</p>
        </section>
      );
    }
    return this.props.children;
  }
}

/** Loading state and error boundary around an area loaded on demand. */
export function AreaBoundary({ children }: { children: ReactNode }) {
  return (
    <AreaErrorBoundary>
      <Suspense
        fallback={
          <p className="loading" role="status">
            Opening this area…
          </p>
        }
      >
        {children}
      </Suspense>
    </AreaErrorBoundary>
  );
}
