import 'server-only';
import type { z } from 'zod';
import type { CurrentUser } from '@/lib/auth/session-user';
import { conflict, invalid, notFound } from '@/lib/errors';
import { saveVariantDesign } from '@/lib/variants/mutations';
import { readStoredDesign } from '@/lib/variants/stored-design';
import { Lamp, LampType, Reading, Variant, type Enclosure } from '@/models';
import { lampSchema } from '@/simulation';
import type { LampWithEnclosure } from './access';
import { applyCalibration } from './calibrate';
import { calibrationTargets } from './queries';
import { throughShare } from '@/shared/reading-setup';
import { displayToCm } from '@/shared/units';
import {
  type createLampBody,
  type createReadingBody,
  type updateLampBody,
  type updateReadingBody,
} from './schemas';

/** Writes of the lamp log. Callers have checked permissions on the enclosure or lamp. */

const round1 = (v: number) => Math.round(v * 10) / 10;

async function assertLampTypeIn(organisationId: number, lampTypeId: number): Promise<void> {
  const t = await LampType.findByPk(lampTypeId, { attributes: ['id', 'organisationId'] });
  if (!t || t.organisationId !== organisationId) {
    throw invalid('lampTypeId', 'That lamp type is not in this organisation’s lamp catalogue.');
  }
}

export async function createLamp(
  enclosure: Enclosure,
  body: z.output<typeof createLampBody>,
  userId: number,
): Promise<Lamp> {
  await assertLampTypeIn(enclosure.organisationId, body.lampTypeId);
  return Lamp.create({
    enclosureId: enclosure.id,
    lampTypeId: body.lampTypeId,
    label: body.label,
    designObjectId: body.designObjectId ?? null,
    firstUsedOn: body.firstUsedOn,
    hoursPerDay: body.hoursPerDay,
    baskingDistanceCm: body.baskingDistance
      ? round1(displayToCm(body.baskingDistance, body.lengthUnit))
      : null,
    baskingTransmission: body.baskingTransmission ?? null,
    retiredOn: body.retiredOn ?? null,
    notes: body.notes ?? null,
    createdById: userId,
  });
}

export async function updateLamp(
  lamp: Lamp & { enclosure: Enclosure },
  body: z.output<typeof updateLampBody>,
): Promise<void> {
  if (body.lampTypeId !== undefined) await assertLampTypeIn(lamp.enclosure.organisationId, body.lampTypeId);
  const unit = body.lengthUnit ?? 'cm';
  const next = {
    ...(body.lampTypeId !== undefined ? { lampTypeId: body.lampTypeId } : {}),
    ...(body.label !== undefined ? { label: body.label } : {}),
    ...(body.designObjectId !== undefined ? { designObjectId: body.designObjectId ?? null } : {}),
    ...(body.firstUsedOn !== undefined ? { firstUsedOn: body.firstUsedOn } : {}),
    ...(body.hoursPerDay !== undefined ? { hoursPerDay: body.hoursPerDay } : {}),
    ...(body.baskingDistance !== undefined
      ? { baskingDistanceCm: body.baskingDistance ? round1(displayToCm(body.baskingDistance, unit)) : null }
      : {}),
    ...(body.baskingTransmission !== undefined
      ? { baskingTransmission: body.baskingTransmission ?? null }
      : {}),
    ...(body.retiredOn !== undefined ? { retiredOn: body.retiredOn ?? null } : {}),
    ...(body.notes !== undefined ? { notes: body.notes ?? null } : {}),
  };
  const first = next.firstUsedOn ?? lamp.firstUsedOn;
  const retired = 'retiredOn' in next ? next.retiredOn : lamp.retiredOn;
  if (retired && retired < first)
    throw invalid('retiredOn', 'A lamp cannot be retired before its first use.');
  await lamp.update(next);
}

export type ReadingInput = z.output<typeof createReadingBody>;

