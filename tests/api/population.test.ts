import { beforeEach, describe, expect, it } from 'vitest';
import * as assess from '@/app/api/counter/assess/route';
import * as adoption from '@/app/api/lamp-types/[id]/curve-adoption/route';
import * as population from '@/app/api/lamp-types/[id]/population/route';
import { addDays, DAYS_PER_MONTH, todayIso } from '@/lib/lamp-log/dates';
import { refreshOutlooks } from '@/lib/lamp-log/stored-outlooks';
import { loadUserById } from '@/lib/auth/session-user';
import { studioCatalogueFor } from '@/lib/lamp-types/studio-catalogue';
import { MIN_LAMPS } from '@/lib/population/fit';
import { matchingCatalogueCurve } from '@/components/studio/state/lampPresets';
import {
  CounterLamp,
  CounterReading,
  Lamp,
  LampCurveAdoption,
  LampOutlook,
  LampType,
  Reading,
  type User,
} from '@/models';
import { withTestDatabase } from '../helpers/db';
import { freshEnclosureWorld } from '../helpers/world';
import { call, send } from './http';

withTestDatabase();

let type: LampType;

const TODAY = todayIso();

/**
 * Lamps of the shop's high-output T5 type whose bare 30 cm output follows 0.9·exp(−months/8) of the
 * catalogue's new figure (a half-life of 5.5 months, much steeper than the catalogue's 12), tested twice
 * each: four hang in the keeper's enclosure, four were tested at the counter.
 */
async function measuredLamps() {
  const share = (months: number) => 0.9 * Math.exp(-months / 8);
  for (let i = 0; i < 8; i++) {
    const ageMonths = 3 + i * 1.5;
    const firstUsedOn = addDays(TODAY, -Math.round(ageMonths * DAYS_PER_MONTH));
    const at = [ageMonths - 2, ageMonths];
    const readings = at.map((m) => ({
      takenAt: new Date(`${addDays(firstUsedOn, Math.round(m * DAYS_PER_MONTH))}T10:00:00Z`),
      distanceCm: 30,
      value: type.uvbAt30 * share(m) * (i % 2 ? 1.03 : 0.97),
      unit: 'uvb' as const,
      through: 'nothing' as const,
      warmedUp: 'yes' as const,
    }));
    if (i < 4) {
      const lamp = await Lamp.create({
        enclosureId: world.enclosure.id,
        lampTypeId: type.id,
        label: `Measured ${i}`,
        firstUsedOn,
        hoursPerDay: 12,
        createdById: world.owner.id,
      });
      for (const r of readings) await Reading.create({ ...r, lampId: lamp.id, takenById: world.owner.id });
    } else {
      const lamp = await CounterLamp.create({
        organisationId: world.shop.id,
        customerId: null,
        lampTypeId: type.id,
        firstUsedOn,
        hoursPerDay: 12,
        createdById: world.staff.id,
      });
      for (const r of readings)
        await CounterReading.create({
          ...r,
          counterLampId: lamp.id,
          verdict: 'keep',
          takenById: world.staff.id,
        });
    }
  }
}

const world = freshEnclosureWorld({
  catalogue: true,
});

beforeEach(async () => {
  type = (await LampType.findOne({ where: { organisationId: world.shop.id, presetKey: 't5-high' } }))!;
});

/** What the design studio page of a design of `organisationId` hands the studio, for this user. */
const studioOffer = async (as: User, organisationId: number) =>
  studioCatalogueFor((await loadUserById(as.id))!, organisationId);
const get = (as: User | null, id = type.id) =>
  call(population.GET, { path: `/api/lamp-types/${id}/population`, params: { id }, as });
const adopt = (as: User | null, id = type.id) =>
  send(adoption.POST, 'POST /api/lamp-types/[id]/curve-adoption', { id, as, body: {} });
const withdraw = (as: User | null, id = type.id) =>
  send(adoption.DELETE, 'DELETE /api/lamp-types/[id]/curve-adoption', { id, as });

