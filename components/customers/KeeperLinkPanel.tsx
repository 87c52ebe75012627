'use client';

import { useState } from 'react';
import { Notice } from '@/components/ui/Notice';
import { Select } from '@/components/ui/Select';
import { button, card } from '@/components/ui/styles';
import { useApiMutation } from '@/components/ui/useApiMutation';

export type KeeperOption = { id: number; name: string; email: string; linkedElsewhere: boolean };

/**
 * Links the customer to the keeper account they became (a keeper of this shop), or drops the link. The
 * link copies nothing; unlinking keeps every lamp and reading.
 */
export function KeeperLinkPanel({
  customerId,
  linked,
  keepers,
}: {
  customerId: number;
  linked: { id: number; name: string; email: string; isKeeper: boolean } | null;
  keepers: KeeperOption[];
}) {
  const [choice, setChoice] = useState('');
  const [refused, setRefused] = useState<string | null>(null);
  const url = `/api/customers/${customerId}/keeper`;
  const linkTo = useApiMutation((keeperId: number) => ({ method: 'PUT', url, body: { keeperId } }), {
    onSuccess: () => setChoice(''),
  });
  const unlink = useApiMutation(() => ({ method: 'DELETE', url }));
  const error = refused ?? linkTo.error?.message ?? unlink.error?.message ?? null;
  const free = keepers.filter((k) => !k.linkedElsewhere);

  return (
    <section className={`${card} mb-6 space-y-3 p-4`} aria-labelledby="keeper-link">
      <h2 id="keeper-link" className="text-lead font-semibold text-basalt-900">
        Keeper account
      </h2>
      {linked ? (
        <>
          <p className="text-body">
            Linked to <strong>{linked.name}</strong> ({linked.email}).{' '}
            {linked.isKeeper
              ? 'Their enclosure lamps are listed below as they are in the lamp log, and a counter test of one adds its reading there.'
              : 'They are no longer a keeper of this organisation, so their lamps are not listed.'}
          </p>
          <button
            type="button"
            className={`${button.secondary} min-h-11`}
            disabled={unlink.isPending}
            onClick={() => unlink.mutate()}
          >
            {unlink.isPending ? 'Unlinking…' : 'Unlink the keeper account'}
          </button>
          <p className="text-caption text-basalt-500">
            Unlinking keeps every lamp and reading, at the counter and in the lamp log.
          </p>
        </>
      ) : free.length === 0 ? (
        <p className="text-body text-basalt-600">
          When this customer becomes a keeper of the shop (invite them from Members), link their account here:
          their enclosure lamps then show beside the lamps tested at the counter, without copies.
        </p>
      ) : (
        <form
          className="flex flex-wrap items-end gap-3"
          onSubmit={(e) => {
            e.preventDefault();
            const id = Number(choice);
            if (!id) return setRefused('Choose the keeper account to link.');
            setRefused(null);
            linkTo.mutate(id);
          }}
        >
          <Select
            label="Their keeper account"
            name="keeperId"
            value={choice}
            onChange={(e) => setChoice(e.target.value)}
            className="min-w-64 flex-1"
            hint="Keepers of this shop who are not linked to another customer."
          >
            <option value="">Choose a keeper…</option>
            {free.map((k) => (
              <option key={k.id} value={k.id}>
                {k.name} ({k.email})
              </option>
            ))}
          </Select>
          <button type="submit" className={`${button.primary} min-h-11`} disabled={linkTo.isPending}>
            {linkTo.isPending ? 'Linking…' : 'Link'}
          </button>
        </form>
      )}
      {error && <Notice tone="error">{error}</Notice>}
    </section>
  );
}
