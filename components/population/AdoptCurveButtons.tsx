'use client';

import { button } from '@/components/ui/styles';
import { useApiMutation } from '@/components/ui/useApiMutation';

/**
 * "Use this curve for our lamps of this type", and the way back to the catalogue's curve. Either one
 * recomputes the outlooks of the organisation's lamps of the type; the page then shows the curve in force.
 */
export function AdoptCurveButtons({
  lampTypeId,
  adopted,
  mayAdopt,
}: {
  lampTypeId: number;
  adopted: boolean;
  /** There is a measured curve to adopt now. */
  mayAdopt: boolean;
}) {
  const url = `/api/lamp-types/${lampTypeId}/curve-adoption`;
  const adopt = useApiMutation(() => ({ method: 'POST', url, body: {} }));
  const withdraw = useApiMutation(() => ({ method: 'DELETE', url }));
  const busy = adopt.isPending || withdraw.isPending;
  const error = adopt.error ?? withdraw.error;
  return (
    <div className="space-y-2">
      <div className="flex flex-wrap gap-2">
        {mayAdopt && (
          <button
            type="button"
            className={button.primary}
            disabled={busy}
            onClick={() => {
              withdraw.reset();
              adopt.mutate();
            }}
            data-testid="adopt-curve"
          >
            {adopt.isPending
              ? 'Adopting…'
              : adopted
                ? 'Use the newest measured curve instead'
                : 'Use this curve for our lamps of this type'}
          </button>
        )}
        {adopted && (
          <button
            type="button"
            className={button.secondary}
            disabled={busy}
            onClick={() => {
              adopt.reset();
              withdraw.mutate();
            }}
            data-testid="withdraw-curve"
          >
            {withdraw.isPending ? 'Going back…' : 'Go back to the catalogue curve'}
          </button>
        )}
      </div>
      {error && (
        <p role="alert" className="text-body text-ember-700">
          {error.message || 'The curve could not be changed.'}
        </p>
      )}
    </div>
  );
}
