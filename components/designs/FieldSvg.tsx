import type { ContourBand, Design } from '@/simulation';
import { bandLabel, type FieldScale } from '@/lib/variants/scale';

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
  const top = Math.max(h, ...design.objects.map((o) => (o.type === 'lamp' ? o.y + 4 : 0)));
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
            d={b.polygons
              .map((poly) => poly.map((ring) => `M${ring.map((p) => p.join(',')).join('L')}Z`).join(''))
              .join('')}
            fill={colorOf(b.lo)}
            fillRule="evenodd"
            stroke={colorOf(b.lo)}
            strokeWidth={stroke * 0.3}
          />
        ))}
        {design.objects.map((o) => {
          switch (o.type) {
            case 'ledge':
              return (
                <rect
                  key={o.id}
                  x={o.x}
                  y={o.y}
                  width={o.width}
                  height={o.height}
                  fill="#7a6e64"
                  stroke="#1c1f1a"
                  strokeWidth={stroke}
                />
              );
            case 'hide':
              return (
                <rect
                  key={o.id}
                  x={o.x}
                  y={o.y}
                  width={o.width}
                  height={o.height}
                  fill="none"
                  stroke="#1c1f1a"
                  strokeWidth={stroke * 1.5}
                />
              );
            case 'foliage':
              return (
                <rect
                  key={o.id}
                  x={o.x}
                  y={o.y}
                  width={o.width}
                  height={o.height}
                  fill="#3e8546"
                  fillOpacity={0.25}
                  stroke="#27552e"
                  strokeWidth={stroke}
                  strokeDasharray={`${stroke * 4} ${stroke * 2}`}
                />
              );
            case 'perch':
              return (
                <line
                  key={o.id}
                  x1={o.x1}
                  y1={o.y1}
                  x2={o.x2}
                  y2={o.y2}
                  stroke="#4a3b2a"
                  strokeWidth={o.thickness}
                  strokeLinecap="round"
                />
              );
            case 'screen':
              return (
                <line
                  key={o.id}
                  x1={o.x1}
                  y1={o.y1}
                  x2={o.x2}
                  y2={o.y2}
                  stroke="#1c1f1a"
                  strokeWidth={stroke * 1.5}
                  strokeDasharray={`${stroke * 4} ${stroke * 3}`}
                />
              );
            case 'glass':
              return (
                <line
                  key={o.id}
                  x1={o.x1}
                  y1={o.y1}
                  x2={o.x2}
                  y2={o.y2}
                  stroke="#3377c5"
                  strokeWidth={stroke * 2}
                />
              );
            case 'lamp':
              return o.form === 'tube' ? (
                <line
                  key={o.id}
                  x1={o.x - (o.length ?? 0) / 2}
                  y1={o.y}
                  x2={o.x + (o.length ?? 0) / 2}
                  y2={o.y}
                  stroke="#d18f2b"
                  strokeWidth={stroke * 5}
                  strokeLinecap="round"
                />
              ) : (
                <circle
                  key={o.id}
                  cx={o.x}
                  cy={o.y}
                  r={2}
                  fill="#d18f2b"
                  stroke="#1c1f1a"
                  strokeWidth={stroke}
                />
              );
          }
        })}
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
      <span className="font-medium">
        {scale.label}
        {scale.unit ? ` (${scale.unit})` : ''}
      </span>
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
