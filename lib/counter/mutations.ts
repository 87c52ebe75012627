import 'server-only';
import { invalid } from '@/lib/errors';

import type { CurrentUser } from '@/lib/auth/session-user';
import { customerFor } from '@/lib/customers/access';
import { getSequelize } from '@/lib/db';
import { todayIso } from '@/lib/lamp-log/dates';
import { CounterLamp, CounterReading, Customer } from '@/models';
import { answerOf, readingsOf, resolveTest, sourceOf, type CounterAnswerDto } from './queries';
import type { SaveTestInput } from './schemas';

/**
 * Saves a counter test: the lamp under its customer (a new customer is added in the same transaction; a
 * walk-in's lamp is kept without one), and the reading with the verdict the customer was given. Testing a
 * kept lamp again adds a reading to it, so it has its own decay fit from then on. Nothing is written when
 * any part is refused.
 */
export async function saveTest(
  user: CurrentUser,
  input: SaveTestInput,
  now = new Date(),
): Promise<{ lampId: number; readingId: number; customerId: number | null; answer: CounterAnswerDto }> {
  const resolved = await resolveTest(user, input, now);
  const answer = answerOf(sourceOf(resolved), readingsOf(resolved), todayIso(now));
  const existingCustomer =
    !resolved.existing && input.customer.kind === 'existing'
      ? await customerFor(user, input.customer.id, 'update')
      : null;
  if (existingCustomer && existingCustomer.organisationId !== input.organisationId) {
    throw invalid('customer.id', 'That customer belongs to another organisation.');
  }
  return getSequelize().transaction(async (transaction) => {
    let customerId = resolved.existing?.customerId ?? existingCustomer?.id ?? null;
    if (!resolved.existing && input.customer.kind === 'new') {
      const c = input.customer;
      const made = await Customer.create(
        {
          organisationId: input.organisationId,
          name: c.name,
          email: c.email,
          phone: c.phone,
          notes: c.notes,
          reminderConsentAt: c.reminderConsent ? now : null,
          createdById: user.id,
        },
        { transaction },
      );
      customerId = made.id;
    }
    const lamp = resolved.existing
      ? await resolved.existing.update(
          {
            hoursPerDay: resolved.lamp.hoursPerDay,
            speciesSheetId: resolved.lamp.speciesSheetId,
            baskingDistanceCm: resolved.lamp.baskingDistanceCm,
            baskingTransmission: resolved.lamp.baskingTransmission,
          },
          { transaction },
        )
      : await CounterLamp.create(
          { ...resolved.lamp, organisationId: input.organisationId, customerId, createdById: user.id },
          { transaction },
        );
    const reading = await CounterReading.create(
      {
        ...resolved.reading,
        counterLampId: lamp.id,
        verdict: answer.verdict.kind,
        testAgainOn: answer.verdict.testAgainOn,
        takenById: user.id,
      },
      { transaction },
    );
    return { lampId: lamp.id, readingId: reading.id, customerId, answer };
  });
}
