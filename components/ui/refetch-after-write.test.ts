import { QueryClient, QueryObserver } from '@tanstack/react-query';
import { describe, expect, it } from 'vitest';
import { refetchAfterWrite } from './refetch-after-write';

/**
 * A list whose first load reads the server's rows at once but answers 50 ms later, a write that lands
 * meanwhile, then the refresh after the write's answer: the list must show the written row.
 */
async function listAfterWriteDuringFirstLoad(refresh: (qc: QueryClient, key: string[]) => Promise<void>) {
  const rows = ['first'];
  const qc = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  const key = ['shares', '1'];
  const observer = new QueryObserver(qc, {
    queryKey: key,
    queryFn: ({ signal }) => {
      const read = [...rows];
      return new Promise<string[]>((resolve, reject) => {
        const t = setTimeout(() => resolve(read), 50);
        signal.addEventListener('abort', () => {
          clearTimeout(t);
          reject(new Error('aborted'));
        });
      });
    },
  });
  const stop = observer.subscribe(() => {});
  await new Promise((r) => setTimeout(r, 5));
  expect(observer.getCurrentResult().fetchStatus).toBe('fetching');
  rows.push('created');
  await refresh(qc, key);
  const data = qc.getQueryData<string[]>(key);
  stop();
  qc.clear();
  return data;
}

describe('refetchAfterWrite', () => {
  it('a row written while the first load is on its way is in the list afterwards', async () => {
    expect(await listAfterWriteDuringFirstLoad(refetchAfterWrite)).toEqual(['first', 'created']);
  });

  it('(why it exists) invalidating alone keeps the first load, read before the write', async () => {
    const invalidateOnly = (qc: QueryClient, key: string[]) => qc.invalidateQueries({ queryKey: key });
    expect(await listAfterWriteDuringFirstLoad(invalidateOnly)).toEqual(['first']);
  });

  it('a list that already holds data is fetched again too', async () => {
    const qc = new QueryClient({ defaultOptions: { queries: { retry: false } } });
    let n = 0;
    const observer = new QueryObserver(qc, { queryKey: ['k'], queryFn: async () => ++n });
    const stop = observer.subscribe(() => {});
    await new Promise((r) => setTimeout(r, 5));
    expect(qc.getQueryData(['k'])).toBe(1);
    await refetchAfterWrite(qc, ['k']);
    expect(qc.getQueryData(['k'])).toBe(2);
    stop();
  });
});
