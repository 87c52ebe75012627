'use client';

import { useState, type ReactNode } from 'react';

/** A destructive action that asks once more in place (no browser dialog), e.g. "Delete? Yes / No". */
export function ConfirmButton({
  children,
  question,
  confirmLabel = 'Yes, delete',
  onConfirm,
  disabled,
  className = '',
}: {
  children: ReactNode;
  question: string;
  confirmLabel?: string;
  onConfirm: () => void;
  disabled?: boolean;
  className?: string;
}) {
  const [asking, setAsking] = useState(false);
  if (!asking) {
    return (
      <button type="button" className={className} disabled={disabled} onClick={() => setAsking(true)}>
        {children}
      </button>
    );
  }
  return (
    <span role="group" aria-label={question} className="inline-flex items-center gap-1 text-caption">
      <span className="text-ember-700">{question}</span>
      <button
        type="button"
        className="rounded bg-ember-600 px-2 py-0.5 font-medium text-white hover:bg-ember-700"
        onClick={() => {
          setAsking(false);
          onConfirm();
        }}
      >
        {confirmLabel}
      </button>
      <button
        type="button"
        className="rounded px-2 py-0.5 text-basalt-600 hover:bg-basalt-100"
        onClick={() => setAsking(false)}
        autoFocus
      >
        Cancel
      </button>
    </span>
  );
}
