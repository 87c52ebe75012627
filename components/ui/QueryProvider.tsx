'use client';

import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { useState, type ReactNode } from 'react';
import { ApiClientError } from './api-client';

/**
 * TanStack Query for a tree: one client, created once, so navigations inside it keep their cache. The
 * signed-in and the sign-in layouts have one for the writes every page makes (`useApiMutation`); the
 * lists and designs sections that cache reads mount their own around themselves, so a list never
 * outlives its page.
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
