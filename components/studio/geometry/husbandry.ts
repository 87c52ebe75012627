// The husbandry marks of the canvas in words: the label each climbable mesh carries, and the sentences
// the screen-reader summary gives for the basking marks and the mesh (the same facts the canvas draws).
import { formatLengthRounded, type LengthUnit } from '@/shared/units';
import { segmentsCentreX as centreX, type MeshRisk } from '@/simulation';
import type { Finding } from '../fields/engineTypes';
import type { Rect } from './camera';

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

/**
 * The y of each basking-mark label, so none covers another: the marks of the UV range, the basking heat
 * and both lie a few pixels apart over the same surface, so their labels, each at its own mark, would
 * print on top of one another. Taken in order; a label that meets one already placed moves up above it
 * until it meets none. Labels apart from each other keep their own place.
 */
export function stackMarkLabels(boxes: readonly Rect[]): number[] {
  const placed: Rect[] = [];
  return boxes.map((b) => {
    let y = b.y;
    for (;;) {
      const hit = placed.find(
        (p) => p.x < b.x + b.width && b.x < p.x + p.width && p.y < y + b.height && y < p.y + p.height,
      );
      if (!hit) break;
      y = hit.y - b.height - MARK_LABEL_GAP_PX;
    }
    placed.push({ ...b, y });
    return y;
  });
}
