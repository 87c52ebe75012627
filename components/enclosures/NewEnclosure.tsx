'use client';

import { useState } from 'react';
import { button, card } from '@/components/ui/styles';
import { useApiMutation } from '@/components/ui/useApiMutation';
import { EnclosureForm, type EnclosureInput } from './EnclosureForm';

/** The "New enclosure" button and the form it opens. */
export function NewEnclosure({
  organisationId,
  chooseKeeper = false,
  startOpen = false,
  variant = 'primary',
}: {
  organisationId: number;
  /** Owners and staff choose the keeper. */
  chooseKeeper?: boolean;
  startOpen?: boolean;
  /** Secondary where a stronger call to action (the guided start) stands beside it. */
  variant?: 'primary' | 'secondary';
}) {
  const [open, setOpen] = useState(startOpen);
  const [created, setCreated] = useState('');
  const create = useApiMutation(
    (input: EnclosureInput) => ({
      method: 'POST',
      url: '/api/enclosures',
      body: { organisationId, ...input },
    }),
    {
      onSuccess: (_, input) => {
        setCreated(input.name);
        setOpen(false);
      },
    },
  );
  if (!open) {
    return (
      <div className="flex items-center gap-3">
        {created && (
          <span role="status" className="text-body text-moss-700">
            Added “{created}”.
          </span>
        )}
        <button type="button" className={button[variant]} onClick={() => setOpen(true)}>
          New enclosure
        </button>
      </div>
    );
  }
  return (
    <section aria-labelledby="new-enclosure" className={`${card} w-full p-5`}>
      <h2 id="new-enclosure" className="mb-4 text-lead font-semibold">
        New enclosure
      </h2>
      <EnclosureForm
        chooseKeeper={chooseKeeper ? { organisationId } : undefined}
        submitLabel="Add enclosure"
        onCancel={() => setOpen(false)}
        onSubmit={create.mutateAsync}
      />
    </section>
  );
}
