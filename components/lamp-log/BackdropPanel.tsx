'use client';

import { useState, type ChangeEvent } from 'react';
import { ApiClientError, apiFetch, sendJson } from '@/components/ui/api-client';
import { Notice } from '@/components/ui/Notice';
import { button, input } from '@/components/ui/styles';

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
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);

  async function choose(e: ChangeEvent<HTMLInputElement>) {
    const f = e.target.files?.[0];
    e.target.value = '';
    setError(null);
    if (!f) return;
    if (f.size > MAX_BYTES)
      return setError(
        'That photo is larger than 10 MB. Resize it (about 2000 px wide is plenty) and try again.',
      );
    setBusy(true);
    try {
      const data = await apiFetch<{ upload: BackdropView }>(
        `/api/uploads?kind=backdrop&enclosureId=${enclosureId}&name=${encodeURIComponent(f.name)}`,
        { method: 'POST', headers: { 'content-type': f.type || 'application/octet-stream' }, body: f },
      );
      setItems([data.upload, ...items]);
    } catch (err) {
      setError(err instanceof Error ? err.message : 'The upload failed.');
    } finally {
      setBusy(false);
    }
  }

  async function remove(id: number) {
    if (!window.confirm('Delete this photo? Designs that trace it will show “photo not available”.')) return;
    try {
      await sendJson('DELETE', `/api/uploads/${id}`);
      setItems(items.filter((i) => i.id !== id));
    } catch (err) {
      setError(err instanceof ApiClientError ? err.message : 'The photo could not be deleted.');
    }
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
                    <button type="button" className={button.quietDanger} onClick={() => remove(i.id)}>
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
