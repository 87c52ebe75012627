import 'server-only';
import type { Transaction } from 'sequelize';
import { assessmentCost, PERCH_STEP_CM, propose } from '@/lib/guided-start/propose';
import { HEAT_LAMP_ID, PERCH_ID, UV_LAMP_ID, type Lid } from '@/lib/guided-start/layout';
import { applyCalibration, calibrate } from '@/lib/lamp-log/calibrate';
import { todayIso } from '@/lib/lamp-log/dates';
import { lampFacts, readingFacts } from '@/lib/lamp-log/facts';
import type { LampTypeDto } from '@/lib/lamp-types/schema';
import { toDto as lampTypeDto } from '@/lib/lamp-types/queries';
import { toDto as sheetDto } from '@/lib/species/queries';
import { toEngineSheet } from '@/lib/species/to-engine';
import { storeBackdrop } from '@/lib/uploads/mutations';
import { serializeDesign } from '@/lib/variants/stored-design';
import { wholeSecond } from '@/lib/variants/time';
import { newShareToken } from '@/lib/variants/tokens';
import { Design, Enclosure, Lamp, LampType, Reading, ShareLink, SpeciesSheet, Variant } from '@/models';
import { ASSESSMENT_THRESHOLDS, assess, type SpeciesSheet as EngineSheet } from '@/simulation';
import type { Design as DesignFile, DesignObject, LampObject, ProbePoint } from '@/simulation';
import { BACKDROP_INSIDE_CM, drawDesertVivarium } from './backdrop-picture';
import { findDemoEnclosure } from './find';
import { DEMO_HOUSEHOLD, DEMO_SHOP } from './scenario';

/**
 * Example designs for the demo enclosures, so the studio, its checks, compare, share links and the lamp
 * log's calibration can be seen without building anything first. Every design is found by the guided
 * start's own search over the lamps the enclosure's lamp log lists (so the logged lamps are the design's
 * lamps and calibrate on first sight), and is named and noted as example data.
 *
 * The desert vivarium tells a story in two variants: the keeper's current set-up, with the UV tube over
 * the hide at the cool end and the heat lamp over the basking rock (the dragon basks in heat without UV —
 * a common mistake), and the improved one, with UV and heat over the same basking spot.
 *
 * Only an enclosure with no design at all gets one, so a design a user made, changed or renamed is never
 * touched and never duplicated.
 */

export const EXAMPLE_NOTE =
  'Example data: invented for the Baskwell demo, not a real enclosure. Every figure is an estimate: verify with a UV meter and a thermometer before an animal lives with it.';

type DemoDesignPlan = {
  organisation: string;
  enclosure: string;
  design: string;
  lid: Lid;
  /** Catalogue presets the search may use; null for the whole catalogue. */
  presets: readonly string[] | null;
  /** Drop the lid barrier from the design (a wooden vivarium's solid top, with the lamps inside). */
  solidTop?: boolean;
  story?: 'desert';
};

export const DESERT_ENCLOSURE_NAME = 'Desert vivarium';
export const DESERT_DESIGN_NAME = 'Lighting plan (example)';
export const CURRENT_VARIANT_NAME = 'Current set-up';
export const IMPROVED_VARIANT_NAME = 'Improved: new tube, UV and heat over one basking spot';

export const DEMO_DESIGNS: readonly DemoDesignPlan[] = [
  {
    organisation: DEMO_SHOP.name,
    enclosure: DESERT_ENCLOSURE_NAME,
    design: DESERT_DESIGN_NAME,
    lid: 'glass',
    presets: ['t5-high', 'ceramic-100'],
    solidTop: true,
    story: 'desert',
  },
  {
    organisation: DEMO_SHOP.name,
    enclosure: 'Gecko tank',
    design: 'Lighting plan (example)',
    lid: 'mesh',
    presets: ['t5-medium', 'halogen-75'],
  },
  {
    organisation: DEMO_SHOP.name,
    enclosure: 'Snake vivarium',
    design: 'Lighting plan (example)',
    lid: 'mesh',
    presets: null,
  },
  {
    organisation: DEMO_SHOP.name,
    enclosure: 'Tall mesh cage',
    design: 'Lighting plan (example)',
    lid: 'mesh',
    presets: ['t5-very-high', 'incandescent-60'],
  },
  {
    organisation: DEMO_SHOP.name,
    enclosure: 'Arboreal terrarium',
    design: 'Lighting plan (example)',
    lid: 'mesh',
    presets: null,
  },
  {
    organisation: DEMO_HOUSEHOLD.name,
    enclosure: 'Python vivarium',
    design: 'Lighting plan (example)',
    lid: 'mesh',
    presets: ['t5-low', 'ceramic-100'],
  },
];

