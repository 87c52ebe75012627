import type { Assessment, Design, LampTech } from '@/simulation';
import { controlSentence, controlSummary, LAMP_TECH_IDS, LAMP_TECHS, shortWaveCaution } from '@/simulation';

/**
 * The standing cautions of the product, in plain language, and which of them apply to a design. Shared by
 * the species pages, the lamp catalogue, the guided start, the studio and reports.
 */

export type CautionId = 'uv-eyes-skin' | 'short-wave-uvb' | 'burns' | 'fire' | 'thermostat' | 'estimate';

export type Caution = {
  id: CautionId;
  title: string;
  text: string;
  /** Where the caution comes from: a published source, or common practice. */
  source: string;
};

export const CAUTIONS: Record<CautionId, Caution> = {
  'uv-eyes-skin': {
    id: 'uv-eyes-skin',
    title: 'UV can injure eyes and skin',
    text:
      'Unsuitable or badly placed UV lamps have caused inflamed, closed eyes (photokeratoconjunctivitis) and burnt skin ' +
      '(photodermatitis) in captive reptiles. Mount UV lamps overhead, not at eye level, keep the basking spot at the ' +
      'distance the lamp needs, and never look into a UV lamp yourself. If an animal keeps its eyes shut or its skin ' +
      'reddens or peels, switch the lamp off and see a reptile-experienced vet.',
    source: 'Gardiner, Baines & Pandher 2009, J. Zoo Wildl. Med. 40:757',
  },
  'short-wave-uvb': {
    id: 'short-wave-uvb',
    title: 'Short-wave UVB: judge this lamp by UV Index',
    text:
      'A UV lamp that gives much more UV Index per µW/cm² than sunlight gives short-wave UVB, at wavelengths sunlight ' +
      'does not contain, which can inflame the eyes and burn the skin at a µW/cm² reading that looks modest. Judge it by ' +
      'UV Index, never by a µW/cm² target, and keep to the lamp maker’s distances.',
    source:
      'from memory (sunlight’s UV Index per µW/cm² and the twice-sunlight point to warn); the injuries: Gardiner, Baines & Pandher 2009, J. Zoo Wildl. Med. 40:757',
  },
  burns: {
    id: 'burns',
    title: 'Lamps within reach burn',
    text:
      'Animals do not always move away from a hot surface. Keep heat and UV lamps out of reach — behind a mesh guard or ' +
      'above the lid — and check that climbing animals cannot get to them from a branch, a décor item or the mesh.',
    source: 'common practice, no published source',
  },
  fire: {
    id: 'fire',
    title: 'Heat sources can start fires',
    text:
      'Use lamp holders rated for the lamp’s heat (ceramic for heat lamps and emitters), keep bulbs clear of wood, ' +
      'plants, paper and plastic, and follow the lamp maker’s instructions and local electrical and fire codes. Have ' +
      'fixed wiring done by a licensed electrician.',
    source: 'common practice, no published source',
  },
  thermostat: {
    id: 'thermostat',
    title: 'Control each lamp the way its type allows',
    text: controlAdviceForAll(),
    source: 'common practice, no published source',
  },
  estimate: {
    id: 'estimate',
    title: 'Every figure is an estimate',
    text:
      'The UV and temperature figures are computed from a model and catalogue values, not measured. Verify them in the ' +
      'enclosure with a UV meter and a thermometer (an infrared one for surfaces) before an animal lives with them, and ' +
      'defer to a reptile-experienced vet and to local codes.',
    source: 'common practice, no published source',
  },
};

/**
 * What a share page and a report say above the safety checks when no species sheet is attached (the
 * checks then use general limits: see the engine's assess()).
 */
export const NO_SPECIES_SAFETY_LEAD =
  'No species is attached to this enclosure, so there is no species check. Lamps within reach (also of an animal ' +
  'that climbs the mesh), UV near the eyes and surfaces too hot to touch are checked against general limits; attach ' +
  'a species sheet to check basking UV, shade, hot spot and cool end against its needs.';

/** The general control advice: every technology grouped by how it may be controlled (LAMP_CONTROL). */
function controlAdviceForAll(): string {
  return (
    controlSummary() +
    ' Heat from a lamp that is on a timer only is set by its wattage and distance; where the heat needs control, add a ' +
    'separate thermostat-controlled heat source. A thermostat’s probe belongs at the basking spot; check its setting ' +
    'with a thermometer.'
  );
}

