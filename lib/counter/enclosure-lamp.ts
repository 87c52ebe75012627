import 'server-only';
import { invalid } from '@/lib/errors';

import type { CurrentUser } from '@/lib/auth/session-user';
import { customerLinkedTo } from '@/lib/customers/keeper-link';
import { todayIso } from '@/lib/lamp-log/dates';
import { lampFor, type LampWithEnclosure } from '@/lib/lamp-log/access';
import { readingFacts } from '@/lib/lamp-log/facts';
import { speciesForEnclosures } from '@/lib/lamp-log/stored-outlooks';
import { LampType, Reading, type Customer } from '@/models';
import { answerOf, readingColumns, type AnswerSource, type CounterAnswerDto } from './queries';
import type { AssessInput, SaveTestInput } from './schemas';

/**
 * A counter test of a lamp that already lives in the enclosure of a keeper linked to a customer. The
 * lamp log's lamp is used as it is (its type, first use, hours and basking spot; the species its
 * enclosure names) and the reading is added to it, so no second, counter copy of the lamp is made and the
 * lamp's own fit and outlook take the reading up. Only a lamp of a keeper linked to a customer of the
 * same organisation is offered: the counter is not a way into every enclosure.
 */

type Resolved = {
  lamp: LampWithEnclosure;
  customer: Customer;
  source: AnswerSource;
  earlier: Reading[];
  reading: ReturnType<typeof readingColumns>;
};

async function resolve(user: CurrentUser, input: AssessInput, now: Date): Promise<Resolved> {
  const lamp = await lampFor(user, input.enclosureLampId!, 'update');
  const { enclosure } = lamp;
  if (enclosure.organisationId !== input.organisationId) {
    throw invalid('enclosureLampId', 'That lamp is in an enclosure of another organisation.');
  }
  const customer = await customerLinkedTo(enclosure.organisationId, enclosure.keeperId);
  if (!customer) {
    throw invalid('enclosureLampId', 'That lamp is not in the enclosure of a keeper linked to a customer.');
  }
  const today = todayIso(now);
  if (lamp.retiredOn) {
    throw invalid('enclosureLampId', `That lamp was retired on ${lamp.retiredOn}: test it as a new lamp.`);
  }
  if (lamp.firstUsedOn > today) {
    throw invalid('enclosureLampId', `That lamp is first used on ${lamp.firstUsedOn}, after today.`);
  }
  const [type, species, earlier] = await Promise.all([
    LampType.findByPk(lamp.lampTypeId),
    speciesForEnclosures([enclosure]),
    Reading.findAll({ where: { lampId: lamp.id }, order: [['takenAt', 'ASC']] }),
  ]);
  if (!type) throw invalid('enclosureLampId', 'That lamp’s type is no longer in the catalogue.');
  const match = species.get(enclosure.id);
  const source: AnswerSource = {
    lampId: lamp.id,
    lamp: {
      lampTypeId: lamp.lampTypeId,
      firstUsedOn: lamp.firstUsedOn,
      firstUsedEstimated: false,
      hoursPerDay: lamp.hoursPerDay,
      speciesSheetId: match?.ok ? match.sheetId : null,
      baskingDistanceCm: lamp.baskingDistanceCm ?? null,
      baskingTransmission: lamp.baskingTransmission ?? null,
      label: lamp.label,
    },
    type,
    species: match?.ok ? { need: match.need, name: match.need.name } : null,
  };
  const reading = readingColumns(input.reading, lamp.baskingTransmission ?? null, now);
  return { lamp, customer, source, earlier, reading };
}

const answerFor = (r: Resolved, now: Date) =>
  answerOf(r.source, [...r.earlier.map(readingFacts), r.reading], todayIso(now));

export async function assessEnclosureLamp(user: CurrentUser, input: AssessInput, now = new Date()) {
  return answerFor(await resolve(user, input, now), now);
}

export type EnclosureLampSaved = {
  lampId: null;
  enclosureLamp: { id: number; enclosureId: number; label: string };
  readingId: number;
  customerId: number;
  answer: CounterAnswerDto;
};

/**
 * Adds the counter's reading to the keeper's lamp in the lamp log (noted as taken at the counter). The
 * lamp log keeps no verdict with a reading: its outlook says the same from the same readings.
 */
export async function saveEnclosureLampTest(
  user: CurrentUser,
  input: SaveTestInput,
  now = new Date(),
): Promise<EnclosureLampSaved> {
  const r = await resolve(user, input, now);
  if (input.customer.kind === 'existing' && input.customer.id !== r.customer.id) {
    throw invalid('customer.id', 'That lamp belongs to the customer linked to its keeper, not this one.');
  }
  const answer = answerFor(r, now);
  const reading = await Reading.create({
    ...r.reading,
    lampId: r.lamp.id,
    takenById: user.id,
    note: 'Taken at the shop’s counter.',
  });
  return {
    lampId: null,
    enclosureLamp: { id: r.lamp.id, enclosureId: r.lamp.enclosureId, label: r.lamp.label },
    readingId: reading.id,
    customerId: r.customer.id,
    answer,
  };
}