const round1 = (v: number) => Math.round(v * 10) / 10;

/** The design lamp ids the enclosure's logged lamps point at, by catalogue preset. */
async function loggedLamps(enclosureId: number, transaction: Transaction) {
  const lamps = await Lamp.findAll({
    where: { enclosureId, retiredOn: null },
    order: [['id', 'ASC']],
    transaction,
  });
  const types = await LampType.findAll({ where: { id: lamps.map((l) => l.lampTypeId) }, transaction });
  const byId = new Map(types.map((t) => [t.id, t]));
  return lamps.map((lamp) => ({ lamp, type: byId.get(lamp.lampTypeId)! })).filter((l) => l.type);
}

/** Probes pinned where a keeper would hold the meter: on the basking spot, and on the hide at the cool end. */
function probesFor(design: DesignFile): ProbePoint[] {
  const probes: ProbePoint[] = [];
  const perch = design.objects.find((o) => o.id === PERCH_ID);
  if (perch?.type === 'perch') {
    probes.push({
      id: 'basking-spot',
      label: 'Basking spot (top of the perch)',
      x: round1((perch.x1 + perch.x2) / 2),
      y: round1(Math.max(perch.y1, perch.y2) + perch.thickness / 2 + 0.5),
    });
  }
  const hide = design.objects.find((o) => o.type === 'hide');
  if (hide?.type === 'hide') {
    probes.push({
      id: 'cool-end',
      label: 'Cool end (on the hide)',
      x: round1(hide.x + hide.width / 2),
      y: round1(hide.y + hide.height + 0.5),
    });
  }
  return probes;
}

/**
 * The guided start's best design over the allowed lamps, with the logged lamps' ids and labels on the
 * design's lamps and their age from the log (or a new UV lamp of the same type, for a plan that
 * replaces it).
 */
function plannedDesign(
  plan: DemoDesignPlan,
  enclosure: Enclosure,
  sheet: ReturnType<typeof sheetDto>,
  catalogue: LampTypeDto[],
  logged: Awaited<ReturnType<typeof loggedLamps>>,
  today: string,
  opts: { newUvLamp?: boolean } = {},
): DesignFile | null {
  const types = plan.presets
    ? catalogue.filter((t) => t.presetKey && plan.presets!.includes(t.presetKey))
    : catalogue;
  const proposal = propose(
    {
      species: toEngineSheet(sheet),
      enclosure: {
        width: enclosure.widthCm,
        height: enclosure.heightCm,
        depth: enclosure.depthCm,
        roomTempC: 22,
      },
      lid: plan.lid,
      // The enclosure's log lists one UV lamp: the design has that one.
      maxUvLamps: 1,
    },
    types,
  );
  if (!proposal) return null;
  const design = structuredClone(proposal.design);
  if (plan.solidTop) design.objects = design.objects.filter((o) => o.id !== 'lid');
  design.objects = design.objects.map((o): DesignObject => {
    if (o.type !== 'lamp') return o;
    // The log lists one lamp of each kind: it is the first UV and the first heat lamp of the design.
    const typeId =
      o.id === UV_LAMP_ID
        ? proposal.candidate.uv.id
        : o.id === HEAT_LAMP_ID
          ? proposal.candidate.heat?.id
          : undefined;
    const log = typeId === undefined ? undefined : logged.find((l) => l.type.id === typeId);
    if (!log) return o;
    const ageDays =
      opts.newUvLamp && o.id === UV_LAMP_ID
        ? 0
        : Math.max(0, (Date.parse(today) - Date.parse(log.lamp.firstUsedOn)) / 86_400_000);
    return {
      ...o,
      id: log.lamp.designObjectId ?? o.id,
      name: log.lamp.label,
      ageMonths: round1(ageDays / (365.25 / 12)),
    };
  });
  const placed = withBestPerch(design, toEngineSheet(sheet));
  placed.probes = probesFor(placed);
  placed.notes = EXAMPLE_NOTE;
  return placed;
}

