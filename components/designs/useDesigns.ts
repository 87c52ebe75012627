'use client';

import {
  useInfiniteQuery,
  useMutation,
  useQueryClient,
  type InfiniteData,
  type QueryClient,
  type QueryKey,
} from '@tanstack/react-query';
import type { DesignSummary, VariantSummary } from '@/lib/variants/queries';
import { designsApi, variantsApi, type Page } from './api';
import { refetchAfterWrite } from '@/components/ui/refetch-after-write';

type Pages = InfiniteData<Page<DesignSummary>, string | null>;

export const designsKey = (enclosureId: number) => ['designs', enclosureId] as const;

export function useDesignsList(enclosureId: number, q: string) {
  return useInfiniteQuery({
    queryKey: [...designsKey(enclosureId), q],
    queryFn: ({ pageParam }) => designsApi.list(enclosureId, q, pageParam),
    initialPageParam: null as string | null,
    getNextPageParam: (last) => last.nextCursor,
  });
}

/** Temporary ids for rows shown before the server answered; negative so they never clash. */
let tempId = -1;
const nextTempId = () => tempId--;

/**
 * Optimistic edits: every cached list of this enclosure (any search) is edited at once; on failure the
 * snapshot is put back, and after either outcome the lists are fetched again from the server.
 */
export function optimistic<V>(
  qc: QueryClient,
  enclosureId: number,
  edit: (designs: DesignSummary[], v: V) => DesignSummary[],
) {
  return {
    onMutate: async (v: V) => {
      await qc.cancelQueries({ queryKey: designsKey(enclosureId) });
      const snapshot = qc.getQueriesData<Pages>({ queryKey: designsKey(enclosureId) });
      qc.setQueriesData<Pages>({ queryKey: designsKey(enclosureId) }, (data) =>
        data ? { ...data, pages: data.pages.map((p) => ({ ...p, items: edit(p.items, v) })) } : data,
      );
      return { snapshot };
    },
    onError: (_e: unknown, _v: V, ctx?: { snapshot: [QueryKey, Pages | undefined][] }) => {
      for (const [key, data] of ctx?.snapshot ?? []) qc.setQueryData(key, data);
    },
    onSettled: () => refetchAfterWrite(qc, designsKey(enclosureId)),
  };
}

const mapVariants = (d: DesignSummary, f: (vs: VariantSummary[]) => VariantSummary[]): DesignSummary => ({
  ...d,
  variants: f(d.variants),
});

export function useDesignMutations(enclosureId: number) {
  const qc = useQueryClient();
  const now = () => new Date().toISOString();

  const createDesign = useMutation({
    mutationFn: (v: { name: string }) => designsApi.create(enclosureId, v.name),
    ...optimistic<{ name: string }>(qc, enclosureId, (designs, v) => {
      const id = nextTempId();
      return [
        ...designs,
        {
          id,
          enclosureId,
          name: v.name,
          createdAt: now(),
          updatedAt: now(),
          variants: [{ id: nextTempId(), designId: id, name: 'Variant A', version: 1, updatedAt: now() }],
        },
      ];
    }),
  });

  const renameDesign = useMutation({
    mutationFn: (v: { id: number; name: string }) => designsApi.rename(v.id, v.name),
    ...optimistic<{ id: number; name: string }>(qc, enclosureId, (designs, v) =>
      designs.map((d) => (d.id === v.id ? { ...d, name: v.name } : d)),
    ),
  });

  const deleteDesign = useMutation({
    mutationFn: (v: { id: number }) => designsApi.remove(v.id),
    ...optimistic<{ id: number }>(qc, enclosureId, (designs, v) => designs.filter((d) => d.id !== v.id)),
  });

  const duplicateVariant = useMutation({
    mutationFn: (v: { designId: number; from: VariantSummary; name: string }) =>
      variantsApi.create(v.designId, { name: v.name, fromVariantId: v.from.id }),
    ...optimistic<{ designId: number; from: VariantSummary; name: string }>(qc, enclosureId, (designs, v) =>
      designs.map((d) =>
        d.id === v.designId
          ? mapVariants(d, (vs) => [
              ...vs,
              { id: nextTempId(), designId: d.id, name: v.name, version: 1, updatedAt: now() },
            ])
          : d,
      ),
    ),
  });

  const renameVariant = useMutation({
    mutationFn: (v: { id: number; name: string }) => variantsApi.rename(v.id, v.name),
    ...optimistic<{ id: number; name: string }>(qc, enclosureId, (designs, v) =>
      designs.map((d) => mapVariants(d, (vs) => vs.map((x) => (x.id === v.id ? { ...x, name: v.name } : x)))),
    ),
  });

  const deleteVariant = useMutation({
    mutationFn: (v: { id: number }) => variantsApi.remove(v.id),
    ...optimistic<{ id: number }>(qc, enclosureId, (designs, v) =>
      designs.map((d) => mapVariants(d, (vs) => vs.filter((x) => x.id !== v.id))),
    ),
  });

  return { createDesign, renameDesign, deleteDesign, duplicateVariant, renameVariant, deleteVariant };
}