describe('a lamp type’s measured curve', () => {
  it('is fitted from enclosure and counter lamps alike, with its band and counts', async () => {
    await measuredLamps();
    const r = await get(world.staff);
    expect(r.status).toBe(200);
    expect(r.body.curve.ok).toBe(true);
    expect(r.body.curve.lamps).toBe(8);
    expect(r.body.curve.enclosureLamps).toBe(4);
    expect(r.body.curve.counterLamps).toBe(4);
    expect(r.body.curve.readings).toBe(16);
    // The generator's curve at six months lies in the band drawn there.
    const six = r.body.curve.curve.find((c: { months: number }) => c.months === 6);
    const truth = 0.9 * Math.exp(-6 / 8);
    expect(six.lo).toBeLessThanOrEqual(truth);
    expect(six.hi).toBeGreaterThanOrEqual(truth);
    expect(r.body.adopted).toBeNull();
    // A second view of the same readings is the same fit.
    expect((await get(world.owner)).body.curve).toEqual(r.body.curve);
  });

  it('is refused with a plain message while there are too few lamps', async () => {
    const r = await get(world.owner);
    expect(r.status).toBe(200);
    expect(r.body.curve.ok).toBe(false);
    expect(r.body.curve.message).toContain(`${MIN_LAMPS} more lamps`);
    const refused = await adopt(world.owner);
    expect(refused.status).toBe(409);
    expect(refused.body.error.message).toContain('No usable readings of this type yet');
    expect(await LampCurveAdoption.count()).toBe(0);
  });

  it('is seen and adopted by nobody outside the shop’s owners and staff', async () => {
    await measuredLamps();
    expect((await get(null)).status).toBe(401);
    expect((await adopt(null)).status).toBe(401);
    expect((await withdraw(null)).status).toBe(401);
    for (const who of [world.keeper, world.outsider]) {
      expect((await get(who)).status).toBe(404);
      expect((await adopt(who)).status).toBe(404);
      expect((await withdraw(who)).status).toBe(404);
    }
    // The outsider's own type of the same kind is theirs to see.
    const theirs = (await LampType.findOne({
      where: { organisationId: world.otherOrg.id, presetKey: 't5-high' },
    }))!;
    expect((await get(world.outsider, theirs.id)).status).toBe(200);
    expect(await LampCurveAdoption.count()).toBe(0);
    expect((await LampType.findByPk(type.id))!.adoptedCurveJson).toBeNull();
  });

  it('once adopted, changes a lamp’s stored outlook and a counter verdict, and goes back when withdrawn', async () => {
    await measuredLamps();
    // A lamp with one reading ages by the type's curve: its stored outlook shows which curve.
    const probe = await Lamp.create({
      enclosureId: world.enclosure.id,
      lampTypeId: type.id,
      label: 'Probe',
      firstUsedOn: addDays(TODAY, -200),
      hoursPerDay: 12,
      createdById: world.owner.id,
    });
    await Reading.create({
      lampId: probe.id,
      takenAt: new Date(`${addDays(TODAY, -20)}T10:00:00Z`),
      distanceCm: 30,
      value: 30,
      unit: 'uvb',
      through: 'nothing',
      warmedUp: 'yes',
      takenById: world.owner.id,
    });
    await refreshOutlooks([probe.id]);
    const stored = async () => {
      const row = (await LampOutlook.findByPk(probe.id))!;
      return { row, json: JSON.parse(row.outlookJson) as { ageing: string; remainingFraction: number } };
    };
    const before = await stored();
    expect(before.json.ageing).toBe('Ageing: the catalogue’s curve for this type.');
    // The counter, for a lamp at 80 % of new after six months: the catalogue's slow curve says keep.
    const counter = () =>
      call(assess.POST, {
        method: 'POST',
        path: '/api/counter/assess',
        as: world.staff,
        body: {
          organisationId: world.shop.id,
          lamp: { lampTypeId: type.id, ageMonths: 6, hoursPerDay: 12 },
          reading: {
            distance: 30,
            value: type.uvbAt30 * 0.8,
            unit: 'uvb',
            through: 'nothing',
            warmedUp: 'yes',
          },
        },
      });
    const verdictBefore = (await counter()).body.answer.verdict;
    expect(verdictBefore.kind).toBe('keep');

    const version = (await Lamp.findByPk(probe.id))!.outlookVersion;
    const r = await adopt(world.staff);
    expect(r.status).toBe(200);
    // The eight measured lamps and the probe itself.
    expect(r.body.adopted.lamps).toBe(9);
    expect(r.body.adopted.points[0]).toEqual([0, 1]);
    // The adoption marked the type's lamps out of date in its transaction.
    expect((await Lamp.findByPk(probe.id))!.outlookVersion).toBeGreaterThan(version);
    const row = (await LampCurveAdoption.findOne({ where: { lampTypeId: type.id } }))!;
    expect(row.adoptedById).toBe(world.staff.id);
    expect(JSON.parse(row.fitJson).kind).toMatch(/exponential|two-phase/);

    await refreshOutlooks([probe.id]);
    const after = await stored();
    expect(after.json.ageing).toBe('Ageing: your shop’s measured curve for this type, 9 lamps.');
    // The steeper measured curve leaves less of the lamp's output today than the catalogue's did.
    expect(after.json.remainingFraction).toBeLessThan(before.json.remainingFraction - 0.05);

    const verdictAfter = (await counter()).body.answer.verdict;
    expect(verdictAfter.kind).toBe('test-again');
    expect(verdictAfter.testAgainOn < verdictBefore.testAgainOn).toBe(true);
    expect(verdictAfter.uncertainty).toContain('Ageing: your shop’s measured curve for this type, 9 lamps.');

    // Back to the catalogue: the record stays, withdrawn by whom and when.
    expect((await withdraw(world.owner)).status).toBe(200);
    await refreshOutlooks([probe.id]);
    expect((await stored()).json.ageing).toBe('Ageing: the catalogue’s curve for this type.');
    expect((await stored()).json.remainingFraction).toBeCloseTo(before.json.remainingFraction, 6);
    expect((await counter()).body.answer.verdict.kind).toBe('keep');
    await row.reload();
    expect(row.withdrawnById).toBe(world.owner.id);
    expect(row.withdrawnAt).not.toBeNull();
    const history = (await get(world.owner)).body.history;
    expect(history).toHaveLength(1);
    expect(history[0].adoptedBy).toBe(world.staff.name);
  });

  it('is offered in the design studio of its own organisation only, with the adopted table', async () => {
    await measuredLamps();
    // Before adoption the studio offers nothing from the catalogue: every type ages by the catalogue.
    expect(await studioOffer(world.keeper, world.shop.id)).toEqual([]);
    const adopted = (await adopt(world.staff)).body.adopted as { points: [number, number][]; lamps: number };
    for (const member of [world.owner, world.staff, world.keeper]) {
      const offered = await studioOffer(member, world.shop.id);
      expect(offered.map((t) => t.id)).toEqual([String(type.id)]);
      expect(offered[0]!.lamps).toBe(adopted.lamps);
      expect(offered[0]!.name).toBe(type.name);
      expect(offered[0]!.lamp).toMatchObject({ tech: type.tech, form: type.form, uvbAt30: type.uvbAt30 });
      expect(offered[0]!.lamp.decay).toEqual({ points: adopted.points });
    }
    // Another organisation's member learns nothing of this shop's catalogue, nor sees it in their own.
    expect(await studioOffer(world.outsider, world.shop.id)).toEqual([]);
    expect(await studioOffer(world.outsider, world.otherOrg.id)).toEqual([]);
    // A lamp the guided start placed of this type is recognised as ageing by the adopted curve.
    const offered = await studioOffer(world.owner, world.shop.id);
    const copy = adopted.points.map(([m, f]): [number, number] => [m, f]);
    const placed = { ...offered[0]!.lamp, id: 'uv1', decay: { points: copy } };
    expect(matchingCatalogueCurve(placed, offered)?.id).toBe(String(type.id));
    // Withdrawn: the studio stops offering it.
    await withdraw(world.owner);
    expect(await studioOffer(world.owner, world.shop.id)).toEqual([]);
  });
});
