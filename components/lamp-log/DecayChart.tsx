import { scaleLinear, scaleUtc } from 'd3-scale';
import { formatMoment } from '@/lib/time/format';
import type { LampDetail } from '@/lib/lamp-log/queries';
import {
  bandPath,
  LegendItem,
  LineSwatch,
  linePath,
  MarkSwatch,
  PlotFrame,
} from '@/components/charts/PlotFrame';
import { formatDay, formatMonthYear, formatValue, tickLabelAnchor, UNIT_NAME } from './format';

/**
 * Readings over time with the fitted decay curve and its 95 % band, drawn as plain SVG. Every value is
 * "at 30 cm": readings taken at other distances are brought there with the engine's geometry, so points
 * and curve compare directly. The species' need at the basking spot is shown at 30 cm too.
 */
const W = 760;
const H = 340;
const M = { left: 64, right: 20, top: 20, bottom: 52 };
const DAY_MS = 86_400_000;

type Chart = LampDetail['chart'];

/** Working-life readings filled; burn-in readings hollow; readings that cannot be used grey. */
const POINT_LOOK = {
  fit: { fill: '#d18f2b', stroke: '#633a1d' },
  'burn-in': { fill: '#ffffff', stroke: '#8a5a1f' },
  excluded: { fill: '#d4d4d4', stroke: '#737373' },
} as const;

