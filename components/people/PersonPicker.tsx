'use client';

import { useEffect, useId, useRef, useState } from 'react';
import { apiFetch } from '@/components/ui/api-client';
import { FormControl } from '@/components/ui/FormControl';
import { input } from '@/components/ui/styles';

export type PickedPerson = { id: number; name: string; role?: string };

type Found = { userId: number; name: string; email: string; role?: string };

/** How many people one search shows: a name narrows it further. */
const SHOWN = 8;
/** Typing pauses this long before the search is sent. */
const PAUSE_MS = 200;

/**
 * Choose one person of the organisation by typing part of their name or e-mail: each pause asks the
 * paged people API (`/api/keepers` or the organisation's members) for a few matches, so a page never
 * carries the organisation's whole list of people. A combobox in the ARIA sense: the arrow keys move
 * through the matches, Enter picks, Escape closes. `name` puts the chosen id in a hidden field for a
 * form; clearing the text picks nobody (`onChange(null)`) where `clearable`.
 */
export function PersonPicker({
  label,
  organisationId,
  people,
  value,
  onChange,
  name,
  clearable = false,
  placeholder = 'Type a name or e-mail',
  hint,
  error,
  className,
}: {
  label: string;
  organisationId: number;
  /** Keepers only, or any member (with their role beside the name). */
  people: 'keepers' | 'members';
  value: PickedPerson | null;
  onChange: (person: PickedPerson | null) => void;
  name?: string;
  clearable?: boolean;
  placeholder?: string;
  hint?: string;
  error?: string | null;
  className?: string;
}) {
  const listId = useId();
  const [text, setText] = useState(value?.name ?? '');
  const [open, setOpen] = useState(false);
  const [found, setFound] = useState<Found[]>([]);
  const [active, setActive] = useState(0);
  const [status, setStatus] = useState('');
  const asked = useRef(0);

  // The shown text follows a choice made elsewhere (Back, a cleared filter): adjusted while rendering.
  const [shownFor, setShownFor] = useState(value);
  if (shownFor?.id !== value?.id || shownFor?.name !== value?.name) {
    setShownFor(value);
    setText(value?.name ?? '');
  }

  useEffect(() => {
    if (!open) return;
    const ask = ++asked.current;
    const timer = setTimeout(() => {
      const q = text.trim() === value?.name ? '' : text.trim();
      const params = new URLSearchParams({ limit: String(SHOWN), sort: 'name' });
      if (q) params.set('q', q);
      const url =
        people === 'keepers'
          ? `/api/keepers?organisationId=${organisationId}&${params}`
          : `/api/organisations/${organisationId}/members?${params}`;
      setStatus('Searching…');
      apiFetch<{ items: Found[]; total: number }>(url)
        .then((page) => {
          if (ask !== asked.current) return;
          setFound(page.items);
          setActive(0);
          setStatus(
            page.total === 0
              ? 'Nobody matches.'
              : page.total > page.items.length
                ? `${page.items.length} of ${page.total} shown: type more of the name to narrow them.`
                : `${page.total} ${page.total === 1 ? 'match' : 'matches'}.`,
          );
        })
        .catch((e: unknown) => {
          if (ask === asked.current) setStatus(e instanceof Error ? e.message : 'The search failed.');
        });
    }, PAUSE_MS);
    return () => clearTimeout(timer);
  }, [open, text, people, organisationId, value?.name]);

  const pick = (p: Found) => {
    onChange({ id: p.userId, name: p.name, role: p.role });
    setText(p.name);
    setOpen(false);
  };

  return (
    <FormControl label={label} hint={hint} error={error} className={`relative ${className ?? ''}`}>
      {(control) => (
        <>
          <input
            {...control}
            type="text"
            role="combobox"
            autoComplete="off"
            aria-autocomplete="list"
            aria-expanded={open}
            aria-controls={open ? listId : undefined}
            aria-activedescendant={open && found[active] ? `${listId}-${active}` : undefined}
            className={input}
            value={text}
            placeholder={placeholder}
            onFocus={() => setOpen(true)}
            onBlur={() => {
              setOpen(false);
              // Leaving half-typed text keeps the last choice.
              if (!text.trim() && clearable) onChange(null);
              else setText(value?.name ?? '');
            }}
            onChange={(ev) => {
              setText(ev.target.value);
              setOpen(true);
              if (!ev.target.value.trim() && clearable) onChange(null);
            }}
            onKeyDown={(ev) => {
              if (ev.key === 'ArrowDown' || ev.key === 'ArrowUp') {
                ev.preventDefault();
                setOpen(true);
                const step = ev.key === 'ArrowDown' ? 1 : -1;
                setActive((i) => (found.length ? (i + step + found.length) % found.length : 0));
              } else if (ev.key === 'Enter' && open && found[active]) {
                ev.preventDefault();
                pick(found[active]);
              } else if (ev.key === 'Escape') {
                setOpen(false);
                setText(value?.name ?? '');
              }
            }}
          />
          {name && <input type="hidden" name={name} value={value?.id ?? ''} />}
          {open && (
            <div className="absolute z-20 mt-1 w-full min-w-56 rounded border border-basalt-200 bg-white shadow-lg">
              <ul id={listId} role="listbox" aria-label={label} className="max-h-72 overflow-auto py-1">
                {found.map((p, i) => (
                  <li
                    key={p.userId}
                    id={`${listId}-${i}`}
                    role="option"
                    aria-selected={i === active}
                    className={`cursor-pointer px-3 py-1.5 text-body ${i === active ? 'bg-basalt-100' : ''}`}
                    // Chosen on mouse down, before the field's blur closes the list.
                    onMouseDown={(ev) => {
                      ev.preventDefault();
                      pick(p);
                    }}
                  >
                    {p.name}
                    {p.role ? ` (${p.role})` : ''}
                    <span className="block text-caption text-basalt-500">{p.email}</span>
                  </li>
                ))}
              </ul>
              <p className="border-t border-basalt-100 px-3 py-1 text-caption text-basalt-500" role="status">
                {status}
              </p>
            </div>
          )}
        </>
      )}
    </FormControl>
  );
}
