'use client';

import { useMemo, useState } from 'react';
import { PersonPicker, type PickedPerson } from '@/components/people/PersonPicker';
import { Select } from '@/components/ui/Select';
import { ServerListFrame } from '@/components/ui/ServerListFrame';
import { button } from '@/components/ui/styles';
import { useLengthUnit } from '@/components/ui/units';
import { useServerList } from '@/components/ui/useServerList';
import type { LampListPage } from '@/lib/lamp-log/list-queries';
import { DUE_WITHIN_DAYS, lampListView, type LampListView } from '@/lib/lamp-log/list-view';
import { STATUS_LABEL, STATUSES } from '@/lib/lamp-log/status';
import { lampColumns } from './LampTable';

export type TechOption = { id: string; label: string };

/**
 * The lamp log: the organisation's lamps searched, filtered, sorted and paged by the server (the table
 * library only lays out the page it is given), from the stored outlooks. The view is in the address bar.
 */
export function LampLogTable({
  organisationId,
  seesKeepers,
  keeper,
  techs,
  initial,
}: {
  organisationId: number;
  /** Staff choose a keeper (searched as they type); a keeper's list the server narrows to their own. */
  seesKeepers: boolean;
  /** The keeper the address filters by, with their name. */
  keeper: PickedPerson | null;
  techs: TechOption[];
  initial: { view: LampListView; page: LampListPage };
}) {
  const [unit] = useLengthUnit();
  const list = useServerList({
    codec: lampListView,
    endpoint: '/api/lamps',
    scope: { organisationId },
    initial,
  });
  const columns = useMemo(() => lampColumns(unit, true), [unit]);
  const filters = list.view.filters ?? {};
  const filtered = Object.keys(filters).some((k) => k !== 'retired' && k !== 'enclosure');
  const [picked, setPicked] = useState<PickedPerson | null>(keeper);
  // Back and Forward change the filter without this picker: show nobody rather than a stale name.
  const shownKeeper = filters.keeper && picked && String(picked.id) === filters.keeper ? picked : null;
  const setFilter = (key: string, value: string) => {
    const next = { ...filters };
    if (value) next[key] = value;
    else delete next[key];
    list.show({ filters: next, page: 1 });
  };

  return (
    <ServerListFrame
      list={list}
      codec={lampListView}
      noun={{ one: 'lamp', many: 'lamps', caption: 'Lamps' }}
      placeholder="Lamp, lamp type, enclosure or species"
      narrowed={filtered}
      filters={
        <fieldset className="mb-4 flex flex-wrap items-end gap-3">
          <legend className="sr-only">Filter the lamps</legend>
          {[
            {
              key: 'status',
              label: 'Status',
              any: 'Any in use',
              className: 'w-40',
              options: STATUSES.map((st) => ({ value: st, label: STATUS_LABEL[st] })),
            },
            {
              key: 'due',
              label: 'Due within',
              any: 'Any time',
              className: 'w-36',
              options: DUE_WITHIN_DAYS.map((d) => ({ value: String(d), label: `${d} days` })),
            },
            {
              key: 'tech',
              label: 'Technology',
              any: 'Any',
              className: 'w-48',
              options: techs.map((t) => ({ value: t.id, label: t.label })),
            },
          ].map((f) => (
            <Select
              key={f.key}
              label={f.label}
              value={filters[f.key] ?? ''}
              onChange={(ev) => setFilter(f.key, ev.target.value)}
              className={f.className}
            >
              <option value="">{f.any}</option>
              {f.options.map((o) => (
                <option key={o.value} value={o.value}>
                  {o.label}
                </option>
              ))}
            </Select>
          ))}
          {seesKeepers && (
            <PersonPicker
              label="Keeper"
              organisationId={organisationId}
              people="keepers"
              value={shownKeeper}
              clearable
              placeholder="Anyone"
              onChange={(p) => {
                setPicked(p);
                setFilter('keeper', p ? String(p.id) : '');
              }}
              className="w-56"
            />
          )}
          <label className="flex items-center gap-2 pb-2 text-body text-basalt-700">
            <input
              type="checkbox"
              checked={filters.retired === '1'}
              onChange={(ev) => setFilter('retired', ev.target.checked ? '1' : '')}
            />
            Include retired lamps
          </label>
        </fieldset>
      }
      empty={
        <>
          <p>{list.view.q ? `No lamp matches “${list.view.q}” here.` : 'No lamp matches these filters.'}</p>
          <button
            type="button"
            className={`${button.quiet} mt-2`}
            onClick={() => {
              list.setDraft('');
              list.show({ q: '', filters: {}, page: 1 });
            }}
          >
            Clear the search and filters
          </button>
        </>
      }
      columns={columns}
      rowKey={(l) => l.id}
      rowClassName="align-top hover:bg-basalt-50"
      testId="lamp-table"
    />
  );
}
