// Catches a render error inside one section of a page, so the rest of the page stays usable.
import { QueryErrorResetBoundary } from '@tanstack/react-query';
import { Component, type ErrorInfo, type ReactNode } from 'react';
import { Button } from '../ui/button';
import { ErrorPanel } from './error-panel';

type BoundaryProps = {
  children: ReactNode;
  fallback: (error: unknown, reset: () => void) => ReactNode;
  onReset?: () => void;
  /** The boundary clears itself when any of these change (e.g. another net is selected). */
  resetKeys?: readonly unknown[];
};

type BoundaryState = { error: unknown; failed: boolean; keys: readonly unknown[] };

class Boundary extends Component<BoundaryProps, BoundaryState> {
  override state: BoundaryState = { error: null, failed: false, keys: this.props.resetKeys ?? [] };

  static getDerivedStateFromError(error: unknown): Partial<BoundaryState> {
    return { error, failed: true };
  }

  static getDerivedStateFromProps(
    props: BoundaryProps,
    state: BoundaryState,
  ): Partial<BoundaryState> | null {
    const keys = props.resetKeys ?? [];
    const changed =
      keys.length !== state.keys.length || keys.some((key, i) => !Object.is(key, state.keys[i]));
    if (!changed) return null;
    return { keys, error: null, failed: false };
  }

  override componentDidCatch(error: unknown, info: ErrorInfo) {
    // Kept in the console for whoever files the bug; the panel shows the message.
    console.error(error, info.componentStack);
  }

  reset = () => {
    this.props.onReset?.();
    this.setState({ error: null, failed: false });
  };

  override render() {
    if (this.state.failed) return this.props.fallback(this.state.error, this.reset);
    return this.props.children;
  }
}

type SectionBoundaryProps = {
  children: ReactNode;
  title?: string;
  resetKeys?: readonly unknown[];
};

/** An error boundary for one section: shows the API's message and a retry that refetches. */
export function SectionErrorBoundary({ children, title, resetKeys }: SectionBoundaryProps) {
  return (
    <QueryErrorResetBoundary>
      {({ reset }) => (
        <Boundary
          onReset={reset}
          resetKeys={resetKeys}
          fallback={(error, retry) => (
            <div className="p-3">
              <ErrorPanel
                compact
                error={error}
                title={title}
                actions={
                  <Button size="sm" onClick={retry}>
                    Try again
                  </Button>
                }
              />
            </div>
          )}
        >
          {children}
        </Boundary>
      )}
    </QueryErrorResetBoundary>
  );
}
