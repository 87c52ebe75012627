import { scaleBand, scaleLinear } from 'd3-scale';
import { LINE_HEIGHT, layoutBarLabels } from './bar-labels';

/**
 * A plain SVG bar chart with a table of the same figures beside it (for those who prefer numbers, and
 * for screen readers: the picture is labelled, the table carries the values). Bars may carry a share
 * (0–1) or a count.
 */
export type Bar = { key: string; label: string; value: number; note?: string };

export function BarChart({
  id,
  title,
  description,
  bars,
  share = false,
  valueHeader,
  labelHeader,
  noteHeader,
}: {
  id: string;
  title: string;
  description: string;
  bars: Bar[];
  /** Values are shares, drawn on a 0–100 % axis. */
  share?: boolean;
  valueHeader: string;
  labelHeader: string;
  noteHeader?: string;
}) {
  const W = 640;
  const PLOT = 204;
  const FONT = 12;
  const left = 48;
  const right = 12;
  const x = scaleBand()
    .domain(bars.map((b) => b.key))
    .range([left, W - right])
    .padding(0.2);
  // Many bars (weeks) slant their labels and name every few; few bars (technologies, age bands) keep
  // theirs level, wrapped onto lines when a name is wider than its bar's slot.
  const labels = layoutBarLabels(
    bars.map((b) => b.label),
    x.step(),
    FONT,
    { forceSlant: bars.length > 8 },
  );
  const M = { left, right, top: 12, bottom: labels.bottom };
  const H = M.top + PLOT + M.bottom;
  const max = share ? 1 : Math.max(1, ...bars.map((b) => b.value));
  const y = scaleLinear()
    .domain([0, max])
    .nice()
    .range([H - M.bottom, M.top]);
  const fmt = (v: number) => (share ? `${Math.round(v * 100)} %` : String(v));
  const every = Math.ceil(bars.length / 13);
  return (
    <div className="grid gap-4 lg:grid-cols-[3fr_2fr]" data-testid={id}>
      <figure className="self-start rounded-lg border border-basalt-200 bg-white p-3">
        <svg
          viewBox={`0 0 ${W} ${H}`}
          className="h-auto w-full"
          role="img"
          aria-labelledby={`${id}-title ${id}-desc`}
          fontFamily="inherit"
        >
          <title id={`${id}-title`}>{title}</title>
          <desc id={`${id}-desc`}>{description} The table beside the chart gives the same figures.</desc>
          {y.ticks(4).map((t) => (
            <g key={t}>
              <line x1={M.left} x2={W - M.right} y1={y(t)} y2={y(t)} stroke="#e6e8e3" />
              <text x={M.left - 6} y={y(t)} dy="0.32em" textAnchor="end" fontSize="12" fill="#4a5143">
                {fmt(t)}
              </text>
            </g>
          ))}
          {bars.map((b, i) => (
            <g key={b.key}>
              <rect
                x={x(b.key)}
                y={y(b.value)}
                width={x.bandwidth()}
                height={Math.max(0, y(0) - y(b.value))}
                fill="#2b63b4"
              >
                <title>{`${b.label}: ${fmt(b.value)}${b.note ? ` (${b.note})` : ''}`}</title>
              </rect>
              {i % every === 0 && (
                <BarLabel
                  lines={labels.lines[i]!}
                  full={b.label}
                  x={(x(b.key) ?? 0) + x.bandwidth() / 2}
                  y={H - M.bottom + 14}
                  slanted={labels.mode === 'slanted'}
                  fontSize={FONT}
                />
              )}
            </g>
          ))}
          <line x1={M.left} x2={W - M.right} y1={y(0)} y2={y(0)} stroke="#7e8673" />
        </svg>
      </figure>
      <table className="w-full self-start text-left text-body">
        <caption className="mb-1 text-left text-caption text-basalt-600">{title}</caption>
        <thead>
          <tr className="border-b border-basalt-200 text-caption text-basalt-600">
            <th scope="col" className="py-1 pr-2 font-medium">
              {labelHeader}
            </th>
            <th scope="col" className="py-1 pr-2 font-medium">
              {valueHeader}
            </th>
            {noteHeader && (
              <th scope="col" className="py-1 font-medium">
                {noteHeader}
              </th>
            )}
          </tr>
        </thead>
        <tbody>
          {bars.map((b) => (
            <tr key={b.key} className="border-b border-basalt-100">
              <th scope="row" className="py-1 pr-2 font-normal">
                {b.label}
              </th>
              <td className="py-1 pr-2">{fmt(b.value)}</td>
              {noteHeader && <td className="py-1">{b.note ?? ''}</td>}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

/** One bar's label: level and centred (on one or more lines), or slanted to end under its bar. */
function BarLabel({
  lines,
  full,
  x,
  y,
  slanted,
  fontSize,
}: {
  lines: string[];
  full: string;
  x: number;
  y: number;
  slanted: boolean;
  fontSize: number;
}) {
  const shortened = lines.length === 1 && lines[0] !== full;
  return (
    <text
      x={x}
      y={y}
      textAnchor={slanted ? 'end' : 'middle'}
      transform={slanted ? `rotate(-40 ${x} ${y})` : undefined}
      fontSize={fontSize}
      fill="#4a5143"
    >
      {shortened && <title>{full}</title>}
      {lines.length === 1
        ? lines[0]
        : lines.map((line, k) => (
            <tspan key={k} x={x} dy={k === 0 ? 0 : `${LINE_HEIGHT}em`}>
              {line}
            </tspan>
          ))}
    </text>
  );
}
