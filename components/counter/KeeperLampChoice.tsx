'use client';

import { useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/components/ui/api-client';
import { button } from '@/components/ui/styles';
import type { LinkedKeeper } from '@/lib/customers/keeper-link';

/**
 * For a customer linked to a keeper account: which lamp is on the counter — one of the keeper's
 * enclosure lamps (the reading is added to it in the lamp log, no copy is made) or another lamp, described
 * here. Shows nothing for a customer without a linked keeper.
 */
export function KeeperLampChoice({
  customerId,
  chosen,
  onChoose,
}: {
  customerId: number;
  chosen: number | null;
  onChoose: (lampId: number | null) => void;
}) {
  const { data } = useQuery({
    queryKey: ['customer', customerId],
    queryFn: () => apiFetch<{ keeper: LinkedKeeper | null }>(`/api/customers/${customerId}`),
  });
  const lamps = data?.keeper?.isKeeper ? data.keeper.lamps.filter((l) => !l.retiredOn) : [];
  if (lamps.length === 0) return null;
  const option = (active: boolean) =>
    `${active ? button.primary : button.secondary} min-h-11 w-full justify-start px-3 text-left`;
  return (
    <div className="space-y-2">
      <p className="text-body font-medium text-basalt-800">Which lamp?</p>
      <div className="space-y-2" role="radiogroup" aria-label="Which lamp">
        {lamps.map((l) => (
          <button
            key={l.id}
            type="button"
            role="radio"
            aria-checked={chosen === l.id}
            className={option(chosen === l.id)}
            onClick={() => onChoose(l.id)}
          >
            {l.label} · {l.enclosureName}
          </button>
        ))}
        <button
          type="button"
          role="radio"
          aria-checked={chosen === null}
          className={option(chosen === null)}
          onClick={() => onChoose(null)}
        >
          Another lamp (describe it below)
        </button>
      </div>
      <p className="text-caption text-basalt-500">
        A lamp from {data!.keeper!.name}’s enclosures is tested as the lamp log has it (type, age, basking
        spot); the reading is added there.
      </p>
    </div>
  );
}
