import { scaleBand, scaleLinear } from 'd3-scale';

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
  const H = 260;
  const M = { left: 48, right: 12, top: 12, bottom: bars.length > 8 ? 64 : 44 };
  const x = scaleBand()
    .domain(bars.map((b) => b.key))
    .range([M.left, W - M.right])
    .padding(0.2);
  const max = share ? 1 : Math.max(1, ...bars.map((b) => b.value));
  const y = scaleLinear()
    .domain([0, max])
    .nice()
    .range([H - M.bottom, M.top]);
  const fmt = (v: number) => (share ? `${Math.round(v * 100)} %` : String(v));
  const every = Math.ceil(bars.length / 13);
  return (
    <div className="grid gap-4 lg:grid-cols-[3fr_2fr]" data-testid={id}>
      <figure className="rounded-lg border border-basalt-200 bg-white p-3">
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
                <text
                  x={(x(b.key) ?? 0) + x.bandwidth() / 2}
                  y={H - M.bottom + 14}
                  textAnchor={bars.length > 8 ? 'end' : 'middle'}
                  transform={
                    bars.length > 8
                      ? `rotate(-40 ${(x(b.key) ?? 0) + x.bandwidth() / 2} ${H - M.bottom + 14})`
                      : undefined
                  }
                  fontSize="12"
                  fill="#4a5143"
                >
                  {b.label}
                </text>
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
