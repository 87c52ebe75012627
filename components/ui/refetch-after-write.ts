import type { QueryClient, QueryKey } from '@tanstack/react-query';

/**
 * Asks the server again for what a write has just changed. `invalidateQueries` alone joins a first load
 * that is still on its way (TanStack Query cancels a running fetch only when the query already holds
 * data), and that load may have been read before the write was committed: a share link created just
 * after the page opened on a busy server was then missing from its list until some later refetch.
 * Cancelling first makes the next fetch start after the write's answer.
 */
export async function refetchAfterWrite(qc: QueryClient, queryKey: QueryKey): Promise<void> {
  await qc.cancelQueries({ queryKey });
  await qc.invalidateQueries({ queryKey });
}
