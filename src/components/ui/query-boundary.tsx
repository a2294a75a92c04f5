import { QueryErrorResetBoundary } from '@tanstack/react-query';
import { Suspense, type ReactNode } from 'react';
import { ErrorBoundary, type ErrorFallbackProps } from './error-boundary.tsx';

type QueryBoundaryProps = {
  children: ReactNode;
  /** A skeleton in the shape of the content. */
  loading: ReactNode;
  fallback?: (props: ErrorFallbackProps) => ReactNode;
};

/** Suspense for loading plus an error boundary whose retry refetches the failed queries. */
export function QueryBoundary({ children, loading, fallback }: QueryBoundaryProps) {
  return (
    <QueryErrorResetBoundary>
      {({ reset }) => (
        <ErrorBoundary onReset={reset} fallback={fallback}>
          <Suspense fallback={loading}>{children}</Suspense>
        </ErrorBoundary>
      )}
    </QueryErrorResetBoundary>
  );
}