/**
 * The search proposed its perch height for new lamps; the logged lamps have aged. The perch height (in
 * the search's steps, below the lamps' safe distances) at which the engine's assessment of the design
 * with its real lamp ages is best.
 */
function withBestPerch(design: DesignFile, species: EngineSheet): DesignFile {
  const perch = design.objects.find((o) => o.id === PERCH_ID);
  if (perch?.type !== 'perch') return design;
  const { LAMP_REACH_CM, UV_EYE_CM } = ASSESSMENT_THRESHOLDS;
  const lampLimits = design.objects.flatMap((o) =>
    o.type === 'lamp' ? [o.y - ((o.uvbAt30 ?? 0) > 0 ? UV_EYE_CM : LAMP_REACH_CM)] : [],
  );
  const highest = Math.min(design.enclosure.height - LAMP_REACH_CM, ...lampLimits);
  const at = (top: number): DesignFile => ({
    ...design,
    objects: design.objects.map((o) =>
      o === perch
        ? { ...perch, y1: round1(top - perch.thickness / 2), y2: round1(top - perch.thickness / 2) }
        : o,
    ),
  });
  let best = { design, cost: assessmentCost(assess(design, species, { cellCm: 2 })) };
  for (let top = 5; top <= highest + 1e-9; top += PERCH_STEP_CM) {
    const candidate = at(top);
    const cost = assessmentCost(assess(candidate, species, { cellCm: 2 }));
    if (cost < best.cost) best = { design: candidate, cost };
  }
  return best.design;
}

/**
 * The desert's current set-up: the same lamps, but the tube over the hide at the cool end without a
 * reflector, and the heat emitter alone over the basking rock (no perch raising the dragon towards them).
 */
function currentDesertSetUp(improved: DesignFile, uvId: string): DesignFile {
  const design = structuredClone(improved);
  const width = design.enclosure.width;
  design.objects = design.objects
    .filter((o) => o.id !== PERCH_ID)
    .map((o): DesignObject => {
      if (o.type !== 'lamp' || o.id !== uvId) return o;
      const half = (o.length ?? 0) / 2;
      const { reflectorGain: _gain, ...bare } = o;
      return { ...bare, x: round1(Math.max(half + 1, Math.min(width - half - 1, 30))) };
    });
  // The basking rock of the photo, under the heat lamp.
  design.objects.push({
    type: 'ledge',
    id: 'basking-rock',
    name: 'Basking rock',
    x: 70,
    y: 0,
    width: 36,
    height: 22,
  });
  design.probes = [
    { id: 'basking-spot', label: 'Basking spot (top of the rock)', x: 88, y: 22.5 },
    ...(improved.probes ?? []).filter((p) => p.id !== 'basking-spot'),
  ];
  design.notes = [
    EXAMPLE_NOTE,
    'How the vivarium is set up today: the UV tube hangs over the hide at the cool end, and the heat lamp over the basking rock. The dragon basks where it is warm, so it gets little UV there — compare with the improved variant.',
  ].join('\n\n');
  return design;
}

function improvedNotes(design: DesignFile): DesignFile {
  return {
    ...design,
    notes: [
      EXAMPLE_NOTE,
      'The same two lamps, moved, and the worn tube replaced by a new one of the same type (the lamp log says it is nearly spent): the UV tube with a reflector and the heat lamp side by side over a raised basking perch, so the warmest spot is also the one with the right UV Index, and the cool end keeps shade.',
    ].join('\n\n'),
  };
}

/** The current set-up's UV lamp, calibrated to the log's meter readings of the real tube. */
async function calibrated(
  design: DesignFile,
  logged: Awaited<ReturnType<typeof loggedLamps>>,
  today: string,
  transaction: Transaction,
): Promise<DesignFile> {
  const objects: DesignObject[] = [];
  for (const o of design.objects) {
    const log = o.type === 'lamp' ? logged.find((l) => l.lamp.designObjectId === o.id) : undefined;
    if (o.type !== 'lamp' || !log) {
      objects.push(o);
      continue;
    }
    const readings = await Reading.findAll({
      where: { lampId: log.lamp.id },
      order: [['takenAt', 'ASC']],
      transaction,
    });
    const result = calibrate(
      lampFacts(log.lamp, lampTypeDto(log.type)),
      readings.map(readingFacts),
      o,
      today,
    );
    objects.push(result.ok ? applyCalibration(o as LampObject, result.fields, result.calibrated) : o);
  }
  return { ...design, objects };
}

