'use client';

import { useMutation } from '@tanstack/react-query';
import { useRouter } from 'next/navigation';
import { type ApiClientError, sendJson } from './api-client';

/** One write to our API: method, address and JSON body. */
export type ApiRequest = { method: 'POST' | 'PATCH' | 'PUT' | 'DELETE'; url: string; body?: unknown };

/**
 * The one way a client component writes: a TanStack Query mutation that sends `request(vars)` through
 * the shared fetch wrapper (so a failure is an ApiClientError naming the field the server refused) and,
 * once it succeeded, re-renders the server parts of the page (`router.refresh()`) so they show the
 * change. `isPending`, `error` and `reset` are the mutation's own.
 */
export function useApiMutation<Vars = void, Result = unknown>(
  request: (vars: Vars) => ApiRequest,
  { refresh = true, onSuccess }: { refresh?: boolean; onSuccess?: (result: Result, vars: Vars) => void } = {},
) {
  const router = useRouter();
  return useMutation<Result, ApiClientError, Vars>({
    mutationFn: (vars) => {
      const { method, url, body } = request(vars);
      return sendJson<Result>(method, url, body);
    },
    onSuccess: (result, vars) => {
      onSuccess?.(result, vars);
      if (refresh) router.refresh();
    },
  });
}
