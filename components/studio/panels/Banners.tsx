'use client';
// Notices above the canvas: a local copy to restore, or a save conflict to resolve.
import type { ReactNode } from 'react';
import { focusRing } from './CommandButton';

function Banner({ tone, children, testId }: { tone: 'info' | 'warn'; children: ReactNode; testId: string }) {
  return (
    <div
      role="alert"
      data-testid={testId}
      className={`flex flex-wrap items-center gap-3 border-b px-4 py-2 text-sm ${
        tone === 'warn'
          ? 'border-ember-200 bg-ember-50 text-ember-900'
          : 'border-sky-200 bg-sky-50 text-sky-900'
      }`}
    >
      {children}
    </div>
  );
}

const btn = `rounded-md border px-2.5 py-1 text-sm font-medium ${focusRing}`;

export function RestoreBanner({
  savedAt,
  onRestore,
  onDiscard,
}: {
  savedAt: number;
  onRestore: () => void;
  onDiscard: () => void;
}) {
  return (
    <Banner tone="info" testId="restore-banner">
      <span className="flex-1">
        Unsaved changes from {new Date(savedAt).toLocaleString()} were found on this device.
      </span>
      <button type="button" onClick={onRestore} className={`${btn} border-sky-700 bg-sky-700 text-white`}>
        Restore them
      </button>
      <button type="button" onClick={onDiscard} className={`${btn} border-sky-300 bg-white`}>
        Discard
      </button>
    </Banner>
  );
}

export function ConflictBanner({
  onKeepMine,
  onTakeTheirs,
}: {
  onKeepMine: () => void;
  onTakeTheirs: () => void;
}) {
  return (
    <Banner tone="warn" testId="conflict-banner">
      <span className="flex-1">
        Someone else saved this design while you were editing. Your changes are kept on this device until you
        choose.
      </span>
      <button
        type="button"
        onClick={onKeepMine}
        className={`${btn} border-ember-700 bg-ember-700 text-white`}
      >
        Keep mine (overwrite)
      </button>
      <button type="button" onClick={onTakeTheirs} className={`${btn} border-ember-300 bg-white`}>
        Load theirs
      </button>
    </Banner>
  );
}
