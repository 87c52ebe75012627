import { scaleLinear } from 'd3-scale';
import {
  bandPath,
  LegendItem,
  LineSwatch,
  linePath,
  MarkSwatch,
  PlotFrame,
} from '@/components/charts/PlotFrame';
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

/** A share as a whole percentage, "85 %". */
export const pct = (v: number) => `${Math.round(v * 100)} %`;

/** The months the chart and its table span: past the oldest reading, at least a year, at most five. */
export function chartMonths(view: PopulationView): number {
  const oldest = Math.max(0, ...view.points.map((p) => p.months));
  return Math.min(60, Math.max(12, Math.ceil((oldest + 3) / 6) * 6));
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
    linePath(list.filter((c) => c.months <= end).map((c) => ({ x: x(c.months), y: cy(c.share) })));
  const inRange = view.ok ? view.curve.filter((c) => c.months <= end) : [];
  const band = bandPath(inRange.map((c) => ({ x: x(c.months), hi: cy(c.hi), lo: cy(c.lo) })));
  const legend = (
    <>
      <LegendItem
        swatch={
          <MarkSwatch>
            <circle cx="6" cy="6" r="4.5" fill="#8fb573" stroke="#3c5a26" />
          </MarkSwatch>
        }
      >
        Enclosure lamps ({view.enclosureLamps})
      </LegendItem>
      <LegendItem
        swatch={
          <MarkSwatch>
            <rect x="2" y="2" width="8" height="8" fill="#d18f2b" stroke="#633a1d" />
          </MarkSwatch>
        }
      >
        Counter lamps ({view.counterLamps})
      </LegendItem>
      {view.ok && (
        <LegendItem swatch={<LineSwatch stroke="#2b63b4" width={2.5} />}>
          Measured curve, with its 95 % band
        </LegendItem>
      )}
      <LegendItem swatch={<LineSwatch stroke="#5f6756" dash="5 3" />}>Catalogue’s curve</LegendItem>
    </>
  );
  return (
    <PlotFrame
      width={W}
      height={H}
      margin={M}
      id="population"
      title={`${typeName}: measured ageing against the catalogue`}
      desc={
        <>
          {view.readings} readings of {view.lamps} lamps as a share of the catalogue’s new output at 30 cm, by
          months of use at 12 hours a day
          {view.ok ? ', the curve fitted to them with its 95 % band,' : ','} and the catalogue’s curve. The
          table beside the chart gives the same figures.
        </>
      }
      yTicks={y.ticks(5).map((t) => ({ key: t, at: y(t), label: pct(t) }))}
      xTicks={x.ticks(Math.min(10, end / 3)).map((t) => ({ key: t, at: x(t), label: t }))}
      xTitle="Months of use (12 hours a day)"
      yTitle="Share of a new lamp (catalogue), 30 cm"
      yTitleX={14}
      legend={legend}
    >
      {band && <path d={band} fill="#c2e0f3" fillOpacity="0.6" data-testid="population-band" />}
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
    </PlotFrame>
  );
}
