'use client';

import { LocalTime } from '@/components/ui/LocalTime';
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import type { ShareView } from '@/lib/variants/queries';
import { sharesApi, type CreatedShare } from './api';
import { ConfirmButton } from './ConfirmButton';
import { btn, input } from './styles';
import { refetchAfterWrite } from '@/components/ui/refetch-after-write';

const EXPIRY_CHOICES = [
  { days: 0, label: 'Never expires' },
  { days: 1, label: 'Expires in 1 day' },
  { days: 7, label: 'Expires in 7 days' },
  { days: 30, label: 'Expires in 30 days' },
  { days: 90, label: 'Expires in 90 days' },
];

const STATE_TEXT: Record<ShareView['state'], string> = {
  active: 'Active',
  revoked: 'Revoked',
  expired: 'Expired',
};

/**
 * Read-only links to one variant: create (with an optional expiry), copy the address (shown once —
 * only a hash of it is kept), and revoke.
 */
export function ShareLinks({ variantId, variantName }: { variantId: number; variantName: string }) {
  const qc = useQueryClient();
  const key = ['shares', variantId];
  const list = useQuery({ queryKey: key, queryFn: () => sharesApi.list(variantId) });
  const [days, setDays] = useState(0);
  const [fresh, setFresh] = useState<CreatedShare | null>(null);
  const [copied, setCopied] = useState(false);

  const create = useMutation({
    mutationFn: () => sharesApi.create(variantId, days || undefined),
    onSuccess: ({ share }) => {
      setFresh(share);
      setCopied(false);
      return refetchAfterWrite(qc, key);
    },
  });
  const revoke = useMutation({
    mutationFn: (id: number) => sharesApi.revoke(id),
    // Shown as revoked at once; put back if the server refuses.
    onMutate: async (id) => {
      await qc.cancelQueries({ queryKey: key });
      const before = qc.getQueryData<{ items: ShareView[]; nextCursor: string | null }>(key);
      qc.setQueryData(key, (d: typeof before) =>
        d ? { ...d, items: d.items.map((s) => (s.id === id ? { ...s, state: 'revoked' as const } : s)) } : d,
      );
      if (fresh?.id === id) setFresh(null);
      return { before };
    },
    onError: (_e, _id, ctx) => qc.setQueryData(key, ctx?.before),
    onSettled: () => refetchAfterWrite(qc, key),
  });

  const copy = async (url: string) => {
    try {
      await navigator.clipboard.writeText(url);
      setCopied(true);
    } catch {
      setCopied(false);
    }
  };

  const items = list.data?.items ?? [];
  return (
    <div className="space-y-3" aria-label={`Share links of ${variantName}`}>
      <div className="flex flex-wrap items-center gap-2">
        <select
          className={input}
          value={days}
          onChange={(e) => setDays(Number(e.target.value))}
          aria-label="Link expiry"
        >
          {EXPIRY_CHOICES.map((c) => (
            <option key={c.days} value={c.days}>
              {c.label}
            </option>
          ))}
        </select>
        <button
          type="button"
          className={btn.secondary}
          disabled={create.isPending}
          onClick={() => create.mutate()}
        >
          {create.isPending ? 'Creating…' : 'Create share link'}
        </button>
      </div>
      {create.isError && (
        <p role="alert" className="text-body text-ember-700">
          {create.error.message}
        </p>
      )}
      {revoke.isError && (
        <p role="alert" className="text-body text-ember-700">
          {revoke.error.message} The link was not revoked.
        </p>
      )}
      {fresh && (
        <div className="rounded-md border border-moss-200 bg-moss-50 p-3 text-body">
          <p className="font-medium text-moss-900">
            Anyone with this link can view this variant (read-only, no sign-in):
          </p>
          <div className="mt-2 flex flex-wrap items-center gap-2">
            <input
              readOnly
              className={`${input} min-w-0 flex-1 font-mono text-caption`}
              value={fresh.url}
              aria-label="New share link"
              onFocus={(e) => e.target.select()}
            />
            <button type="button" className={btn.secondary} onClick={() => copy(fresh.url)}>
              {copied ? 'Copied' : 'Copy'}
            </button>
            <a className={btn.secondary} href={fresh.url} target="_blank" rel="noreferrer">
              Open
            </a>
          </div>
          <p className="mt-2 text-caption text-basalt-600">
            Copy it now: for safety only a fingerprint of the link is kept, so it cannot be shown again.
          </p>
        </div>
      )}
      {list.isPending ? (
        <p className="text-caption text-basalt-500">Loading links…</p>
      ) : list.isError ? (
        <p role="alert" className="text-body text-ember-700">
          The links could not be loaded: {list.error.message}
        </p>
      ) : items.length === 0 ? (
        <p className="text-caption text-basalt-500">Not shared yet.</p>
      ) : (
        <ul className="divide-y divide-basalt-100 text-body">
          {items.map((s) => (
            <li
              key={s.id}
              className="flex flex-wrap items-center gap-x-3 gap-y-1 py-1.5"
              data-testid="share-row"
            >
              <span
                className={`rounded px-1.5 py-0.5 text-caption font-medium ${
                  s.state === 'active' ? 'bg-moss-100 text-moss-800' : 'bg-basalt-100 text-basalt-600'
                }`}
              >
                {STATE_TEXT[s.state]}
              </span>
              <span className="text-caption text-basalt-600">
                created <LocalTime value={s.createdAt} />
                {s.expiresAt ? (
                  <>
                    {` · ${s.state === 'expired' ? 'expired' : 'expires'} `}
                    <LocalTime value={s.expiresAt} />
                  </>
                ) : (
                  ' · no expiry'
                )}
                {s.revokedAt && (
                  <>
                    {' · revoked '}
                    <LocalTime value={s.revokedAt} />
                  </>
                )}
              </span>
              {s.state === 'active' && (
                <ConfirmButton
                  className={`${btn.danger} ml-auto`}
                  question="Revoke this link? It stops working at once."
                  confirmLabel="Yes, revoke"
                  onConfirm={() => revoke.mutate(s.id)}
                >
                  Revoke
                </ConfirmButton>
              )}
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
