'use client';
// Notices above the canvas: view only (and why), a local copy to restore, or a save conflict to resolve.
import { LocalTime } from '@/components/ui/LocalTime';
import Link from 'next/link';
import type { ReactNode } from 'react';
import type { RefusedReason } from '../persistence/autosave';
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
        Unsaved changes from <LocalTime value={new Date(savedAt)} /> were found on this device.
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

/**
 * Why the studio is view only: the person may only read this design, or the server refused their save
 * (signed out, or no longer allowed to change it). In the second case the unsaved work is still on this
 * device: it is offered back on the next visit, and can be downloaded as a design file now.
 */
export function ViewOnlyBanner({
  refused,
  signInHref,
  onDownload,
  onRetry,
}: {
  refused: RefusedReason | null;
  signInHref: string;
  onDownload: () => void;
  onRetry: () => void;
}) {
  if (!refused) {
    return (
      <p
        role="note"
        className="border-b border-sky-200 bg-sky-50 px-4 py-2 text-sm text-sky-900"
        data-testid="view-only"
        data-reason="viewer"
      >
        View only: you can look, probe and check this design, but not change it.
      </p>
    );
  }
  return (
    <div
      role="alert"
      data-testid="view-only"
      data-reason={refused}
      className="flex flex-wrap items-center gap-3 border-b border-ember-200 bg-ember-50 px-4 py-2 text-sm text-ember-900"
    >
      <span className="min-w-[16rem] flex-1">
        {refused === 'signed-out' ? (
          <>
            <strong>You are signed out, so your changes were not saved.</strong> The studio is view only until
            you sign in again. Nothing is lost: your changes are kept on this device and offered back when you
            reopen this design signed in. You can also download them as a design file.
          </>
        ) : (
          <>
            <strong>You can no longer change this design</strong> — the server refused the save (you may have
            lost access to its enclosure, for example when it moved to another keeper). The studio is view
            only. Nothing is lost: your changes are kept on this device. Download them as a design file and
            send it to whoever looks after the enclosure now (it can be uploaded as a new variant), or ask
            them for access and try again.
          </>
        )}
      </span>
      <button
        type="button"
        onClick={onDownload}
        className={`${btn} border-ember-700 bg-ember-700 text-white`}
      >
        Download my changes (.json)
      </button>
      {refused === 'signed-out' && (
        <Link href={signInHref} className={`${btn} border-ember-300 bg-white text-ember-900`}>
          Sign in again
        </Link>
      )}
      <button type="button" onClick={onRetry} className={`${btn} border-ember-300 bg-white`}>
        Try saving again
      </button>
    </div>
  );
}

/** Findings about harm to the animal or the keeper: shown above every tab, with or without a species. */
export const SAFETY_FINDINGS = new Set(['lamp-in-reach', 'eye-safety', 'hot-surface']);

export function SafetyBanner({
  findings,
  onShow,
}: {
  findings: { id: string; title: string; status: string; message: string }[];
  onShow: (id: string) => void;
}) {
  return (
    <Banner tone="warn" testId="safety-banner">
      <span className="font-semibold">Safety:</span>
      <ul className="flex flex-1 flex-col gap-1">
        {findings.map((f) => (
          <li key={f.id} data-status={f.status} className="flex flex-wrap items-baseline gap-2">
            <span>
              <strong>{f.title}</strong> ({f.status === 'fail' ? 'fail' : 'attention'})
              {/* A phone keeps the canvas in view: the title and "Show where" there, the reason under Check. */}
              <span className="hidden sm:inline"> — {f.message.split('. ')[0]}.</span>
            </span>
            <button type="button" onClick={() => onShow(f.id)} className={`${btn} border-ember-300 bg-white`}>
              Show where
            </button>
          </li>
        ))}
      </ul>
    </Banner>
  );
}
