import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { Toaster } from 'sonner';

/** Query cache and toasts: what every page shares. */
export function AppProvider({ queryClient, children }: { queryClient: QueryClient; children: ReactNode }) {
  return (
    <QueryClientProvider client={queryClient}>
      {children}
      <Toaster
        position="top-center"
        closeButton
        toastOptions={{
          classNames: {
            toast: 'bg-surface-raised! text-ink! border-line! font-sans! text-body!',
            description: 'text-ink-muted!',
          },
        }}
      />
    </QueryClientProvider>
  );
}
