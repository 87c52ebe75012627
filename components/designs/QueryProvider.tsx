'use client';

import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { useState, type ReactNode } from 'react';
import { ApiClientError } from '@/components/ui/api-client';

/**
 * Data fetching for the designs sections only (the rest of the app does not need it). One client per
 * mounted section tree, created once, so navigations inside it keep their cache.
 */
export function QueryProvider({ children }: { children: ReactNode }) {
  const [client] = useState(
    () =>
      new QueryClient({
        defaultOptions: {
          queries: {
            staleTime: 15_000,
            // A 4xx will not fix itself by asking again; network trouble might.
            retry: (count, error) =>
              count < 2 && !(error instanceof ApiClientError && error.status >= 400 && error.status < 500),
          },
        },
      }),
  );
  return <QueryClientProvider client={client}>{children}</QueryClientProvider>;
}
