'use client';
// The photo backdrop (Fields tab): which of the enclosure's photos is traced under the design, whether
// it shows, how strongly, and where it lies. Placement is part of the design: every change is one undo
// step (a drag of the opacity slider too). Absent in the scratch studio, which has no enclosure.
import Link from 'next/link';
import { useId } from 'react';
import { useCommandContext, useStudio } from '../hooks/useStudio';
import { chooseBackdrop, updateBackdrop } from '../state/backdropActions';
import type { Backdrop } from '../state/types';
import { CommandButton, focusRing } from './CommandButton';
import { Grid2, NumberField, OpacitySlider, Section, inputClass } from './FormFields';
import { useUnits } from './useObjectEdit';
import { checkBackdropEdit } from './validate';

/** Why a chosen photo cannot be drawn, in the user's words; null when it can (or is loading). */
export function photoProblem(
  listed: boolean,
  image: 'loading' | 'ready' | 'unavailable' | null,
): string | null {
  if (listed && image !== 'unavailable') return null;
  return 'Photo not available: it was deleted, or it belongs to an enclosure you cannot see. Choose another photo, or None.';
}

export function PhotoPanel() {
  const { store } = useCommandContext();
  const photos = useStudio(store, (s) => s.session.photos);
  const backdrop = useStudio(store, (s) => s.history.present.backdrop);
  const image = useStudio(store, (s) => s.session.backdropImage);
  const readOnly = useStudio(store, (s) => s.readOnly);
  const adjusting = useStudio(store, (s) => s.session.backdropAdjust);
  const selectId = useId();
  if (!photos) return null;

  if (photos.items.length === 0 && !backdrop) {
    return (
      <Section title="Photo backdrop">
        <p className="text-sm text-basalt-600" data-testid="photo-none">
          No photo of this enclosure yet. Upload one taken from the front on the{' '}
          <Link href={photos.uploadHref} className={`text-sky-700 underline ${focusRing}`}>
            enclosure’s lamps page
          </Link>
          , then choose it here to trace the real enclosure.
        </p>
      </Section>
    );
  }

  const listed = backdrop ? photos.items.some((p) => p.id === backdrop.uploadId) : false;
  const problem = backdrop
    ? photoProblem(listed, image?.uploadId === backdrop.uploadId ? image.state : null)
    : null;
  return (
    <Section title="Photo backdrop">
      <div className="flex flex-col gap-1">
        <label htmlFor={selectId} className="text-caption font-medium text-basalt-700">
          Photo of the enclosure
        </label>
        <select
          id={selectId}
          data-testid="photo-choice"
          className={inputClass}
          disabled={readOnly}
          value={backdrop ? String(backdrop.uploadId) : ''}
          onChange={(e) => chooseBackdrop(store, e.target.value ? Number(e.target.value) : null)}
        >
          <option value="">None</option>
          {photos.items.map((p) => (
            <option key={p.id} value={String(p.id)}>
              {p.name}
            </option>
          ))}
          {backdrop && !listed && <option value={String(backdrop.uploadId)}>Photo not available</option>}
        </select>
      </div>
      {problem && (
        <p role="alert" data-testid="photo-problem" className="text-sm text-ember-700">
          {problem}
        </p>
      )}
      {backdrop && image?.state === 'loading' && image.uploadId === backdrop.uploadId && (
        <p className="text-caption text-basalt-500" role="status">
          Loading the photo…
        </p>
      )}
      {backdrop && !problem && (
        <PhotoPlacement backdrop={backdrop} adjusting={adjusting} readOnly={readOnly} />
      )}
      <p className="text-caption text-basalt-500">
        Add or delete photos on the{' '}
        <Link href={photos.uploadHref} className={`text-sky-700 underline ${focusRing}`}>
          enclosure’s lamps page
        </Link>
        . The photo only helps you draw: the fields never depend on it.
      </p>
    </Section>
  );
}

function PhotoPlacement({
  backdrop,
  adjusting,
  readOnly,
}: {
  backdrop: Backdrop;
  adjusting: boolean;
  readOnly: boolean;
}) {
  const { store } = useCommandContext();
  const units = useUnits();
  const endSlide = () => {
    if (store.inGesture) store.endGesture();
  };
  const field = (key: 'x' | 'y' | 'width' | 'height') => ({
    value: backdrop[key],
    kind: 'length' as const,
    units,
    check: (v: number | undefined) => checkBackdropEdit(backdrop, key, v, units),
    onCommit: (v: number | undefined) => {
      if (v !== undefined) updateBackdrop(store, { [key]: v });
    },
  });
  return (
    <>
      <div className="flex flex-wrap items-center gap-1">
        <CommandButton id="backdrop.toggle" showLabel className="border border-basalt-200" />
        <CommandButton id="backdrop.adjust" showLabel className="border border-basalt-200" />
        <CommandButton id="backdrop.fit" showLabel className="border border-basalt-200" />
      </div>
      {adjusting && (
        <p className="text-caption text-basalt-600" data-testid="photo-adjust-hint">
          Drag the photo to move it; drag its corners until its enclosure lines up with the drawn one. Esc
          when done.
        </p>
      )}
      <OpacitySlider
        label="Photo opacity"
        value={backdrop.opacity}
        min={5}
        testId="photo-opacity"
        disabled={readOnly}
        onChange={(opacity) => updateBackdrop(store, { opacity })}
        onSlideStart={() => store.beginGesture()}
        onSlideEnd={endSlide}
      />
      {!readOnly && (
        <Grid2>
          <NumberField label="Photo left edge" testId="photo-x" {...field('x')} />
          <NumberField label="Photo bottom edge" testId="photo-y" {...field('y')} />
          <NumberField label="Photo width" testId="photo-width" {...field('width')} />
          <NumberField label="Photo height" testId="photo-height" {...field('height')} />
        </Grid2>
      )}
    </>
  );
}
