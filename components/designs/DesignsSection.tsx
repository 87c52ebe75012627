'use client';

import Link from '@/components/ui/Link';
import { EmptyState } from '@/components/ui/EmptyState';
import { useDeferredValue, useMemo, useState } from 'react';
import { DesignCard } from './DesignCard';
import { compareHref, sortDesigns, type DesignSort } from './list-helpers';
import { QueryProvider } from '@/components/ui/QueryProvider';
import { btn, input } from './styles';
import { useDesignMutations, useDesignsList } from './useDesigns';

/**
 * The "Designs" part of an enclosure's page: its designs and their variants, with search, sort,
 * create, rename, duplicate and delete (shown at once, rolled back if the server refuses), and a pick
 * of two variants to compare. Brings its own data-fetching provider.
 */
export function DesignsSection(props: { enclosureId: number; enclosureName?: string; canEdit?: boolean }) {
  return (
    <QueryProvider>
      <DesignsSectionInner {...props} />
    </QueryProvider>
  );
}

function DesignsSectionInner({ enclosureId, canEdit = true }: { enclosureId: number; canEdit?: boolean }) {
  const [search, setSearch] = useState('');
  const q = useDeferredValue(search.trim());
  const [sort, setSort] = useState<DesignSort>('updated');
  const [newName, setNewName] = useState('');
  const [selected, setSelected] = useState<number[]>([]);
  const list = useDesignsList(enclosureId, q);
  const m = useDesignMutations(enclosureId);

  const designs = useMemo(
    () => sortDesigns(list.data?.pages.flatMap((p) => p.items) ?? [], sort),
    [list.data, sort],
  );
  const failedMessage = (
    [
      m.createDesign,
      m.renameDesign,
      m.deleteDesign,
      m.duplicateVariant,
      m.renameVariant,
      m.deleteVariant,
    ] as { error: Error | null }[]
  ).find((x) => x.error)?.error?.message;
  const toggle = (id: number) =>
    setSelected((s) => (s.includes(id) ? s.filter((x) => x !== id) : [...s.slice(-1), id]));

  const create = () => {
    const name = newName.trim();
    if (!name) return;
    m.createDesign.mutate({ name });
    setNewName('');
  };

  return (
    <section aria-labelledby="designs-heading" className="space-y-4">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h2 id="designs-heading" className="text-title text-basalt-900">
          Designs
        </h2>
        <div className="flex flex-wrap items-center gap-2">
          <input
            type="search"
            className={input}
            placeholder="Search designs"
            aria-label="Search designs"
            value={search}
            onChange={(e) => setSearch(e.target.value)}
          />
          <label className="flex items-center gap-1 text-caption text-basalt-600">
            Sort
            <select
              className={input}
              value={sort}
              onChange={(e) => setSort(e.target.value as DesignSort)}
              aria-label="Sort designs"
            >
              <option value="updated">Last changed</option>
              <option value="name">Name</option>
              <option value="created">Newest first</option>
            </select>
          </label>
        </div>
      </div>

      {canEdit && (
        <form
          className="flex flex-wrap items-center gap-2"
          onSubmit={(e) => {
            e.preventDefault();
            create();
          }}
        >
          <input
            className={`${input} min-w-64`}
            placeholder="Name of a new design, e.g. Summer set-up"
            aria-label="New design name"
            maxLength={120}
            value={newName}
            onChange={(e) => setNewName(e.target.value)}
          />
          <button type="submit" className={btn.primary} disabled={!newName.trim()}>
            New design
          </button>
          <span className="text-caption text-basalt-500">
            Starts from this enclosure’s size with a mesh lid; add lamps in the studio.
          </span>
        </form>
      )}

      {failedMessage && (
        <p
          role="alert"
          className="rounded-md border border-ember-200 bg-ember-50 px-3 py-2 text-body text-ember-800"
        >
          {failedMessage} The change was undone.
        </p>
      )}

      {selected.length === 0 && designs.reduce((n, d) => n + d.variants.length, 0) > 1 && (
        <p className="text-caption text-basalt-600">
          Tick the boxes beside two variants (of any design) to compare them side by side.
        </p>
      )}

      {selected.length > 0 && (
        <div className="flex items-center gap-3 rounded-md bg-sky-50 px-3 py-2 text-body text-sky-900">
          <span>
            {selected.length === 1 ? 'Choose one more variant to compare.' : 'Two variants chosen.'}
          </span>
          {selected.length === 2 && (
            <Link className={btn.primary} href={compareHref(selected[0]!, selected[1])}>
              Compare side by side
            </Link>
          )}
          <button type="button" className={btn.small} onClick={() => setSelected([])}>
            Clear
          </button>
        </div>
      )}

      {list.isPending ? (
        <ul aria-label="Loading designs" className="space-y-3">
          {[0, 1].map((i) => (
            <li key={i} className="h-24 animate-pulse rounded-lg bg-basalt-100" />
          ))}
        </ul>
      ) : list.isError ? (
        <div
          role="alert"
          className="rounded-md border border-ember-200 bg-ember-50 px-3 py-3 text-body text-ember-800"
        >
          The designs could not be loaded: {list.error.message}{' '}
          <button type="button" className={btn.small} onClick={() => list.refetch()}>
            Try again
          </button>
        </div>
      ) : designs.length === 0 ? (
        q ? (
          <p className="rounded-lg border border-dashed border-basalt-300 px-4 py-6 text-center text-body text-basalt-600">
            No design’s name contains “{q}”.
          </p>
        ) : (
          <EmptyState title="No designs yet">
            <p>
              A design is a to-scale side view of this enclosure with its lamps, lid, perches, ledges and
              hides. It shows the estimated UVB, UV Index and temperature everywhere inside, and checks them
              against the species’ needs.
            </p>
            <p>
              Designs can have variants to compare — a lower lamp, another lid — and can be shared read-only.
              {canEdit && ' Name a new design above to start from this enclosure’s size with a mesh lid.'}
            </p>
          </EmptyState>
        )
      ) : (
        <ul className="space-y-3" aria-label="Designs">
          {designs.map((d) => (
            <DesignCard
              key={d.id}
              design={d}
              canEdit={canEdit}
              mutations={m}
              selected={selected}
              onToggleSelect={toggle}
            />
          ))}
        </ul>
      )}
      {list.hasNextPage && (
        <button
          type="button"
          className={btn.secondary}
          disabled={list.isFetchingNextPage}
          onClick={() => list.fetchNextPage()}
        >
          {list.isFetchingNextPage ? 'Loading…' : 'Show more designs'}
        </button>
      )}
    </section>
  );
}