function storedShare(lamp: Lamp, r: ReadingInput): number | null {
  const share = throughShare(lamp.baskingTransmission ?? null, r.through, r.throughTransmission);
  if (!share.ok) throw invalid('throughTransmission', share.message);
  return share.share;
}

export function readingColumns(lamp: Lamp, r: ReadingInput) {
  if (r.takenAt.toISOString().slice(0, 10) < lamp.firstUsedOn) {
    throw invalid('takenAt', `This lamp was first used on ${lamp.firstUsedOn}; a reading cannot be earlier.`);
  }
  return {
    through: r.through,
    throughTransmission: storedShare(lamp, r),
    warmedUp: r.warmedUp,
    lampId: lamp.id,
    takenAt: r.takenAt,
    distanceCm: round1(displayToCm(r.distance, r.distanceUnit)),
    value: r.value,
    unit: r.unit,
    meter: r.meter ?? null,
    note: r.note ?? null,
  };
}

export async function createReading(lamp: Lamp, r: ReadingInput, userId: number): Promise<Reading> {
  return Reading.create({ ...readingColumns(lamp, r), takenById: userId });
}

export async function updateReading(
  reading: Reading & { lamp: Lamp },
  body: z.output<typeof updateReadingBody>,
): Promise<void> {
  const merged: ReadingInput = {
    takenAt: body.takenAt ?? reading.takenAt,
    distance: body.distance ?? reading.distanceCm,
    distanceUnit: body.distance !== undefined ? (body.distanceUnit ?? 'cm') : 'cm',
    value: body.value ?? reading.value,
    unit: body.unit ?? reading.unit,
    through: body.through ?? reading.through,
    throughTransmission:
      body.throughTransmission !== undefined
        ? body.throughTransmission
        : body.through !== undefined && body.through !== reading.through
          ? null
          : (reading.throughTransmission ?? null),
    warmedUp: body.warmedUp ?? reading.warmedUp,
    meter: body.meter !== undefined ? body.meter : (reading.meter ?? null),
    note: body.note !== undefined ? body.note : (reading.note ?? null),
  };
  const { lampId: _lampId, ...cols } = readingColumns(reading.lamp, merged);
  await reading.update(cols);
}

/** Writes the calibrated fields onto the variant's lamp object through the variants' compare-and-set save. */
export async function applyCalibrationTo(
  user: CurrentUser,
  lamp: LampWithEnclosure,
  variantId: number,
  baseVersion: number | undefined,
) {
  if (!lamp.designObjectId) {
    throw invalid('designObjectId', 'Link this lamp to its lamp in a design before calibrating.');
  }
  const target = (await calibrationTargets(lamp)).find((t) => t.variant.id === variantId);
  if (!target) throw notFound('A variant of this enclosure with that lamp');
  if (!target.calibration.ok) throw invalid(undefined, target.calibration.reason);
  const variant = await Variant.findByPk(variantId);
  if (!variant) throw notFound('The variant');
  const version = baseVersion ?? variant.version;
  if (version !== variant.version) {
    throw conflict('Someone saved this variant after the proposal was made. Look at it again.', 'stale');
  }
  const design = readStoredDesign(variant.designJson);
  // The calibrated figures and the note "calibrated on <date> from n meter readings" that the studio shows.
  const calibrated = lampSchema.parse(
    applyCalibration(target.object, target.calibration.fields, target.calibration.calibrated),
  );
  const next = {
    ...design,
    objects: design.objects.map((o) => (o.type === 'lamp' && o.id === lamp.designObjectId ? calibrated : o)),
  };
  const saved = await saveVariantDesign(user, variant, { design: next, baseVersion: version });
  if (!saved.ok)
    throw conflict('Someone saved this variant meanwhile. Nothing was changed; try again.', 'stale');
  return {
    variant: saved.variant,
    object: calibrated,
    calibrated: target.calibration.calibrated,
    changes: target.calibration.changes,
  };
}
