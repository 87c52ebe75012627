import type { ReactNode } from 'react';

/**
 * The frame the line charts share (a lamp's readings and decay, a lamp type's measured ageing): a figure
 * with an SVG that names itself to screen readers, the horizontal and vertical grid with their tick
 * labels, the two axes and their titles, whatever the chart draws, and a legend below. The chart keeps
 * its scales and marks; the frame keeps one look of grid, axes and legend.
 */
export type Margin = { left: number; right: number; top: number; bottom: number };

/** A tick: where it falls along its axis (px), its label, a key, and (x only) how the label is anchored. */
export type Tick = {
  at: number;
  label: ReactNode;
  key: string | number;
  anchor?: 'start' | 'middle' | 'end';
};

export function PlotFrame({
  width: W,
  height: H,
  margin: M,
  id,
  title,
  desc,
  xTicks,
  yTicks,
  xTitle,
  yTitle,
  yTitleX = 16,
  legend,
  children,
}: {
  width: number;
  height: number;
  margin: Margin;
  /** Prefix of the title and description ids, and the figure's test id (`${id}-chart`). */
  id: string;
  title: string;
  desc: ReactNode;
  xTicks: Tick[];
  yTicks: Tick[];
  xTitle: ReactNode;
  yTitle: ReactNode;
  /** Where the rotated y title sits from the left edge. */
  yTitleX?: number;
  legend: ReactNode;
  children: ReactNode;
}) {
  const titleId = `${id}-chart-title`;
  const descId = `${id}-chart-desc`;
  return (
    <figure className="rounded-lg border border-basalt-200 bg-white p-3" data-testid={`${id}-chart`}>
      <svg
        viewBox={`0 0 ${W} ${H}`}
        className="h-auto w-full"
        role="img"
        aria-labelledby={`${titleId} ${descId}`}
        fontFamily="inherit"
      >
        <title id={titleId}>{title}</title>
        <desc id={descId}>{desc}</desc>
        {yTicks.map((t) => (
          <g key={`y${t.key}`}>
            <line x1={M.left} x2={W - M.right} y1={t.at} y2={t.at} stroke="#e6e8e3" />
            <text x={M.left - 8} y={t.at} dy="0.32em" textAnchor="end" fontSize="12" fill="#4a5143">
              {t.label}
            </text>
          </g>
        ))}
        {xTicks.map((t) => (
          <g key={`x${t.key}`}>
            <line x1={t.at} x2={t.at} y1={M.top} y2={H - M.bottom} stroke="#f5f6f4" />
            <text
              x={t.at}
              y={H - M.bottom + 18}
              textAnchor={t.anchor ?? 'middle'}
              fontSize="12"
              fill="#4a5143"
            >
              {t.label}
            </text>
          </g>
        ))}
        <line x1={M.left} x2={W - M.right} y1={H - M.bottom} y2={H - M.bottom} stroke="#7e8673" />
        <line x1={M.left} x2={M.left} y1={M.top} y2={H - M.bottom} stroke="#7e8673" />
        <text x={(M.left + W - M.right) / 2} y={H - 10} textAnchor="middle" fontSize="12" fill="#3b4036">
          {xTitle}
        </text>
        <text
          transform={`translate(${yTitleX} ${(M.top + H - M.bottom) / 2}) rotate(-90)`}
          textAnchor="middle"
          fontSize="12"
          fill="#3b4036"
        >
          {yTitle}
        </text>
        {children}
      </svg>
      <figcaption className="mt-2 flex flex-wrap gap-x-5 gap-y-1 text-caption text-basalt-600">
        {legend}
      </figcaption>
    </figure>
  );
}

type XY = { x: number; y: number };

/** An SVG path through the points, in order. */
export const linePath = (points: XY[]) =>
  points.map((p, i) => `${i ? 'L' : 'M'}${p.x.toFixed(1)},${p.y.toFixed(1)}`).join('');

/** A closed band: along the upper edge, back along the lower one; null with fewer than two points. */
export function bandPath(points: { x: number; hi: number; lo: number }[]): string | null {
  if (points.length < 2) return null;
  return (
    linePath(points.map((p) => ({ x: p.x, y: p.hi }))) +
    [...points]
      .reverse()
      .map((p) => `L${p.x.toFixed(1)},${p.lo.toFixed(1)}`)
      .join('') +
    'Z'
  );
}

/** One legend entry: a small drawing of the mark, then what it means. */
export function LegendItem({ swatch, children }: { swatch: ReactNode; children: ReactNode }) {
  return (
    <span className="inline-flex items-center gap-1.5">
      {swatch}
      {children}
    </span>
  );
}

/** A legend swatch of a line (solid or dashed). */
export function LineSwatch({ stroke, width = 2, dash }: { stroke: string; width?: number; dash?: string }) {
  return (
    <svg width="22" height="12" aria-hidden="true">
      <line x1="1" x2="21" y1="6" y2="6" stroke={stroke} strokeWidth={width} strokeDasharray={dash} />
    </svg>
  );
}

/** A legend swatch of a point mark: any SVG drawn in a 12 px square. */
export function MarkSwatch({ children }: { children: ReactNode }) {
  return (
    <svg width="12" height="12" aria-hidden="true">
      {children}
    </svg>
  );
}
