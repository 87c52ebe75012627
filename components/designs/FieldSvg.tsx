import type { ContourBand, Design } from '@/simulation';
import { bandLabel, type FieldScale } from '@/shared/field-scale';
import { bandPath } from '@/shared/designs/svg-path';
import { DesignShapes, drawingTop, fieldLook } from './DesignShapes';

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
  const { top, viewBox } = fieldBox(design);
  const colorOf = (lo: number) => {
    const k = scale.thresholds.indexOf(lo);
    return scale.colors[k >= 0 ? k : 0] ?? '#ccc';
  };
  const stroke = Math.max(w, top) / 400;
  return (
    <svg
      xmlns="http://www.w3.org/2000/svg"
      viewBox={viewBox}
      role="img"
      aria-label={title}
      className="h-auto w-full"
      preserveAspectRatio="xMidYMid meet"
    >
      <title>{title}</title>
      <g transform="scale(1,-1)">
        <rect x={0} y={0} width={w} height={h} fill={scale.colors[0]} />
        {bands.map((b) => (
          <path
            key={b.lo}
            d={bandPath(b.polygons)}
            fill={colorOf(b.lo)}
            fillRule="evenodd"
            stroke={colorOf(b.lo)}
            strokeWidth={stroke * 0.3}
          />
        ))}
        <DesignShapes objects={design.objects} look={fieldLook(stroke)} />
        <rect x={0} y={0} width={w} height={h} fill="none" stroke="#1c1f1a" strokeWidth={stroke * 2} />
        {markers.map((m) => (
          <g key={m.label}>
            <circle cx={m.x} cy={m.y} r={stroke * 6} fill="white" stroke="#1c1f1a" strokeWidth={stroke * 1.5}>
              <title>{m.label}</title>
            </circle>
          </g>
        ))}
      </g>
    </svg>
  );
}

const PAD = 3;

/** The drawing's extent in design centimetres: the enclosure and the lamps above it, with a margin. */
function fieldBox(design: Design) {
  const top = drawingTop(design);
  const width = design.enclosure.width + 2 * PAD;
  const height = top + 2 * PAD;
  return { top, width, height, viewBox: `${-PAD} ${-top - PAD} ${width} ${height}` };
}

/**
 * A field picture served as its own file (FieldSvg's drawing, cacheable): an image with its text
 * alternative and its intrinsic size, so the page keeps its layout while the picture loads.
 */
export function FieldImage({ design, src, alt }: { design: Design; src: string; alt: string }) {
  const { width, height } = fieldBox(design);
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
