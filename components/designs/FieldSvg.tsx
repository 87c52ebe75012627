import type { ContourBand, Design } from '@/simulation';
import { bandLabel, type FieldScale } from '@/shared/field-scale';
import { DesignShapes, fieldLook } from './DesignShapes';
import { FieldBands } from './FieldBands';
import { DesignSvg, designBox } from './DesignSvg';

/** The margin around the drawing, in design centimetres. */
const PAD = 3;

/**
 * A field as filled contour bands in SVG, with the enclosure and its objects drawn over it. Design
 * coordinates (cm, y up) are used directly; one transform flips y. No canvas, so it also renders on the
 * server (the share page) and prints sharply.
 */
export function FieldSvg({
  design,
  bands,
  scale,
  title,
  markers = [],
}: {
  design: Design;
  bands: ContourBand[];
  scale: FieldScale;
  title: string;
  markers?: { x: number; y: number; label: string }[];
}) {
  const { width: w, height: h } = design.enclosure;
  const { top } = designBox(design, PAD);
  const stroke = Math.max(w, top) / 400;
  return (
    <DesignSvg design={design} pad={PAD} label={title} title standalone>
      <rect x={0} y={0} width={w} height={h} fill={scale.colors[0]} />
      <FieldBands
        bands={bands}
        thresholds={scale.thresholds}
        colors={scale.colors}
        strokeWidth={stroke * 0.3}
      />
      <DesignShapes objects={design.objects} look={fieldLook(stroke)} />
      <rect x={0} y={0} width={w} height={h} fill="none" stroke="#1c1f1a" strokeWidth={stroke * 2} />
      {markers.map((m) => (
        <g key={m.label}>
          <circle cx={m.x} cy={m.y} r={stroke * 6} fill="white" stroke="#1c1f1a" strokeWidth={stroke * 1.5}>
            <title>{m.label}</title>
          </circle>
        </g>
      ))}
    </DesignSvg>
  );
}

/**
 * A field picture served as its own file (FieldSvg's drawing, cacheable): an image with its text
 * alternative and its intrinsic size, so the page keeps its layout while the picture loads.
 */
export function FieldImage({ design, src, alt }: { design: Design; src: string; alt: string }) {
  const { width, height } = designBox(design, PAD);
  return (
    // A drawn SVG of our own at its own cacheable address: next/image would only pass it through.
    // eslint-disable-next-line @next/next/no-img-element
    <img
      src={src}
      alt={alt}
      width={Math.round(width * 8)}
      height={Math.round(height * 8)}
      decoding="async"
      className="h-auto w-full"
    />
  );
}

/** The colour key of a scale: one swatch per band with its range. */
export function FieldLegend({ scale }: { scale: FieldScale }) {
  return (
    <div
      className="flex flex-wrap items-center gap-x-3 gap-y-1 text-caption text-basalt-700"
      aria-label={`${scale.label} colour key`}
    >
      <span className="font-medium">{scale.heading}</span>
      {scale.colors.map((c, k) => (
        <span key={k} className="inline-flex items-center gap-1">
          <span
            className="inline-block h-3 w-5 rounded-sm border border-basalt-300"
            style={{ background: c }}
          />
          {bandLabel(scale, k)}
        </span>
      ))}
    </div>
  );
}
