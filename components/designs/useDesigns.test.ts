import { QueryClient, type InfiniteData } from '@tanstack/react-query';
import { describe, expect, it } from 'vitest';
import type { DesignSummary } from '@/lib/variants/queries';
import type { Page } from './api';
import { designsKey, optimistic } from './useDesigns';

const design = (id: number, name: string): DesignSummary => ({
  id,
  enclosureId: 7,
  name,
  createdAt: '2026-01-01T00:00:00.000Z',
  updatedAt: '2026-01-01T00:00:00.000Z',
  variants: [],
});

function seeded() {
  const qc = new QueryClient({ defaultOptions: { queries: { retry: false }, mutations: { retry: false } } });
  const data: InfiniteData<Page<DesignSummary>, string | null> = {
    pages: [{ items: [design(1, 'Alpha'), design(2, 'Beta')], nextCursor: null }],
    pageParams: [null],
  };
  // Two cached lists of the same enclosure (no search, and a search): both are edited.
  qc.setQueryData([...designsKey(7), ''], data);
  qc.setQueryData([...designsKey(7), 'a'], data);
  return qc;
}

const names = (qc: QueryClient, q: string) =>
  qc
    .getQueryData<InfiniteData<Page<DesignSummary>>>([...designsKey(7), q])!
    .pages.flatMap((p) => p.items.map((d) => d.name));

const rename = (designs: DesignSummary[], v: { id: number; name: string }) =>
  designs.map((d) => (d.id === v.id ? { ...d, name: v.name } : d));

async function run(qc: QueryClient, mutationFn: () => Promise<unknown>) {
  const mutation = qc.getMutationCache().build(qc, {
    mutationFn,
    ...optimistic<{ id: number; name: string }>(qc, 7, rename),
  });
  const seen: string[][] = [];
  const done = mutation.execute({ id: 2, name: 'Gamma' }).catch(() => 'failed');
  // The edit shows before the server answers.
  await new Promise((r) => setTimeout(r, 0));
  seen.push(names(qc, ''), names(qc, 'a'));
  return { seen, result: await done };
}

describe('optimistic list edits', () => {
  it('show at once in every cached list of the enclosure', async () => {
    const qc = seeded();
    let answer!: () => void;
    const pending = new Promise<void>((r) => (answer = r));
    const running = run(qc, () => pending);
    await new Promise((r) => setTimeout(r, 5));
    expect(names(qc, '')).toEqual(['Alpha', 'Gamma']);
    expect(names(qc, 'a')).toEqual(['Alpha', 'Gamma']);
    answer();
    await running;
  });

  it('are rolled back when the server refuses', async () => {
    const qc = seeded();
    const refuse = () => new Promise((_, reject) => setTimeout(() => reject(new Error('409')), 20));
    const { seen, result } = await run(qc, refuse);
    expect(result).toBe('failed');
    expect(seen).toEqual([
      ['Alpha', 'Gamma'],
      ['Alpha', 'Gamma'],
    ]);
    expect(names(qc, '')).toEqual(['Alpha', 'Beta']);
    expect(names(qc, 'a')).toEqual(['Alpha', 'Beta']);
  });
});
