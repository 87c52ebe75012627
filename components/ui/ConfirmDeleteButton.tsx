'use client';

import { useRouter } from 'next/navigation';
import { button } from './styles';
import { useApiMutation } from './useApiMutation';

/**
 * Deletes a thing after a plain confirmation that says what happens, then opens the list it was in.
 * The error, if any (the server may refuse while other things use it), is shown beside the button.
 */
export function ConfirmDeleteButton({
  url,
  confirm,
  then,
  label = 'Delete',
  busyLabel = 'Deleting…',
  failure,
}: {
  /** The DELETE route. */
  url: string;
  /** The question asked first: what goes and what stays. */
  confirm: string;
  /** Where to go once deleted. */
  then: string;
  label?: string;
  busyLabel?: string;
  failure: string;
}) {
  const router = useRouter();
  const remove = useApiMutation(() => ({ method: 'DELETE', url }), { onSuccess: () => router.push(then) });
  // Pending until the next page replaces this one: the button must not offer a second delete.
  const busy = remove.isPending || remove.isSuccess;
  return (
    <span className="inline-flex flex-col items-end">
      <button
        type="button"
        className={button.secondary}
        onClick={() => {
          if (window.confirm(confirm)) remove.mutate();
        }}
        disabled={busy}
      >
        {busy ? busyLabel : label}
      </button>
      {remove.error && (
        <span role="alert" className="mt-1 max-w-xs text-right text-caption text-ember-700">
          {remove.error.message || failure}
        </span>
      )}
    </span>
  );
}
