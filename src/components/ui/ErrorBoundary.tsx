import { Component, type ErrorInfo, type ReactNode } from 'react';

interface ErrorBoundaryProps {
  /** What to show instead of the failed region; gets the error and a reset. */
  fallback: (error: unknown, reset: () => void) => ReactNode;
  children: ReactNode;
  /** Changing this clears a caught error (e.g. a new spool id). */
  resetKey?: unknown;
}

interface ErrorBoundaryState {
  error: unknown;
  key: unknown;
}

/** Keeps a failure in one region (the 3D editor, a panel) from blanking the page. */
export class ErrorBoundary extends Component<ErrorBoundaryProps, ErrorBoundaryState> {
  override state: ErrorBoundaryState = { error: null, key: this.props.resetKey };

  static getDerivedStateFromError(error: unknown): Partial<ErrorBoundaryState> {
    return { error: error ?? new Error('Unknown error') };
  }

  static getDerivedStateFromProps(props: ErrorBoundaryProps, state: ErrorBoundaryState): Partial<ErrorBoundaryState> | null {
    return props.resetKey !== state.key ? { error: null, key: props.resetKey } : null;
  }

  override componentDidCatch(error: unknown, info: ErrorInfo): void {
    console.error('Region failed', error, info.componentStack);
  }

  override render(): ReactNode {
    if (this.state.error) return this.props.fallback(this.state.error, () => this.setState({ error: null }));
    return this.props.children;
  }
}
