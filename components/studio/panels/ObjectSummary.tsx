'use client';
// A text version of the canvas for screen readers: every object with its place and size.
import { formatLength, formatNumber, rulerParts } from '@/shared/units';
import { segmentAngleDeg, segmentLength } from '../geometry/objects';
import { useCommandContext, useStudio } from '../hooks/useStudio';
import { calibrationLabel } from '../state/calibration';
import { kindOf } from '@/shared/object-kinds';
import { isBox, isSegment, type DesignObject } from '../state/types';
import type { LengthUnit } from '@/shared/units';
import type { BackdropImageState, EnclosurePhotos } from '../state/session';
import type { Backdrop, Design } from '../state/types';
import { depthRelation, lampDepth, sectionDepth } from '../state/depth';
import type { HighlightShape } from '../canvas/Overlay';
import { LAMP_TECHS, type MeshRisk } from '@/simulation';
import type { Finding } from '../fields/engineTypes';
import { husbandrySentences } from '../geometry/husbandry';

export function describeObject(o: DesignObject, u: LengthUnit, design?: Design): string {
  const name = `${kindOf(o.type).name}${o.name ? ` “${o.name}”` : ''}`;
  const L = (v: number) => formatLength(v, u);
  if (o.type === 'lamp') {
    const size = o.form === 'tube' ? `, ${L(o.length ?? 0)} long` : '';
    const calibrated = calibrationLabel(o);
    const depth = design
      ? `, ${L(lampDepth(design, o))} from the front (${depthRelation(design, o, u)})`
      : '';
    return `${name}: ${LAMP_TECHS[o.tech].label}${size}, at ${L(o.x)} from the left, ${L(o.y)} up${depth}${calibrated ? `, ${calibrated}` : ''}`;
  }
  if (isSegment(o)) {
    const extra = 'thickness' in o ? `, ${L(o.thickness)} thick` : '';
    return `${name}: from (${L(o.x1)}, ${L(o.y1)}) to (${L(o.x2)}, ${L(o.y2)}), ${L(segmentLength(o))} long at ${formatNumber(segmentAngleDeg(o), 0)}°${extra}`;
  }
  if (isBox(o))
    return `${name}: ${L(o.width)} wide, ${L(o.height)} high, left edge at ${L(o.x)}, bottom at ${L(o.y)}`;
  return name;
}

/** The photo backdrop in words: which photo, whether it is drawn, and where it lies. */
export function describeBackdrop(
  b: Backdrop,
  photos: EnclosurePhotos | null,
  image: BackdropImageState | null,
  u: LengthUnit,
): string {
  const photo = photos?.items.find((p) => p.id === b.uploadId);
  if (!photo || image === 'unavailable') return 'Photo backdrop: photo not available.';
  const name = `Photo backdrop “${photo.name}”`;
  if (!b.visible) return `${name}: hidden.`;
  const L = (v: number) => formatLength(v, u);
  const place = `${L(b.width)} wide, ${L(b.height)} high, left edge at ${L(b.x)}, bottom at ${L(b.y)}`;
  const loading = image === 'ready' ? '' : ' (loading)';
  return `${name} under the design at ${Math.round(b.opacity * 100)} % opacity${loading}: ${place}.`;
}

/** The ruler's reading, for screen readers (the canvas shows the same as a label). */
export function rulerSentence(ruler: Parameters<typeof rulerParts>[0], u: LengthUnit): string {
  const r = rulerParts(ruler, u);
  return `Ruler: ${r.length} (${r.across} across, ${r.up} up), at ${r.angle}.`;
}

/** What a highlighted finding marks on the canvas, in words: its surfaces or its objects. */
export function describeHighlight(
  title: string,
  shape: HighlightShape,
  objects: readonly DesignObject[],
  u: LengthUnit,
): string {
  const L = (v: number) => formatLength(v, u);
  const parts = [
    ...shape.segments.map((s) => `the surface from (${L(s.x1)}, ${L(s.y1)}) to (${L(s.x2)}, ${L(s.y2)})`),
    ...shape.objectIds.map((id) => {
      const o = objects.find((x) => x.id === id);
      return o ? `${kindOf(o.type).name} ${o.name ? `“${o.name}”` : o.id}` : id;
    }),
  ];
  return `Shown on the canvas: ${title} — ${parts.join('; ')}.`;
}

export function ObjectSummary({
  id,
  highlight,
  basking,
  meshRisks = null,
}: {
  id: string;
  /** The finding whose place is marked on the canvas, if any. */
  highlight?: { findingId: string; title: string; shape: HighlightShape } | null;
  /** The basking marks' finding and a climber's mesh, which the canvas marks too. */
  basking?: Finding;
  meshRisks?: MeshRisk[] | null;
}) {
  const { store } = useCommandContext();
  const design = useStudio(store, (s) => s.history.present);
  const selection = useStudio(store, (s) => s.session.selection);
  const unit = useStudio(store, (s) => s.session.lengthUnit);
  const ruler = useStudio(store, (s) => s.session.ruler);
  const photos = useStudio(store, (s) => s.session.photos);
  const image = useStudio(store, (s) => s.session.backdropImage);
  const adjusting = useStudio(store, (s) => s.session.backdropAdjust);
  const e = design.enclosure;
  const marks = husbandrySentences(
    basking,
    meshRisks,
    new Map(design.objects.map((o) => [o.id, o.name ? `“${o.name}”` : o.id])),
    unit,
  );
  return (
    <div id={id} className="sr-only" data-testid="object-summary" data-highlight={highlight?.findingId ?? ''}>
      <p>
        Enclosure {formatLength(e.width, unit)} wide, {formatLength(e.height, unit)} high,{' '}
        {formatLength(e.depth, unit)} deep, side view {formatLength(sectionDepth(design), unit)} from the
        front; {design.objects.length} objects
        {selection.length ? `, ${selection.length} selected` : ''}.
      </p>
      <ul>
        {design.objects.map((o) => (
          <li key={o.id}>
            {describeObject(o, unit, design)}
            {selection.includes(o.id) ? ' (selected)' : ''}
          </li>
        ))}
        {(design.probes ?? []).map((p, i) => (
          <li key={p.id}>
            Probe {p.label ?? i + 1} at {formatLength(p.x, unit)}, {formatLength(p.y, unit)} up
          </li>
        ))}
      </ul>
      {design.backdrop && (
        <p data-testid="backdrop-reading">
          {describeBackdrop(
            design.backdrop,
            photos,
            image?.uploadId === design.backdrop.uploadId ? image.state : null,
            unit,
          )}
          {adjusting ? ' Adjusting the photo: drags move it or stretch it by its corners.' : ''}
        </p>
      )}
      {ruler && <p data-testid="ruler-reading">{rulerSentence(ruler, unit)}</p>}
      {marks.length > 0 && <p data-testid="husbandry-reading">{marks.join(' ')}</p>}
      {highlight && <p>{describeHighlight(highlight.title, highlight.shape, design.objects, unit)}</p>}
    </div>
  );
}
