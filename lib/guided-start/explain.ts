import type { Finding } from '@/simulation';
import {
  controlAdvice,
  lifetimeSentence,
  neededBaskingCm,
  surfaceC,
  UV_ZONES,
  type SpeciesSheet,
} from '@/simulation';
import { targetWarning } from '@/lib/species/consistency';
import { baskingZone, hideBox, lampCounts, lampY, type EnclosureInput, type Lid } from './layout';
import type { Proposal } from './propose';

/**
 * Why the guided start proposes what it proposes, in plain language with the numbers behind it: which
 * lamp, where it hangs, what the basking spot gets, how hot it is, where the UV-free refuge is, and what
 * could not be met and why. Every figure is an estimate to verify with a meter and a thermometer.
 */

export type Explanation = { heading: string; text: string }[];

const f1 = (v: number) => (Math.round(v * 10) / 10).toString();
const f0 = (v: number) => Math.round(v).toString();
const num = (f: Finding | undefined, k: string) => f?.numbers[k];

export function explain(
  p: Proposal,
  species: Pick<
    SpeciesSheet,
    'name' | 'uvZone' | 'uvbTargetUw' | 'adultLengthCm' | 'climbs' | 'photoperiodH'
  >,
  enc: EnclosureInput,
  lid: Lid,
): Explanation {
  const c = p.candidate;
  const find = (id: string) => p.assessment.findings.find((f) => f.id === id);
  const basking = find('basking-uvi');
  const hot = find('hot-spot');
  const cool = find('cool-end');
  const refuge = find('uv-refuge');
  const zone = UV_ZONES[species.uvZone];
  const n = lampCounts(c);
  const uvY = lampY(enc, lid, c.mount, c.uv.form, c.raiseCm);
  const heatY = lampY(enc, lid, c.mount, 'bulb', c.heatRaiseCm ?? c.raiseCm);
  const uvName = n.uv > 1 ? `${n.uv} × ${c.uv.name}` : c.uv.name;
  const heatName = c.heat ? (n.heat > 1 ? `${n.heat} × ${c.heat.name}` : c.heat.name) : null;
  const where =
    c.mount === 'inside'
      ? 'hung inside, just under the lid'
      : c.mount === 'raised'
        ? `on a frame about ${f0(uvY - enc.height)} cm above the ${lid} lid`
        : lid === 'open'
          ? 'on a stand above the open top'
          : `resting on the ${lid} lid`;
  const out: Explanation = [];

  out.push({
    heading: 'UV lamp',
    text:
      `${uvName}${c.reflector ? (n.uv > 1 ? ', each with a reflector' : ' with a reflector') : ''}, ${where}, over the warm side` +
      (n.uv > 1 ? (c.uv.form === 'tube' ? ', end to end' : ', side by side') : '') +
      '. ' +
      `The basking perch top is ${f1(c.perchTopCm)} cm above the floor, about ${f0(uvY - c.perchTopCm)} cm below the lamp` +
      (lid === 'mesh' && c.mount !== 'inside' ? '; the mesh between them takes part of the UVB.' : '.'),
  });
  const maxUvi = num(basking, 'maxUvi');
  if (maxUvi !== undefined) {
    out.push({
      heading: 'Basking UV',
      text:
        `About UV Index ${f1(maxUvi)} at the basking spot; ${species.name} is a ${zone.label} species, ` +
        `whose basking range is UV Index ${zone.max[0]}–${zone.max[1]} (Ferguson et al. 2010).` +
        (basking?.status === 'pass' ? '' : ' This is outside that range — see below.'),
    });
  }
  const hotC = num(hot, 'hotC');
  if (hotC !== undefined) {
    out.push({
      heading: 'Heat',
      text:
        (heatName
          ? `${heatName} beside the UV ${n.uv > 1 ? 'lamps' : 'lamp'} over the same perch` +
            (n.heat > 1 ? ', spread along it so their pools join' : '') +
            (c.mount === 'raised' && heatY !== uvY
              ? `, on a frame about ${f0(heatY - enc.height)} cm above the lid`
              : '') +
            '. '
          : `No separate heat lamp: the UV ${n.uv > 1 ? 'lamps give' : `lamp (${c.uv.name}) gives`} the basking heat itself. `) +
        `The hottest surface the animal can reach is ${surfaceC(hotC)} °C (the sheet asks ${f1(num(hot, 'targetLo')!)}–${f1(num(hot, 'targetHi')!)} °C).`,
    });
  }
  const shared = find('shared-basking');
  if (shared) {
    out.push({
      heading: 'One basking spot',
      text:
        `The UV and the heat ${c.heat ? 'lamps hang' : 'come from the same lamps, hung'} over the same perch, because an animal that basks for heat takes its UV where it is warm (Baines et al. 2016). ` +
        (n.uv + n.heat > 2
          ? 'The lamps are spread along the perch so the spot is long enough for the whole body. '
          : '') +
        `About ${f0(num(shared, 'overlapCm') ?? 0)} cm of the perch gets both the basking UV and the basking temperature; ` +
        `${species.name} needs about ${f0(num(shared, 'neededCm') ?? 0)} cm${species.adultLengthCm ? `, roughly its body at ${f0(species.adultLengthCm)} cm long` : ''}.`,
    });
  }
  if (species.climbs && lid === 'mesh') {
    out.push({
      heading: 'Climbing',
      text:
        `${species.name} climbs, so it can hang from the mesh lid right under the lamps: the check counts the underside of the mesh as a surface it can reach, ` +
        (c.mount === 'raised'
          ? `and the lamps stand on a frame about ${f0(uvY - enc.height)} cm (UV)` +
            (c.heat ? ` and ${f0(heatY - enc.height)} cm (heat)` : '') +
            ` above the lid, so the mesh stays out of their reach and below the basking UV limit and the basking temperature.`
          : 'and the lamps hang where the mesh stays out of their reach.'),
    });
  }
  out.push({
    heading: 'Lamp control',
    text: controlAdvice(
      [{ tech: c.uv.tech, name: uvName }, ...(c.heat ? [{ tech: c.heat.tech, name: heatName! }] : [])],
      species.photoperiodH,
    ),
  });
  out.push({
    heading: 'Lamp life',
    text:
      lifetimeSentence(c.uv.tech, c.uv.name, {
        replaceMonths: c.uv.replaceAfterMonths,
        halfLifeMonths: c.uv.decayPoints || c.uv.adoptedCurve ? null : c.uv.halfLifeMonths,
      }) +
      // The studio's ageing preview of this lamp follows the shop's measured curve when it was adopted.
      (c.uv.adoptedCurve
        ? ` Its ageing in the design follows your shop’s measured curve for this type (${c.uv.adoptedCurve.lamps} lamps).`
        : ''),
  });
  const hide = hideBox(enc);
  const zoneX = baskingZone(enc, neededBaskingCm(species)).x;
  out.push({
    heading: 'Refuge',
    text:
      `A hide on the cool side (${f0(hide.x)}–${f0(hide.x + hide.width)} cm from the left, the lamps are at about ${f0(zoneX)} cm) gives shade without UV` +
      (refuge
        ? `; about ${f0(num(refuge, 'refugeCm') ?? 0)} cm of reachable surface is below UV Index 0.1`
        : '') +
      (cool
        ? `. The coolest reachable surface is about ${f1(num(cool, 'coolC')!)} °C at a room temperature of ${f1(enc.roomTempC)} °C.`
        : '.'),
  });
  for (const f of p.unmet) {
    let text = f.message;
    if (f.id === 'basking-uvb' && species.uvbTargetUw) {
      const w = targetWarning(species.uvZone, { min: species.uvbTargetUw[0], max: species.uvbTargetUw[1] });
      if (w) text = `${f.message} ${w}`;
    }
    out.push({ heading: `Not met: ${f.title}`, text });
  }
  return out;
}
