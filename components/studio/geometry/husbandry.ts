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
  /**
   * Spots beside the mark's own line (past its run's ends), tried in order when the spots above and
   * below the surface are both covered.
   */
  beside?: readonly { x: number; y: number }[];
}

/** Whether label `a`, moved to (x, y), covers any of `b`. */
const meets = (a: Rect, x: number, y: number, b: Rect) => overlapArea({ ...a, x, y }, b) > 0;

/**
 * Where each basking-mark label goes, so none covers another or a label in `avoid`: the marks of the UV
 * range, the basking heat and both lie a few pixels apart over the same surface, so their labels, each at
 * its own mark, would print on top of one another. Taken in order; a label that meets one already placed
 * moves up above it until it meets none. Where that spot covers a label in `avoid` (the lamps' labels and
 * the probes' readouts, drawn apart: a lamp hanging low over a perch, a probe beside it), the label goes
 * below its surface instead, moving down past whatever it meets there, unless that takes it three labels'
 * height or more below the surface; failing that, to the first clear spot beside the mark's line
 * (`beside`, inside `bounds` when given). A label with no clear spot is left out (null): the canvas
 * legend names every mark by its colour, and a label printed over a lamp's name or a reading hides both.
 * Labels apart from each other and from `avoid` keep their own place.
 */
export function stackMarkLabels(
  boxes: readonly MarkLabelBox[],
  avoid: readonly Rect[] = [],
  bounds?: { width: number; height: number },
): ({ x: number; y: number } | null)[] {
  const placed: Rect[] = [];
  const hitIn = (list: readonly Rect[], b: Rect, x: number, y: number) => list.find((p) => meets(b, x, y, p));
  const inside = (b: Rect, x: number, y: number) =>
    !bounds || (x >= 0 && y >= 0 && x + b.width <= bounds.width && y + b.height <= bounds.height);
  return boxes.map((b) => {
    let at: { x: number; y: number } | null = { x: b.x, y: b.y };
    for (let hit = hitIn(placed, b, b.x, at.y); hit; hit = hitIn(placed, b, b.x, at.y))
      at = { x: b.x, y: hit.y - b.height - MARK_LABEL_GAP_PX };
    if (hitIn(avoid, b, at.x, at.y)) {
      const all = [...placed, ...avoid];
      let down = b.belowY;
      for (let hit = hitIn(all, b, b.x, down); hit; hit = hitIn(all, b, b.x, down))
        down = hit.y + hit.height + MARK_LABEL_GAP_PX;
      const side = (b.beside ?? []).find((s) => !hitIn(all, b, s.x, s.y) && inside(b, s.x, s.y));
      // Pushed down past a label means the label went through it: only a clear spot near the surface
      // will do there, and one beside the line is nearer than one far below.
      if (down - b.belowY < 3 * (b.height + MARK_LABEL_GAP_PX)) at = { x: b.x, y: down };
      else at = side ? { ...side } : null;
    }
    if (at) placed.push({ ...b, ...at });
    return at;
  });
}
