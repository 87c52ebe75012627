'use client';

import { useEffect, useState, type ReactNode } from 'react';
import { useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/components/ui/api-client';
import { button, input } from '@/components/ui/styles';
import type { CustomerDto } from '@/lib/customers/queries';

export type Who = { kind: 'walk-in' } | { kind: 'new' } | { kind: 'existing'; id: number; name: string };

/** Who the lamp belongs to: a walk-in (no record), a new customer, or one found by name, e-mail or phone. */
export function CustomerPicker({
  organisationId,
  who,
  onWho,
}: {
  organisationId: number;
  who: Who;
  onWho: (who: Who) => void;
}) {
  const [finding, setFinding] = useState(false);
  const [q, setQ] = useState('');
  // The search asks a moment after the last keystroke, so typing a name does not send every letter.
  const [needle, setNeedle] = useState('');
  useEffect(() => {
    const timer = setTimeout(() => setNeedle(q.trim()), 250);
    return () => clearTimeout(timer);
  }, [q]);
  const search = useQuery({
    queryKey: ['customers', organisationId, needle],
    queryFn: ({ signal }) =>
      apiFetch<{ items: CustomerDto[] }>(
        `/api/customers?organisationId=${organisationId}&limit=8&q=${encodeURIComponent(needle)}`,
        { signal },
      ),
    enabled: finding && needle.length >= 2,
    placeholderData: (previous) => previous,
  });
  const found = search.data?.items ?? null;
  const failed = search.error ? search.error.message || 'The search failed.' : null;

  return (
    <div className="space-y-2">
      <p className="text-body font-medium text-basalt-800">Whose lamp?</p>
      <div className="flex gap-2" role="radiogroup" aria-label="Whose lamp">
        <Choice
          active={who.kind === 'walk-in' && !finding}
          onChoose={() => {
            setFinding(false);
            onWho({ kind: 'walk-in' });
          }}
        >
          Walk-in
        </Choice>
        <Choice active={who.kind === 'existing' || finding} onChoose={() => setFinding(true)}>
          Find customer
        </Choice>
        <Choice
          active={who.kind === 'new' && !finding}
          onChoose={() => {
            setFinding(false);
            onWho({ kind: 'new' });
          }}
        >
          New customer
        </Choice>
      </div>
      {who.kind === 'walk-in' && !finding && (
        <p className="text-caption text-basalt-500">
          No record needed: the answer is shown now; saving keeps the lamp without a name.
        </p>
      )}
      {who.kind === 'new' && !finding && (
        <p className="text-caption text-basalt-500">Their name and contact are asked when you save.</p>
      )}
      {who.kind === 'existing' && !finding && <p className="text-body">For {who.name}.</p>}
      {finding && (
        <div className="space-y-2">
          <label htmlFor="counter-customer-search" className="block text-body font-medium text-basalt-800">
            Search customers
          </label>
          <input
            id="counter-customer-search"
            type="search"
            className={input}
            placeholder="Name, e-mail or phone"
            value={q}
            onChange={(e) => setQ(e.target.value)}
          />
          {failed && <p className="text-caption text-ember-700">{failed}</p>}
          {found && found.length === 0 && (
            <p className="text-caption text-basalt-500">No customer matches.</p>
          )}
          {found && found.length > 0 && (
            <ul className="divide-y divide-basalt-100 rounded-md border border-basalt-200">
              {found.map((c) => (
                <li key={c.id}>
                  <button
                    type="button"
                    className="min-h-11 w-full px-3 py-2 text-left text-body hover:bg-basalt-50"
                    onClick={() => {
                      setFinding(false);
                      onWho({ kind: 'existing', id: c.id, name: c.name });
                    }}
                  >
                    {c.name}
                    <span className="ml-2 text-caption text-basalt-500">
                      {[c.email, c.phone].filter(Boolean).join(' · ')}
                    </span>
                  </button>
                </li>
              ))}
            </ul>
          )}
        </div>
      )}
    </div>
  );
}

/** One of the three answers to "whose lamp?", drawn as a button that is a radio. */
function Choice({
  active,
  onChoose,
  children,
}: {
  active: boolean;
  onChoose: () => void;
  children: ReactNode;
}) {
  return (
    <button
      type="button"
      role="radio"
      aria-checked={active}
      className={`${active ? button.primary : button.secondary} min-h-11 flex-1 px-2`}
      onClick={onChoose}
    >
      {children}
    </button>
  );
}
