import type { ContourBand } from '@/simulation';
import { bandPath } from '@/shared/designs/svg-path';

/**
 * A field's filled contour bands, each in the colour of the threshold it starts at. Each band is also
 * outlined in its own colour, so no seam of the background shows between neighbours. `scalingStroke`
 * false keeps the outline a fixed width in screen pixels however the picture is scaled.
 */
export function FieldBands({
  bands,
  thresholds,
  colors,
  strokeWidth,
  scalingStroke = true,
}: {
  bands: ContourBand[];
  thresholds: readonly number[];
  colors: readonly string[];
  strokeWidth: number;
  scalingStroke?: boolean;
}) {
  const colorOf = (lo: number) => colors[Math.max(0, thresholds.indexOf(lo))] ?? colors[0] ?? '#ccc';
  return bands.map((b) => (
    <path
      key={b.lo}
      d={bandPath(b.polygons)}
      fill={colorOf(b.lo)}
      fillRule="evenodd"
      stroke={colorOf(b.lo)}
      strokeWidth={strokeWidth}
      vectorEffect={scalingStroke ? undefined : 'non-scaling-stroke'}
    />
  ));
}
