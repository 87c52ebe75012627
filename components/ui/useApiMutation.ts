'use client';

import { useMutation } from '@tanstack/react-query';
import { useRouter } from 'next/navigation';
import { type ApiClientError, apiFetch } from './api-client';

/**
 * One write to our API: method, address and a JSON body, or a file sent as it is (an upload: the
 * server reads the bytes and the file's type).
 */
export type ApiRequest = { method: 'POST' | 'PATCH' | 'PUT' | 'DELETE'; url: string } & (
  { body?: unknown; file?: never } | { file: Blob; body?: never }
);

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
      const { method, url, body, file } = request(vars);
      return file
        ? apiFetch<Result>(url, {
            method,
            headers: { 'content-type': file.type || 'application/octet-stream' },
            body: file,
          })
        : apiFetch<Result>(url, { method, json: body });
    },
    onSuccess: (result, vars) => {
      onSuccess?.(result, vars);
      if (refresh) router.refresh();
    },
  });
}

/** Makes one of the user's organisations the one the pages show (the header's switcher, a new or joined one). */
export function useSwitchOrganisation(options?: { refresh?: boolean; onSuccess?: () => void }) {
  return useApiMutation(
    (organisationId: number) => ({
      method: 'PUT',
      url: '/api/current-organisation',
      body: { organisationId },
    }),
    options,
  );
}
