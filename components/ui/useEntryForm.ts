'use client';

import { useRouter } from 'next/navigation';
import { useEffect, useState, type FormEvent } from 'react';
import type { z } from 'zod';
import { useApiMutation } from './useApiMutation';

/** Messages by field path (`baskingSurfaceC.min`, `sources.uvbAt30`), as the API's schema names them. */
export type FieldErrors = Record<string, string>;

/**
 * The one way the entity forms (species sheets, lamp types) work: the form's draft is plain text as
 * typed (numbers stay strings until sent, so a half-typed "1." is not lost, and a unit switch recomputes
 * them); on submit `toPayload` turns it into the API's body, which is checked with the API's own zod
 * schema (so a mistake shows beside its field before anything is sent); then create (POST) or save
 * changes (PATCH) and open the saved entry; a field the server refuses is shown beside that field.
 * Leaving with unsaved changes asks first.
 */
export function useEntryForm<Draft, Saved extends { id: number }>({
  initial,
  toPayload,
  schema,
  createPath,
  createExtra,
  updatePath,
  savedHref,
  failure,
}: {
  initial: () => Draft;
  toPayload: (draft: Draft) => unknown;
  schema: z.ZodType;
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
  const [draft, setDraft] = useState<Draft>(initial);
  const [errors, setErrors] = useState<FieldErrors>({});
  const [general, setGeneral] = useState<string | null>(null);
  const [dirty, setDirty] = useState(false);

  useEffect(() => {
    if (!dirty) return;
    const warn = (e: BeforeUnloadEvent) => e.preventDefault();
    window.addEventListener('beforeunload', warn);
    return () => window.removeEventListener('beforeunload', warn);
  }, [dirty]);

  const write = useApiMutation<unknown, Saved>(
    (body) =>
      updatePath
        ? { method: 'PATCH', url: updatePath, body }
        : { method: 'POST', url: createPath, body: { ...createExtra, ...(body as object) } },
    {
      onSuccess: (saved) => {
        setDirty(false);
        router.push(savedHref(saved));
      },
    },
  );

  function save(payload: unknown): void {
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
    write.mutate(parsed.data, {
      onError: (err) => {
        if (err.field) setErrors({ [err.field]: err.message });
        setGeneral(err.message || failure);
      },
    });
  }

  return {
    draft,
    /** A change the user made. */
    update: (patch: Partial<Draft>) => {
      setDraft((d) => ({ ...d, ...patch }));
      setDirty(true);
    },
    /** The same draft shown another way (a unit switch): not a change of the user's. */
    reshow: (next: Draft) => setDraft(next),
    errors,
    general,
    // Stays on after a save succeeded, until the saved entry's page replaces the form.
    saving: write.isPending || write.isSuccess,
    submit: (e: FormEvent) => {
      e.preventDefault();
      save(toPayload(draft));
    },
    cancel: () => router.back(),
  };
}
