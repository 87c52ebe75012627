'use client';
// Entry point for pages: builds the persistence from plain props (functions cannot cross from a
// server component) and loads the Konva studio on the client only.
import dynamic from 'next/dynamic';
import Link from '@/components/ui/Link';
import { useMemo } from 'react';
import { exampleDesign } from './examples/exampleDesign';
import { httpPersistence } from './persistence/http';
import { localPersistence } from './persistence/local';
import type { Loaded } from './persistence/types';
import type { EnclosurePhotos } from './state/session';
import type { StudioSpecies } from './state/types';

const Studio = dynamic(() => import('./Studio'), {
  ssr: false,
  loading: () => (
    <div className="flex h-full items-center justify-center bg-basalt-50 text-basalt-600" role="status">
      Opening the studio…
    </div>
  ),
});

export type StudioSource = { kind: 'variant'; variantId: string } | { kind: 'scratch' };

export function StudioLoader({
  source,
  species,
  title,
  backHref,
  backLabel,
  initial,
  initialSpeciesId,
  readOnly,
  photos,
}: {
  source: StudioSource;
  species: StudioSpecies[];
  title: string;
  backHref?: string;
  backLabel?: string;
  initial?: Loaded;
  initialSpeciesId?: string | null;
  readOnly?: boolean;
  /** The enclosure's backdrop photos this user may see (variant studios only). */
  photos?: EnclosurePhotos;
}) {
  const key = source.kind === 'variant' ? source.variantId : 'scratch';
  const persistence = useMemo(
    () => (source.kind === 'variant' ? httpPersistence(key) : localPersistence('scratch', exampleDesign)),
    [source.kind, key],
  );
  return (
    <div className="fixed inset-0 z-40 flex flex-col bg-basalt-50">
      {source.kind === 'scratch' && (
        <p
          role="note"
          data-testid="scratch-note"
          className="shrink-0 border-b border-sand-300 bg-sand-50 px-4 py-1.5 text-caption text-sand-900 sm:text-sm"
        >
          <strong>Kept only in this browser.</strong>{' '}
          {/* A phone keeps the canvas's room: the short form of the note. */}
          <span className="hidden sm:inline">
            Nothing is sent to a server; clearing this browser’s data or using another device loses it.{' '}
          </span>
          <Link href="/sign-up" className="font-medium text-sky-800 underline">
            Create an account
          </Link>{' '}
          to keep designs, share them and log your lamps.
        </p>
      )}
      <Studio
        persistence={persistence}
        species={species}
        title={title}
        backHref={backHref}
        backLabel={backLabel}
        initial={initial}
        initialSpeciesId={initialSpeciesId}
        readOnly={readOnly}
        photos={source.kind === 'variant' ? photos : undefined}
      />
    </div>
  );
}
