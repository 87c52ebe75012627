'use client';

import { useEffect, useRef, useState } from 'react';

/**
 * A name that turns into a text box for renaming: Enter or leaving the box saves, Escape cancels.
 * An empty or unchanged name is not sent.
 */
export function InlineName({
  name,
  label,
  editable,
  onRename,
  className = '',
}: {
  name: string;
  label: string;
  editable: boolean;
  onRename: (name: string) => void;
  className?: string;
}) {
  const [editing, setEditing] = useState(false);
  const [draft, setDraft] = useState(name);
  const input = useRef<HTMLInputElement>(null);

  useEffect(() => {
    if (editing) input.current?.select();
  }, [editing]);

  const commit = () => {
    const next = draft.trim();
    setEditing(false);
    if (next && next !== name) onRename(next);
  };

  if (!editing) {
    return (
      <span className={`inline-flex items-center gap-1 ${className}`}>
        <span>{name}</span>
        {editable && (
          <button
            type="button"
            className="rounded px-1 text-caption text-basalt-500 hover:bg-basalt-100 hover:text-basalt-800"
            aria-label={`Rename ${label} ${name}`}
            title="Rename"
            onClick={() => {
              setDraft(name);
              setEditing(true);
            }}
          >
            Rename
          </button>
        )}
      </span>
    );
  }
  return (
    <input
      ref={input}
      aria-label={`New name for ${label} ${name}`}
      className="rounded border border-sand-400 bg-white px-2 py-0.5 text-body text-basalt-900"
      value={draft}
      maxLength={120}
      onChange={(e) => setDraft(e.target.value)}
      onBlur={commit}
      onKeyDown={(e) => {
        if (e.key === 'Enter') commit();
        if (e.key === 'Escape') setEditing(false);
      }}
    />
  );
}
