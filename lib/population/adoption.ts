import 'server-only';
import { conflict } from '@/lib/errors';
import { getSequelize } from '@/lib/db';
import type { AdoptedCurve } from '@/lib/lamp-types/schema';
import { LampCurveAdoption, LampType, User } from '@/models';
import { adoptedPoints, type PopulationCurve } from './fit';
import { populationFor } from './store';

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

export type AdoptionView = {
  id: number;
  lamps: number;
  readings: number;
  adoptedAt: string;
  adoptedBy: string | null;
  withdrawnAt: string | null;
  withdrawnBy: string | null;
  halfLifeMonths: number | null;
  startShare: number | null;
};

type FrozenFit = {
  kind: string;
  note: string;
  startShare: number;
  halfLifeMonths: number | null;
  fit: unknown;
  points: [number, number][];
};

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

/** The type's adoptions, newest first (the one in force, if any, has no withdrawal). */
export async function adoptionHistory(lampTypeId: number, limit = 10): Promise<AdoptionView[]> {
  const rows = await LampCurveAdoption.findAll({
    where: { lampTypeId },
    order: [
      ['adoptedAt', 'DESC'],
      ['id', 'DESC'],
    ],
    limit,
  });
  const ids = [...new Set(rows.flatMap((r) => [r.adoptedById, r.withdrawnById]))].filter(
    (id): id is number => typeof id === 'number',
  );
  const users = ids.length ? await User.findAll({ where: { id: ids }, attributes: ['id', 'name'] }) : [];
  const name = (id: number | null) => (id ? (users.find((u) => u.id === id)?.name ?? null) : null);
  return rows.map((r) => {
    let frozen: Partial<FrozenFit> = {};
    try {
      frozen = JSON.parse(r.fitJson) as FrozenFit;
    } catch {
      // A row that cannot be read still shows who and when.
    }
    return {
      id: r.id,
      lamps: r.lamps,
      readings: r.readings,
      adoptedAt: r.adoptedAt.toISOString(),
      adoptedBy: name(r.adoptedById),
      withdrawnAt: r.withdrawnAt ? r.withdrawnAt.toISOString() : null,
      withdrawnBy: name(r.withdrawnById ?? null),
      halfLifeMonths: typeof frozen.halfLifeMonths === 'number' ? frozen.halfLifeMonths : null,
      startShare: typeof frozen.startShare === 'number' ? frozen.startShare : null,
    };
  });
}
