'use client';
// Entry point for pages: builds the persistence from plain props (functions cannot cross from a
// server component) and loads the Konva studio on the client only.
import dynamic from 'next/dynamic';
import Link from '@/components/ui/Link';
import { useEffect, useMemo } from 'react';
import { exampleDesign } from './examples/exampleDesign';
import { startStudioWorkers, stopUnusedStudioWorkers } from './fields/early';
import type { StudioPicture } from '@/shared/designs/studio-field';
import { FirstFieldPicture } from './FirstField';
import { httpPersistence } from './persistence/http';
import { localPersistence } from './persistence/local';
import type { StudioProps } from './Studio';

const Studio = dynamic(() => import('./Studio'), {
  ssr: false,
  // Over the design's picture (or the plain background): the field is already on screen meanwhile.
  loading: () => (
    <div className="absolute inset-x-0 top-3 flex justify-center" role="status">
      <span className="rounded-md bg-white/90 px-3 py-1 text-sm text-basalt-600 shadow-sm">
        Opening the studio…
      </span>
    </div>
  ),
});

export type StudioSource = { kind: 'variant'; variantId: string } | { kind: 'scratch' };

/** What the loader hands on to the studio as it is; photos and catalogue types reach variant studios only. */
type PassedOn = Pick<
  StudioProps,
  | 'species'
  | 'title'
  | 'backHref'
  | 'backLabel'
  | 'initial'
  | 'initialSpeciesId'
  | 'readOnly'
  | 'photos'
  | 'catalogueTypes'
>;

export function StudioLoader({
  source,
  picture,
  photos,
  catalogueTypes,
  ...studio
}: PassedOn & {
  source: StudioSource;
  /** The field drawn on the server (the saved design's, or the example's for the scratch studio). */
  picture?: StudioPicture | null;
}) {
  const { initial } = studio;
  // The engine and contour workers load their code while the studio's own code and Konva download.
  // During render rather than in an effect, so they start as this component hydrates (idempotent).
  startStudioWorkers();
  useEffect(() => stopUnusedStudioWorkers, []);
  const key = source.kind === 'variant' ? source.variantId : 'scratch';
  const persistence = useMemo(
    () => (source.kind === 'variant' ? httpPersistence(key) : localPersistence('scratch', exampleDesign)),
    [source.kind, key],
  );
  const pictureDesign = useMemo(
    () => (source.kind === 'variant' ? initial?.design : exampleDesign()),
    [source.kind, initial?.design],
  );
  const studioPicture = useMemo(
    () => (picture && pictureDesign ? { ...picture, design: pictureDesign } : null),
    [picture, pictureDesign],
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
      <div className="relative min-h-0 flex-1">
        {picture && pictureDesign && (
          <FirstFieldPicture
            design={pictureDesign}
            picture={picture}
            inline={{ scratch: source.kind === 'scratch' }}
          />
        )}
        <div className="absolute inset-0">
          <Studio
            {...studio}
            persistence={persistence}
            photos={source.kind === 'variant' ? photos : undefined}
            catalogueTypes={source.kind === 'variant' ? catalogueTypes : undefined}
            picture={studioPicture}
          />
        </div>
      </div>
    </div>
  );
}
