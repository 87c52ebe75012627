'use client';

import { useRouter } from 'next/navigation';
import { useEffect, useState } from 'react';
import type { z } from 'zod';
import { ApiClientError, sendJson } from './api-client';

/** Messages by field path (`baskingSurfaceC.min`, `sources.uvbAt30`), as the API's schema names them. */
export type FieldErrors = Record<string, string>;

/**
 * What the species-sheet and lamp-type forms share: check the payload with the API's own schema (so a
 * mistake shows beside its field before anything is sent), create (POST) or save changes (PATCH), then
 * open the saved entry; a field the server refuses is shown beside that field. Leaving with unsaved
 * changes asks first.
 */
export function useEntryForm<T, Saved extends { id: number }>({
  schema,
  createPath,
  createExtra,
  updatePath,
  savedHref,
  failure,
}: {
  schema: z.ZodType<T>;
  /** POST target and the fields it needs beyond the form (the organisation). */
  createPath: string;
  createExtra: Record<string, unknown>;
  /** PATCH target when editing an existing entry; null when creating. */
  updatePath: string | null;
  savedHref: (saved: Saved) => string;
  /** Shown when saving fails without a message of its own. */
  failure: string;
}) {
  const router = useRouter();
  const [errors, setErrors] = useState<FieldErrors>({});
  const [general, setGeneral] = useState<string | null>(null);
  const [saving, setSaving] = useState(false);
  const [dirty, setDirty] = useState(false);

  useEffect(() => {
    if (!dirty) return;
    const warn = (e: BeforeUnloadEvent) => e.preventDefault();
    window.addEventListener('beforeunload', warn);
    return () => window.removeEventListener('beforeunload', warn);
  }, [dirty]);

  async function save(payload: unknown): Promise<void> {
    const parsed = schema.safeParse(payload);
    if (!parsed.success) {
      const next: FieldErrors = {};
      for (const i of parsed.error.issues) next[i.path.join('.')] ??= i.message;
      setErrors(next);
      setGeneral('Some fields need attention: see the messages beside them.');
      return;
    }
    setErrors({});
    setGeneral(null);
    setSaving(true);
    try {
      const saved = updatePath
        ? await sendJson<Saved>('PATCH', updatePath, parsed.data)
        : await sendJson<Saved>('POST', createPath, { ...createExtra, ...(parsed.data as object) });
      setDirty(false);
      router.push(savedHref(saved));
      router.refresh();
    } catch (err) {
      if (err instanceof ApiClientError && err.field) setErrors({ [err.field]: err.message });
      setGeneral(err instanceof Error ? err.message : failure);
      setSaving(false);
    }
  }

  return {
    errors,
    general,
    saving,
    markDirty: () => setDirty(true),
    save,
    cancel: () => router.back(),
  };
}