/** The control caution for the technologies in use, with the sheet's day length for the timers. */
function controlCaution(techs: Set<string>, photoperiodH?: [number, number]): Caution {
  const known = LAMP_TECH_IDS.filter((t) => techs.has(t));
  if (known.length === 0) return CAUTIONS.thermostat;
  const text =
    known.map((t: LampTech) => controlSentence(t, undefined, photoperiodH)).join(' ') +
    ' Check every thermostat setting with a thermometer.';
  return { ...CAUTIONS.thermostat, text };
}

/**
 * The short-wave UVB caution for the UV lamps whose UV Index per µW/cm² is far above sunlight's (the
 * engine's shortWaveCaution, the text the lamp log and the species check give); null when none is.
 */
function shortWaveCautionFor(input: CautionInput): Caution | null {
  const lamps = [...(input.spectra ?? [])];
  for (const o of input.design?.objects ?? []) {
    if (o.type !== 'lamp') continue;
    const t = LAMP_TECHS[o.tech];
    lamps.push({
      name: o.name ?? o.id,
      uviPerUvb: o.uviPerUvb ?? t.uviPerUvb,
      uvbAt30: o.uvbAt30 ?? t.uvbAt30,
    });
  }
  const texts = lamps
    .filter((l) => (l.uvbAt30 ?? 1) > 0)
    .map((l) => shortWaveCaution(l.uviPerUvb, l.name))
    .filter((t): t is string => t !== null);
  if (texts.length === 0) return null;
  return { ...CAUTIONS['short-wave-uvb'], text: texts.join(' ') };
}

const UV_TECHS = new Set(['t5', 't8', 'compact', 'mercury-vapour', 'metal-halide', 'led-uvb']);

export type CautionInput = {
  design?: Pick<Design, 'objects'> | null;
  assessment?: Pick<Assessment, 'findings'> | null;
  /** Technologies involved when there is no design (a lamp type page, a lamp in the log). */
  techs?: string[];
  /**
   * UV lamps with their UV Index per µW/cm² when there is no design (a lamp type's page): a spectrum far
   * from sunlight's gets the short-wave caution. A design's lamps are read from the design.
   */
  spectra?: { name: string; uviPerUvb: number; uvbAt30?: number }[];
  /** The species sheet's day length, hours: the timer advice names it. */
  photoperiodH?: [number, number] | null;
};

/** Which cautions apply, and whether the assessment found the matching problem (`urgent`). */
export function applicableCautions(input: CautionInput): { caution: Caution; urgent: boolean }[] {
  const techs = new Set(input.techs ?? []);
  let uv = false;
  let heat = false;
  for (const o of input.design?.objects ?? []) {
    if (o.type !== 'lamp') continue;
    techs.add(o.tech);
    if ((o.uvbAt30 ?? 1) > 0 && UV_TECHS.has(o.tech)) uv = true;
    if ((o.watts ?? 1) > 0) heat = true;
  }
  for (const t of techs) {
    if (UV_TECHS.has(t)) uv = true;
    heat = true; // every lamp technology gives off heat
  }
  const status = (id: string) => input.assessment?.findings.find((f) => f.id === id)?.status;
  const bad = (id: string) => {
    const s = status(id);
    return s === 'attention' || s === 'fail';
  };
  const hotSpotTooHot = input.assessment?.findings.some(
    (f) =>
      f.id === 'hot-spot' && f.status !== 'pass' && (f.numbers.hotC ?? 0) > (f.numbers.targetHi ?? Infinity),
  );
  const out: { caution: Caution; urgent: boolean }[] = [];
  if (uv) out.push({ caution: CAUTIONS['uv-eyes-skin'], urgent: bad('eye-safety') });
  const shortWave = shortWaveCautionFor(input);
  if (shortWave) out.push({ caution: shortWave, urgent: bad('short-wave-uvb') });
  if (heat) {
    out.push({ caution: CAUTIONS.burns, urgent: bad('lamp-in-reach') });
    out.push({
      caution: controlCaution(techs, input.photoperiodH ?? undefined),
      urgent: Boolean(hotSpotTooHot),
    });
    out.push({ caution: CAUTIONS.fire, urgent: false });
  }
  out.push({ caution: CAUTIONS.estimate, urgent: false });
  return out;
}
