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
  const top = drawingTop(design);
  const pad = 3;
  const colorOf = (lo: number) => {
    const k = scale.thresholds.indexOf(lo);
    return scale.colors[k >= 0 ? k : 0] ?? '#ccc';
  };
  const stroke = Math.max(w, top) / 400;
  return (
    <svg
      viewBox={`${-pad} ${-top - pad} ${w + 2 * pad} ${top + 2 * pad}`}
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