export function DecayChart({
  chart,
  fallsBelowOn,
  title,
  zone,
}: {
  chart: Chart;
  fallsBelowOn: string | null;
  title: string;
  /** The viewer's time zone (a server component: the moments are formatted here, not in the browser). */
  zone: string;
}) {
  const unit = chart.unit ?? 'uvb';
  const start = Date.parse(`${chart.firstUsedOn}T00:00:00Z`);
  const lastDay = Math.max(
    chart.todayDays,
    ...chart.points.map((p) => p.days),
    ...chart.curve.map((c) => c.days),
    30,
  );
  const maxY = Math.max(
    1e-9,
    ...chart.points.map((p) => p.value),
    ...chart.curve.map((c) => Math.min(c.hi ?? c.value, c.value * 3)),
    chart.needAt30 ?? 0,
  );
  const x = scaleUtc()
    .domain([new Date(start), new Date(start + lastDay * DAY_MS)])
    .range([M.left, W - M.right]);
  // The same mapping on milliseconds: the curve and its band place hundreds of points, and a Date for
  // each costs the server real time (Next wraps the Date constructor while it renders). The time scale
  // is kept for its calendar ticks.
  const xMs = scaleLinear()
    .domain([start, start + lastDay * DAY_MS])
    .range([M.left, W - M.right]);
  const xd = (days: number) => xMs(start + days * DAY_MS);
  const y = scaleLinear()
    .domain([0, maxY * 1.08])
    .nice()
    .range([H - M.bottom, M.top]);
  const clampY = (v: number) => y(Math.min(v, y.domain()[1]!));
  // A reading's mark to a tenth of a unit, as the curve's path is drawn (a shift of at most 0.05 of a
  // unit): a lamp logged for years has hundreds, each sent as HTML and again as the page's data, and
  // sixteen-digit coordinates were about a tenth of each.
  const tenth = (v: number) => Math.round(v * 10) / 10;

  const curvePath = linePath(chart.curve.map((c) => ({ x: xd(c.days), y: clampY(c.value) })));
  const bandPathD = bandPath(
    chart.curve
      .filter((c) => c.lo !== null && c.hi !== null)
      .map((c) => ({ x: xd(c.days), hi: clampY(c.hi!), lo: clampY(c.lo!) })),
  );
  const fitted = chart.certainty === 'fitted';
  const xTicks = x.ticks(Math.min(8, Math.max(2, Math.round(lastDay / 60))));
  const yTicks = y.ticks(5);
  const belowDays = fallsBelowOn ? (Date.parse(`${fallsBelowOn}T00:00:00Z`) - start) / DAY_MS : null;

  const legend = (
    <>
      <LegendItem
        swatch={
          <MarkSwatch>
            <circle cx="6" cy="6" r="4.5" fill="#d18f2b" stroke="#633a1d" />
          </MarkSwatch>
        }
      >
        Readings, bare lamp at 30 cm
      </LegendItem>
      {chart.points.some((p) => p.use === 'burn-in') && (
        <LegendItem
          swatch={
            <MarkSwatch>
              <circle cx="6" cy="6" r="4.5" {...POINT_LOOK['burn-in']} />
            </MarkSwatch>
          }
        >
          During burn-in (fitted apart)
        </LegendItem>
      )}
      {chart.points.some((p) => p.use === 'excluded') && (
        <LegendItem
          swatch={
            <MarkSwatch>
              <circle cx="6" cy="6" r="4.5" {...POINT_LOOK.excluded} />
            </MarkSwatch>
          }
        >
          Not used (see the outlook)
        </LegendItem>
      )}
      <LegendItem swatch={<LineSwatch stroke="#2b63b4" width={2.5} dash={fitted ? undefined : '5 3'} />}>
        {fitted ? 'Fitted decay' : 'Curve (uncertain: few readings)'}
      </LegendItem>
      {bandPathD && (
        <LegendItem
          swatch={<span className="inline-block h-3 w-5 rounded-sm bg-sky-200" aria-hidden="true" />}
        >
          95 % band of the fit
        </LegendItem>
      )}
      {chart.needAt30 !== null && (
        <LegendItem swatch={<LineSwatch stroke="#c53c27" width={1.5} dash="4 3" />}>
          Need at the basking spot{chart.needLabel ? `: ${chart.needLabel}` : ''}
        </LegendItem>
      )}
    </>
  );

  return (
    <PlotFrame
      width={W}
      height={H}
      margin={M}
      id="decay"
      title={title}
      desc={
        <>
          {chart.points.length} readings brought to the bare lamp at 30 cm, the fitted curve
          {bandPathD ? ' with its 95 % band' : ''}
          {chart.needAt30 !== null ? ', and the species’ need at the basking spot' : ''}.
        </>
      }
      yTicks={yTicks.map((t) => ({
        key: t,
        at: y(t),
        label: unit === 'uvi' ? t.toFixed(t < 10 ? 1 : 0) : t,
      }))}
      xTicks={xTicks.map((t) => ({
        key: t.getTime(),
        at: x(t),
        label: formatMonthYear(t),
        // "Sept 2027" at 12 px is about 56 px wide: keep it inside the drawing at either edge.
        anchor: tickLabelAnchor(x(t), 0, W, 30),
      }))}
      xTitle={<>Date (first use {formatDay(chart.firstUsedOn)})</>}
      yTitle={<>{UNIT_NAME[unit]} at 30 cm</>}
      legend={legend}
    >
      {/* fit: band, then curve */}
      {bandPathD && <path d={bandPathD} fill="#c2e0f3" fillOpacity="0.6" data-testid="fit-band" />}
      {curvePath && (
        <path
          d={curvePath}
          fill="none"
          stroke="#2b63b4"
          strokeWidth="2.5"
          strokeDasharray={fitted ? undefined : '7 5'}
          data-testid="fit-curve"
        />
      )}

      {/* need and today */}
      {chart.needAt30 !== null && chart.needAt30 <= y.domain()[1]! && (
        <g>
          <line
            x1={M.left}
            x2={W - M.right}
            y1={y(chart.needAt30)}
            y2={y(chart.needAt30)}
            stroke="#c53c27"
            strokeWidth="1.5"
            strokeDasharray="4 4"
          />
          <text x={W - M.right - 4} y={y(chart.needAt30) - 6} textAnchor="end" fontSize="12" fill="#a5301f">
            species’ need ({formatValue(chart.needAt30, unit)} at 30 cm)
          </text>
        </g>
      )}
      <line
        x1={xd(chart.todayDays)}
        x2={xd(chart.todayDays)}
        y1={M.top}
        y2={H - M.bottom}
        stroke="#5f6756"
        strokeDasharray="2 3"
      />
      <text x={xd(chart.todayDays) + 4} y={M.top + 12} fontSize="12" fill="#3b4036">
        today
      </text>
      {belowDays !== null && belowDays >= 0 && belowDays <= lastDay && chart.needAt30 !== null && (
        <g>
          <circle
            cx={xd(belowDays)}
            cy={y(chart.needAt30)}
            r="6"
            fill="none"
            stroke="#c53c27"
            strokeWidth="2"
          />
          <title>{`Falls below the need about ${formatDay(fallsBelowOn)}`}</title>
        </g>
      )}

      {/* readings: the usual look is set once on the group and inherited (fill, stroke and its width
          are inherited in SVG), so a mark carries colours only when it is not fitted the usual way */}
      <g {...POINT_LOOK.fit} strokeWidth="1.5">
        {chart.points.map((p, i) => (
          <g key={p.id ?? i} data-testid="reading-point">
            <circle
              cx={tenth(xd(p.days))}
              cy={tenth(clampY(p.value))}
              r="5"
              {...(p.use && p.use !== 'fit' ? POINT_LOOK[p.use] : {})}
            />
            {/* One string: React renders a <title> with several children empty on the server. */}
            <title>
              {`${formatMoment(p.takenAt, zone, 'day')}: ${formatValue(p.raw, unit)} at ${p.distanceCm} cm → ${formatValue(p.value, unit)} bare at 30 cm${p.why ? ` (${p.why})` : ''}`}
            </title>
          </g>
        ))}
      </g>
    </PlotFrame>
  );
}
