import 'server-only';
import { conflict, invalid, notFound } from '@/lib/errors';

import type { CurrentUser } from '@/lib/auth/session-user';
import { runEngineTask } from '@/lib/engine-pool';
import { toDto as lampTypeDto } from '@/lib/lamp-types/queries';
import { readStoredDesign } from '@/lib/variants/stored-design';
import { saveVariantDesign } from '@/lib/variants/mutations';
import { Design, LampType, Reading, Variant } from '@/models';
import { lampSchema, type LampObject } from '@/simulation';
import type { LampWithEnclosure } from './access';
import { applyCalibration, type Calibration } from './calibrate';
import { todayIso } from './dates';
import { lampFacts, readingFacts } from './store';

/**
 * Calibration of a logged lamp against the design lamp it is (the object whose id is the lamp's
 * `designObjectId`), in every variant of the enclosure's designs that has it.
 */

export type CalibrationTarget = {
  variant: { id: number; name: string; version: number; designId: number; designName: string };
  object: LampObject;
  calibration: Calibration;
};

async function targets(lamp: LampWithEnclosure): Promise<CalibrationTarget[]> {
  if (!lamp.designObjectId) return [];
  const [type, readings, designs] = await Promise.all([
    LampType.findByPk(lamp.lampTypeId),
    Reading.findAll({ where: { lampId: lamp.id }, order: [['takenAt', 'ASC']] }),
    Design.findAll({ where: { enclosureId: lamp.enclosureId }, attributes: ['id', 'name'] }),
  ]);
  if (!type || designs.length === 0) return [];
  const facts = lampFacts(lamp, lampTypeDto(type));
  const variants = await Variant.findAll({
    where: { designId: designs.map((d) => d.id) },
    order: [['id', 'ASC']],
  });
  const names = new Map(designs.map((d) => [d.id, d.name]));
  const found: Omit<CalibrationTarget, 'calibration'>[] = [];
  for (const v of variants) {
    const design = readStoredDesign(v.designJson);
    const object = design.objects.find((o) => o.type === 'lamp' && o.id === lamp.designObjectId);
    if (!object || object.type !== 'lamp') continue;
    found.push({
      variant: {
        id: v.id,
        name: v.name,
        version: v.version,
        designId: v.designId,
        designName: names.get(v.designId) ?? '',
      },
      object,
    });
  }
  if (found.length === 0) return [];
  // The fits run on an engine worker thread: their cost grows with the lamp's readings.
  const calibrations = await runEngineTask('calibrations', {
    lamp: facts,
    readings: readings.map(readingFacts),
    objects: found.map((t) => t.object),
    today: todayIso(),
  });
  return found.map((t, i) => ({ ...t, calibration: calibrations[i]! }));
}

export async function calibrationProposal(lamp: LampWithEnclosure) {
  const list = await targets(lamp);
  return {
    designObjectId: lamp.designObjectId ?? null,
    hint: !lamp.designObjectId
      ? 'Link this lamp to its lamp in a design (the design lamp’s id) to calibrate it.'
      : list.length === 0
        ? `No design of this enclosure has a lamp with the id “${lamp.designObjectId}”.`
        : null,
    targets: list,
  };
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
  const target = (await targets(lamp)).find((t) => t.variant.id === variantId);
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
