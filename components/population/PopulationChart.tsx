import { scaleLinear } from 'd3-scale';
import type { PopulationCurve } from '@/lib/population/fit';

/**
 * A lamp type's measured curve against the catalogue's, as plain SVG: the share of the catalogue's new
 * output (bare lamp, 30 cm) over months of ordinary use, every usable reading as a point (enclosure lamps
 * round, counter lamps square, so the two are told apart without colour), the fitted curve with its 95 %
 * band, and the catalogue's curve dashed. A table beside it gives the same figures.
 */
const W = 720;
const H = 320;
const M = { left: 56, right: 16, top: 16, bottom: 48 };

export type PopulationView = PopulationCurve;

const pct = (v: number) => `${Math.round(v * 100)} %`;

/** The months the chart and its table span: past the oldest reading, at least a year, at most five. */
export function chartMonths(view: PopulationView): number {
  const oldest = Math.max(0, ...view.points.map((p) => p.months));
  return Math.min(60, Math.max(12, Math.ceil((oldest + 3) / 6) * 6));
}

/** The rows of the table beside the chart: every three months up to the chart's end. */
export function tableRows(view: PopulationView) {
  const end = chartMonths(view);
  const at = (list: { months: number; share: number }[], m: number) => {
    // The sampled curves are on even grids that include these months; interpolate to be safe.
    const i = list.findIndex((c) => c.months >= m);
    if (i <= 0) return list[0];
    const a = list[i - 1]!;
    const b = list[i]!;
    const k = (m - a.months) / (b.months - a.months);
    return { ...b, months: m, share: a.share + (b.share - a.share) * k };
  };
  const rows = [];
  for (let m = 0; m <= end; m += end > 24 ? 6 : 3) {
    const c = view.ok ? (at(view.curve, m) as (typeof view.curve)[number] | undefined) : undefined;
    rows.push({
      months: m,
      measured: c ? c.share : null,
      lo: c && 'lo' in c ? c.lo : null,
      hi: c && 'hi' in c ? c.hi : null,
      catalogue: at(view.catalogue, m)?.share ?? null,
    });
  }
  return rows;
}

