'use client';

import { useState, type ChangeEvent } from 'react';
import { Notice } from '@/components/ui/Notice';
import { button, input } from '@/components/ui/styles';
import { useApiMutation } from '@/components/ui/useApiMutation';

export type BackdropView = {
  id: number;
  url: string;
  originalName: string | null;
  sizeBytes: number;
  createdAt: string;
};

const MAX_BYTES = 10 * 1024 * 1024;

/**
 * A photo of the real enclosure, taken from the front, for the studio to trace over. JPEG, PNG or WebP
 * up to 10 MB; camera data (time, place) is removed before it is stored, and only people who may see
 * this enclosure can open it.
 */
export function BackdropPanel({
  enclosureId,
  initial,
  canEdit,
}: {
  enclosureId: number;
  initial: BackdropView[];
  canEdit: boolean;
}) {
  const [items, setItems] = useState(initial);
  const [tooLarge, setTooLarge] = useState(false);
  // The list is this panel's own (the page around it does not change), so neither write refreshes it.
  const upload = useApiMutation<File, { upload: BackdropView }>(
    (f) => ({
      method: 'POST',
      url: `/api/uploads?kind=backdrop&enclosureId=${enclosureId}&name=${encodeURIComponent(f.name)}`,
      file: f,
    }),
    { refresh: false, onSuccess: (data) => setItems((now) => [data.upload, ...now]) },
  );
  const remove = useApiMutation((id: number) => ({ method: 'DELETE', url: `/api/uploads/${id}` }), {
    refresh: false,
    onSuccess: (_, id) => setItems((now) => now.filter((i) => i.id !== id)),
  });
  const busy = upload.isPending;
  const error = tooLarge
    ? 'That photo is larger than 10 MB. Resize it (about 2000 px wide is plenty) and try again.'
    : (upload.error ?? remove.error)?.message;

  function choose(e: ChangeEvent<HTMLInputElement>) {
    const f = e.target.files?.[0];
    e.target.value = '';
    upload.reset();
    remove.reset();
    setTooLarge(!!f && f.size > MAX_BYTES);
    if (f && f.size <= MAX_BYTES) upload.mutate(f);
  }

  function confirmRemove(id: number) {
    if (!window.confirm('Delete this photo? Designs that trace it will show “photo not available”.')) return;
    upload.reset();
    setTooLarge(false);
    remove.mutate(id);
  }

  return (
    <div className="space-y-3">
      {canEdit && (
        <label className="block text-body font-medium text-basalt-800">
          Photo of the enclosure from the front (JPEG, PNG or WebP, up to 10 MB)
          <input
            type="file"
            accept="image/jpeg,image/png,image/webp"
            onChange={choose}
            disabled={busy}
            className={`${input} mt-1`}
          />
        </label>
      )}
      {busy && <p className="text-caption text-basalt-500">Uploading…</p>}
      {error && <Notice tone="error">{error}</Notice>}
      {items.length === 0 ? (
        <p className="text-body text-basalt-500">
          No photo yet. Once one is here, choose it in a design’s studio (Fields tab, Photo backdrop) to trace
          the real enclosure.
        </p>
      ) : (
        <>
          <p className="text-caption text-basalt-600">
            To trace one, open a design of this enclosure in the studio and choose it under Fields → Photo
            backdrop.
          </p>
          <ul className="grid gap-3 sm:grid-cols-3">
            {items.map((i) => (
              <li key={i.id} className="rounded-md border border-basalt-200 bg-white p-2">
                {/* eslint-disable-next-line @next/next/no-img-element -- served by our own authorised route, not optimisable */}
                <img
                  src={i.url}
                  alt={`Enclosure photo ${i.originalName ?? ''}`}
                  className="h-32 w-full rounded object-cover"
                />
                <div className="mt-1 flex items-center justify-between text-caption text-basalt-600">
                  <span className="truncate" title={i.originalName ?? undefined}>
                    {i.originalName} · {Math.round(i.sizeBytes / 1024)} KB
                  </span>
                  {canEdit && (
                    <button type="button" className={button.quietDanger} onClick={() => confirmRemove(i.id)}>
                      Delete
                    </button>
                  )}
                </div>
              </li>
            ))}
          </ul>
        </>
      )}
    </div>
  );
}
