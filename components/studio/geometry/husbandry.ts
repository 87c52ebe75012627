// The husbandry marks of the canvas in words: the label each climbable mesh carries, and the sentences
// the screen-reader summary gives for the basking marks and the mesh (the same facts the canvas draws).
import { formatLengthRounded, type LengthUnit } from '@/shared/units';
import { segmentsCentreX as centreX, type MeshRisk } from '@/simulation';
import type { Finding } from '../fields/engineTypes';
import type { Rect } from './camera';
import { overlapArea } from './labels';

const near = (xs: { lampId: string; distanceCm: number }[], u: LengthUnit) =>
  xs.map((x) => `${x.lampId}, ${formatLengthRounded(x.distanceCm, u)}`).join('; ');

/** The label of a climber's mesh on the canvas: what makes it a risk, or just that it is climbable. */
export function meshLabel(r: MeshRisk, u: LengthUnit): string {
  const parts = [
    ...(r.burn.length ? [`burn risk (${near(r.burn, u)})`] : []),
    ...(r.uv.length ? [`UV at the eyes (${near(r.uv, u)})`] : []),
  ];
  return parts.length ? `Climbable mesh: ${parts.join(', ')}` : 'Climbable mesh';
}

/** What the canvas marks for the basking spot and a climber's mesh, one sentence each. */
export function husbandrySentences(
  basking: Finding | undefined,
  risks: MeshRisk[] | null,
  names: Map<string, string>,
  u: LengthUnit,
): string[] {
  const out: string[] = [];
  const zones = basking?.basking;
  if (zones) {
    const uv = centreX(zones.uv);
    const heat = centreX(zones.heat);
    const both = centreX(zones.both);
    if (both !== null) {
      out.push(`UV and heat meet on the basking spot, around ${formatLengthRounded(both, u)} from the left.`);
    } else if (uv !== null && heat !== null) {
      out.push(
        `UV and heat apart: no spot gets both. The UV range falls around ${formatLengthRounded(uv, u)} from the left, the basking heat around ${formatLengthRounded(heat, u)}.`,
      );
    } else if (uv !== null || heat !== null) {
      out.push(
        uv !== null
          ? `Only the UV range is marked, around ${formatLengthRounded(uv, u)} from the left: no surface gets the basking heat.`
          : `Only the basking heat is marked, around ${formatLengthRounded(heat!, u)} from the left: no surface gets the UV range.`,
      );
    }
  }
  for (const r of risks ?? []) {
    const name = names.get(r.screenId) ?? r.screenId;
    out.push(`${meshLabel(r, u)} — ${name}${r.burn.length || r.uv.length ? '' : ': no lamp within reach'}.`);
  }
  return out;
}

/** Space (px) between two stacked mark labels. */
export const MARK_LABEL_GAP_PX = 2;

/** A basking-mark label to place: its box at its own mark, and where it would start below the surface. */
export interface MarkLabelBox extends Rect {
  /** The top a label takes when it goes below its surface instead (just under the surface's line). */
  belowY: number;
}

/** Whether label `a`, moved to the top `y`, covers any of `b`. */
const meets = (a: Rect, y: number, b: Rect) => overlapArea({ ...a, y }, b) > 0;

/**
 * The y of each basking-mark label, so none covers another or a lamp's label: the marks of the UV range,
 * the basking heat and both lie a few pixels apart over the same surface, so their labels, each at its
 * own mark, would print on top of one another. Taken in order; a label that meets one already placed
 * moves up above it until it meets none. Where that spot covers a label in `avoid` (the lamps' labels,
 * placed first: a lamp hanging low over a perch), the label goes below its surface instead, moving down
 * past whatever it meets there, unless that takes it three labels' height or more below the surface
 * (then it keeps the spot above). Labels apart from each other and from the lamps' labels keep their own
 * place.
 */
export function stackMarkLabels(boxes: readonly MarkLabelBox[], avoid: readonly Rect[] = []): number[] {
  const placed: Rect[] = [];
  const hitIn = (list: readonly Rect[], b: Rect, y: number) => list.find((p) => meets(b, y, p));
  return boxes.map((b) => {
    let y = b.y;
    for (let hit = hitIn(placed, b, y); hit; hit = hitIn(placed, b, y))
      y = hit.y - b.height - MARK_LABEL_GAP_PX;
    if (hitIn(avoid, b, y)) {
      const all = [...placed, ...avoid];
      let down = b.belowY;
      for (let hit = hitIn(all, b, down); hit; hit = hitIn(all, b, down))
        down = hit.y + hit.height + MARK_LABEL_GAP_PX;
      // Pushed down past a lamp's label means the label went through it: only a clear spot near the
      // surface is better than the one above.
      if (down - b.belowY < 3 * (b.height + MARK_LABEL_GAP_PX)) y = down;
    }
    placed.push({ ...b, y });
    return y;
  });
}
