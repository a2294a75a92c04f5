import { Component, type ErrorInfo, type ReactNode } from 'react';
import { RotateCcw } from 'lucide-react';
import { Button } from './button.tsx';
import { isMfaRequired, MfaRequiredNotice } from './mfa-required-notice.tsx';
import { Notice } from './notice.tsx';

export type ErrorFallbackProps = { error: unknown; reset: () => void };

type ErrorBoundaryProps = {
  children: ReactNode;
  /** Called before the children are tried again (e.g. a query's reset). */
  onReset?: () => void;
  fallback?: (props: ErrorFallbackProps) => ReactNode;
};

type ErrorBoundaryState = { error: unknown; hasError: boolean };

export function errorMessage(error: unknown): string {
  if (error instanceof Error && error.message) return error.message;
  return 'Something went wrong.';
}

/** The default fallback: says what failed and offers to try again. */
export function ErrorPanel({ error, reset, title = 'This part of the page did not load' }: ErrorFallbackProps & { title?: string }) {
  // Trying again cannot help here; setting up two-step sign-in can.
  if (isMfaRequired(error)) return <MfaRequiredNotice />;
  return (
    <Notice tone="danger" title={title} role="alert">
      <p>{errorMessage(error)}</p>
      <Button className="mt-3" onClick={reset} icon={<RotateCcw aria-hidden className="size-4" />}>
        Try again
      </Button>
    </Notice>
  );
}

/** Catches a render error below it and shows a retry instead of a blank page. */
export class ErrorBoundary extends Component<ErrorBoundaryProps, ErrorBoundaryState> {
  state: ErrorBoundaryState = { error: null, hasError: false };

  static getDerivedStateFromError(error: unknown): ErrorBoundaryState {
    return { error, hasError: true };
  }

  componentDidCatch(_error: unknown, _info: ErrorInfo) {
    // React already reports the error; nothing more to do here.
  }

  reset = () => {
    this.props.onReset?.();
    this.setState({ error: null, hasError: false });
  };

  render() {
    if (this.state.hasError) {
      const props = { error: this.state.error, reset: this.reset };
      return this.props.fallback ? this.props.fallback(props) : <ErrorPanel {...props} />;
    }
    return this.props.children;
  }
}