export type DemoDesignsResult = { designs: number; variants: number; shares: number; photos: number };

/** Adds the example designs to demo enclosures that have none (see the comment at the top). */
export async function seedDemoDesigns(transaction: Transaction): Promise<DemoDesignsResult> {
  const created: DemoDesignsResult = { designs: 0, variants: 0, shares: 0, photos: 0 };
  const today = todayIso();
  for (const plan of DEMO_DESIGNS) {
    const found = await findDemoEnclosure(plan.organisation, plan.enclosure, transaction);
    if (!found) continue;
    const { organisation, enclosure } = found;
    if ((await Design.count({ where: { enclosureId: enclosure.id }, transaction })) > 0) continue;
    const sheetRow = await SpeciesSheet.findOne({
      where: { organisationId: organisation.id, commonName: enclosure.speciesName ?? '' },
      order: [['id', 'ASC']],
      transaction,
    });
    if (!sheetRow) continue;
    const catalogue = (
      await LampType.findAll({ where: { organisationId: organisation.id }, transaction })
    ).map(lampTypeDto);
    const logged = await loggedLamps(enclosure.id, transaction);
    const design = plannedDesign(plan, enclosure, sheetDto(sheetRow), catalogue, logged, today);
    if (!design) continue;

    const row = await Design.create(
      { enclosureId: enclosure.id, name: plan.design, createdById: enclosure.keeperId },
      { transaction },
    );
    created.designs++;
    const addVariant = async (name: string, file: DesignFile) => {
      created.variants++;
      return Variant.create(
        {
          designId: row.id,
          name,
          designJson: serializeDesign(file),
          createdById: enclosure.keeperId,
          updatedById: enclosure.keeperId,
        },
        { transaction },
      );
    };
    if (plan.story !== 'desert') {
      await addVariant('Proposed set-up', design);
      continue;
    }

    const uvId = design.objects.find((o) => o.type === 'lamp' && (o.uvbAt30 ?? 0) > 0)?.id ?? UV_LAMP_ID;
    let current = await calibrated(currentDesertSetUp(design, uvId), logged, today, transaction);
    const photo = await storeBackdrop(
      { id: enclosure.keeperId },
      enclosure,
      drawDesertVivarium(),
      'image/png',
      'desert-vivarium-example-drawing.png',
      transaction,
    ).catch(() => null); // no file store reachable: the example goes without its photo
    if (photo) {
      created.photos++;
      current = {
        ...current,
        backdrop: {
          uploadId: photo.id,
          x: 0,
          y: 0,
          width: BACKDROP_INSIDE_CM.width,
          height: BACKDROP_INSIDE_CM.height,
          opacity: 0.55,
          visible: true,
        },
      };
    }
    const currentRow = await addVariant(CURRENT_VARIANT_NAME, current);
    const fresh = plannedDesign(plan, enclosure, sheetDto(sheetRow), catalogue, logged, today, {
      newUvLamp: true,
    });
    const improvedRow = await addVariant(IMPROVED_VARIANT_NAME, improvedNotes(fresh ?? design));
    // A link the keeper was sent for the improved plan, and an older one to the current set-up, withdrawn.
    // Their tokens are not kept anywhere (only hashes are stored), as for links made in the app.
    await ShareLink.create(
      {
        variantId: improvedRow.id,
        tokenHash: newShareToken().tokenHash,
        expiresAt: null,
        createdById: enclosure.keeperId,
      },
      { transaction },
    );
    await ShareLink.create(
      {
        variantId: currentRow.id,
        tokenHash: newShareToken().tokenHash,
        expiresAt: null,
        createdById: enclosure.keeperId,
        revokedAt: wholeSecond(),
      },
      { transaction },
    );
    created.shares += 2;
  }
  return created;
}