export function PopulationChart({ view, typeName }: { view: PopulationView; typeName: string }) {
  const end = chartMonths(view);
  const x = scaleLinear()
    .domain([0, end])
    .range([M.left, W - M.right]);
  const maxY = Math.max(
    1.1,
    ...view.points.map((p) => p.share),
    ...(view.ok ? view.curve.filter((c) => c.months <= end).map((c) => c.hi) : []),
  );
  const y = scaleLinear()
    .domain([0, Math.min(2, maxY * 1.05)])
    .nice()
    .range([H - M.bottom, M.top]);
  const cy = (v: number) => y(Math.min(v, y.domain()[1]!));
  const line = (list: { months: number; share: number }[]) =>
    list
      .filter((c) => c.months <= end)
      .map((c, i) => `${i ? 'L' : 'M'}${x(c.months).toFixed(1)},${cy(c.share).toFixed(1)}`)
      .join('');
  const inRange = view.ok ? view.curve.filter((c) => c.months <= end) : [];
  const bandPath =
    inRange.length > 1
      ? inRange.map((c, i) => `${i ? 'L' : 'M'}${x(c.months).toFixed(1)},${cy(c.hi).toFixed(1)}`).join('') +
        [...inRange]
          .reverse()
          .map((c) => `L${x(c.months).toFixed(1)},${cy(c.lo).toFixed(1)}`)
          .join('') +
        'Z'
      : null;
  const titleId = 'population-chart-title';
  const descId = 'population-chart-desc';
  return (
    <figure className="rounded-lg border border-basalt-200 bg-white p-3" data-testid="population-chart">
      <svg
        viewBox={`0 0 ${W} ${H}`}
        className="h-auto w-full"
        role="img"
        aria-labelledby={`${titleId} ${descId}`}
        fontFamily="inherit"
      >
        <title id={titleId}>{`${typeName}: measured ageing against the catalogue`}</title>
        <desc id={descId}>
          {view.readings} readings of {view.lamps} lamps as a share of the catalogue’s new output at 30 cm, by
          months of use at 12 hours a day
          {view.ok ? ', the curve fitted to them with its 95 % band,' : ','} and the catalogue’s curve. The
          table beside the chart gives the same figures.
        </desc>
        {y.ticks(5).map((t) => (
          <g key={`y${t}`}>
            <line x1={M.left} x2={W - M.right} y1={y(t)} y2={y(t)} stroke="#e6e8e3" />
            <text x={M.left - 8} y={y(t)} dy="0.32em" textAnchor="end" fontSize="12" fill="#4a5143">
              {pct(t)}
            </text>
          </g>
        ))}
        {x.ticks(Math.min(10, end / 3)).map((t) => (
          <g key={`x${t}`}>
            <line x1={x(t)} x2={x(t)} y1={M.top} y2={H - M.bottom} stroke="#f5f6f4" />
            <text x={x(t)} y={H - M.bottom + 18} textAnchor="middle" fontSize="12" fill="#4a5143">
              {t}
            </text>
          </g>
        ))}
        <line x1={M.left} x2={W - M.right} y1={H - M.bottom} y2={H - M.bottom} stroke="#7e8673" />
        <line x1={M.left} x2={M.left} y1={M.top} y2={H - M.bottom} stroke="#7e8673" />
        <text x={(M.left + W - M.right) / 2} y={H - 10} textAnchor="middle" fontSize="12" fill="#3b4036">
          Months of use (12 hours a day)
        </text>
        <text
          transform={`translate(14 ${(M.top + H - M.bottom) / 2}) rotate(-90)`}
          textAnchor="middle"
          fontSize="12"
          fill="#3b4036"
        >
          Share of a new lamp (catalogue), 30 cm
        </text>
        {bandPath && <path d={bandPath} fill="#c2e0f3" fillOpacity="0.6" data-testid="population-band" />}
        <path
          d={line(view.catalogue)}
          fill="none"
          stroke="#5f6756"
          strokeWidth="2"
          strokeDasharray="7 5"
          data-testid="catalogue-curve"
        />
        {view.ok && (
          <path
            d={line(view.curve)}
            fill="none"
            stroke="#2b63b4"
            strokeWidth="2.5"
            data-testid="population-curve"
          />
        )}
        {view.points
          .filter((p) => p.months <= end)
          .map((p, i) =>
            p.source === 'counter' ? (
              <rect
                key={i}
                x={x(p.months) - 4}
                y={cy(p.share) - 4}
                width="8"
                height="8"
                fill="#d18f2b"
                stroke="#633a1d"
                strokeWidth="1.2"
              />
            ) : (
              <circle
                key={i}
                cx={x(p.months)}
                cy={cy(p.share)}
                r="4.5"
                fill="#8fb573"
                stroke="#3c5a26"
                strokeWidth="1.2"
              />
            ),
          )}
      </svg>
      <figcaption className="mt-2 flex flex-wrap gap-x-5 gap-y-1 text-caption text-basalt-600">
        <span className="inline-flex items-center gap-1.5">
          <svg width="12" height="12" aria-hidden="true">
            <circle cx="6" cy="6" r="4.5" fill="#8fb573" stroke="#3c5a26" />
          </svg>
          Enclosure lamps ({view.enclosureLamps})
        </span>
        <span className="inline-flex items-center gap-1.5">
          <svg width="12" height="12" aria-hidden="true">
            <rect x="2" y="2" width="8" height="8" fill="#d18f2b" stroke="#633a1d" />
          </svg>
          Counter lamps ({view.counterLamps})
        </span>
        {view.ok && (
          <span className="inline-flex items-center gap-1.5">
            <svg width="22" height="12" aria-hidden="true">
              <line x1="1" x2="21" y1="6" y2="6" stroke="#2b63b4" strokeWidth="2.5" />
            </svg>
            Measured curve, with its 95 % band
          </span>
        )}
        <span className="inline-flex items-center gap-1.5">
          <svg width="22" height="12" aria-hidden="true">
            <line x1="1" x2="21" y1="6" y2="6" stroke="#5f6756" strokeWidth="2" strokeDasharray="5 3" />
          </svg>
          Catalogue’s curve
        </span>
      </figcaption>
    </figure>
  );
}

/** The chart's figures as a table, for those who prefer numbers (and screen readers). */
export function PopulationTable({ view }: { view: PopulationView }) {
  const rows = tableRows(view);
  return (
    <table className="w-full text-left text-body" data-testid="population-table">
      <caption className="mb-1 text-left text-caption text-basalt-600">
        Share of a new lamp’s output (catalogue figure, bare, 30 cm) by months of use
      </caption>
      <thead>
        <tr className="border-b border-basalt-200 text-caption text-basalt-600">
          <th scope="col" className="py-1 pr-2 font-medium">
            Months
          </th>
          <th scope="col" className="py-1 pr-2 font-medium">
            Measured
          </th>
          <th scope="col" className="py-1 pr-2 font-medium">
            95 % band
          </th>
          <th scope="col" className="py-1 font-medium">
            Catalogue
          </th>
        </tr>
      </thead>
      <tbody>
        {rows.map((r) => (
          <tr key={r.months} className="border-b border-basalt-100">
            <th scope="row" className="py-1 pr-2 font-normal">
              {r.months}
            </th>
            <td className="py-1 pr-2">{r.measured === null ? '—' : pct(r.measured)}</td>
            <td className="py-1 pr-2">
              {r.lo === null || r.hi === null ? '—' : `${pct(r.lo)}–${pct(r.hi)}`}
            </td>
            <td className="py-1">{r.catalogue === null ? '—' : pct(r.catalogue)}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
