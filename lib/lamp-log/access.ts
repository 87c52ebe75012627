import 'server-only';
import { allow, notFound } from '@/lib/api';
import type { CurrentUser } from '@/lib/auth/session-user';
import { getSequelize } from '@/lib/db';
import type { Action } from '@/lib/permissions';
import { Enclosure, Lamp, Reading } from '@/models';

/**
 * Loading a lamp (or reading) with the enclosure that owns it, then asking `can`. Ownership comes from
 * the enclosure, never from the client; someone who may not see it gets 404.
 */
export type LampWithEnclosure = Lamp & { enclosure: Enclosure };
export type ReadingWithLamp = Reading & { lamp: LampWithEnclosure };

const resource = (e: Enclosure, kind: 'lamp' | 'reading' | 'enclosure') => ({
  kind,
  organisationId: e.organisationId,
  keeperId: e.keeperId,
});

export async function enclosureForLamps(user: CurrentUser, id: number, action: Action): Promise<Enclosure> {
  getSequelize();
  const enclosure = await Enclosure.findByPk(id);
  if (!enclosure) throw notFound('The enclosure');
  allow(user, action, resource(enclosure, 'lamp'), 'The enclosure');
  return enclosure;
}

export async function lampFor(user: CurrentUser, id: number, action: Action): Promise<LampWithEnclosure> {
  getSequelize();
  const lamp = (await Lamp.findByPk(id, {
    include: [{ model: Enclosure, as: 'enclosure', required: true }],
  })) as LampWithEnclosure | null;
  if (!lamp) throw notFound('The lamp');
  allow(user, action, resource(lamp.enclosure, 'lamp'), 'The lamp');
  return lamp;
}

export async function readingFor(user: CurrentUser, id: number, action: Action): Promise<ReadingWithLamp> {
  getSequelize();
  const reading = (await Reading.findByPk(id, {
    include: [
      {
        model: Lamp,
        as: 'lamp',
        required: true,
        include: [{ model: Enclosure, as: 'enclosure', required: true }],
      },
    ],
  })) as ReadingWithLamp | null;
  if (!reading) throw notFound('The reading');
  allow(user, action, resource(reading.lamp.enclosure, 'reading'), 'The reading');
  return reading;
}
