import 'server-only';
import { getSequelize } from '@/lib/db';
import { conflict } from '@/lib/errors';
import type { AdoptedCurve } from '@/lib/lamp-types/schema';
import { LampCurveAdoption, LampType } from '@/models';
import { adoptedPoints, type PopulationCurve } from './fit';
import { populationFor, type FrozenFit } from './queries';

/**
 * Adopting a lamp type's measured curve for the organisation, and going back to the catalogue's.
 *
 * The curve in force is written onto the lamp type (`adopted_curve_json`), so everything that reads the
 * type's curve takes it up — the lamp log's outlooks, the counter's verdicts, the guided start's lamps
 * and a calibration's decay table — and the lamp type's update hook (models/outlook-invalidation.ts)
 * marks the outlooks of its lamps out of date in the same transaction. Each adoption is also kept as a
 * row with who, when and the fit as it stood (frozen: new readings move the measured curve shown on the
 * page, never the adopted one until someone adopts again).
 */

export async function adoptCurve(type: LampType, userId: number, now = new Date()): Promise<AdoptedCurve> {
  const curve: PopulationCurve = await populationFor(type);
  if (!curve.ok) throw conflict(curve.message, 'not_enough_tests');
  const points = adoptedPoints(curve.fit);
  const adopted: AdoptedCurve = {
    points,
    lamps: curve.lamps,
    readings: curve.readings,
    adoptedAt: now.toISOString(),
  };
  const frozen: FrozenFit = {
    kind: curve.fit.kind,
    note: curve.note,
    startShare: curve.startShare,
    halfLifeMonths: curve.halfLifeMonths,
    fit: curve.fit,
    points,
  };
  await getSequelize().transaction(async (transaction) => {
    await LampCurveAdoption.update(
      { withdrawnAt: now, withdrawnById: userId },
      { where: { lampTypeId: type.id, withdrawnAt: null }, transaction },
    );
    await LampCurveAdoption.create(
      {
        organisationId: type.organisationId,
        lampTypeId: type.id,
        lamps: curve.lamps,
        readings: curve.readings,
        fitJson: JSON.stringify(frozen),
        adoptedById: userId,
        adoptedAt: now,
      },
      { transaction },
    );
    await type.update({ adoptedCurveJson: JSON.stringify(adopted) }, { transaction });
  });
  return adopted;
}

/** Back to the catalogue's curve: the adoption in force is marked withdrawn (kept, with who and when). */
export async function withdrawCurve(type: LampType, userId: number, now = new Date()): Promise<void> {
  await getSequelize().transaction(async (transaction) => {
    await LampCurveAdoption.update(
      { withdrawnAt: now, withdrawnById: userId },
      { where: { lampTypeId: type.id, withdrawnAt: null }, transaction },
    );
    if (type.adoptedCurveJson !== null) await type.update({ adoptedCurveJson: null }, { transaction });
  });
}
