import 'server-only';
import { invalid } from '@/lib/errors';

import { getSequelize } from '@/lib/db';
import { Op, type Transaction } from 'sequelize';
import { MAX_ATTEMPTS } from '@/lib/reminders/outbox';
import { CounterLamp, Customer, MailMessage } from '@/models';
import { organisationName } from '@/lib/organisations/queries';
import type { CustomerInput, CustomerPatch } from './schemas';
import { customerOfToken } from './unsubscribe-token';

/** Writes of the shop's customers. Callers check access first (access.ts). */

export async function createCustomer(
  input: CustomerInput,
  userId: number,
  now = new Date(),
): Promise<Customer> {
  return Customer.create({
    organisationId: input.organisationId,
    name: input.name,
    email: input.email,
    phone: input.phone,
    notes: input.notes,
    reminderConsentAt: input.reminderConsent ? now : null,
    createdById: userId,
  });
}

/**
 * Changes what the patch names. Consent keeps its first date while it stands; withdrawing it records
 * when, and giving it again starts a new date. An e-mail address cannot be removed while consent stands.
 */
export async function updateCustomer(customer: Customer, patch: CustomerPatch, now = new Date()) {
  const { reminderConsent, ...fields } = patch;
  const next: Partial<Customer> = { ...fields };
  if (reminderConsent === true && !customer.reminderConsentAt) next.reminderConsentAt = now;
  if (reminderConsent === false && customer.reminderConsentAt) {
    next.reminderConsentAt = null;
    next.reminderConsentWithdrawnAt = now;
  }
  const email = 'email' in next ? next.email : customer.email;
  const consent = 'reminderConsentAt' in next ? next.reminderConsentAt : customer.reminderConsentAt;
  if (consent && !email) throw invalid('email', 'Reminder e-mails need an e-mail address.');
  if (next.reminderConsentAt !== null) return customer.update(next);
  const previousEmail = customer.email;
  return getSequelize().transaction(async (transaction) => {
    await customer.update(next, { transaction });
    await cancelUnsentMail(customer, previousEmail, transaction);
    return customer;
  });
}

/** Withdraws consent to reminder e-mails (the unsubscribe link, or the customer asking). */
export async function withdrawConsent(customer: Customer, now = new Date()) {
  if (!customer.reminderConsentAt) return customer;
  return getSequelize().transaction(async (transaction) => {
    await customer.update({ reminderConsentAt: null, reminderConsentWithdrawnAt: now }, { transaction });
    await cancelUnsentMail(customer, customer.email, transaction);
    return customer;
  });
}

/**
 * A slip or reminder to the customer still waiting in the outbox is not sent once consent is withdrawn:
 * it is marked failed for good, with the reason. (One already being handed to the mail server cannot be
 * called back.)
 */
async function cancelUnsentMail(customer: Customer, email: string | null, transaction: Transaction) {
  if (!email) return;
  await MailMessage.update(
    {
      status: 'failed',
      attempts: MAX_ATTEMPTS,
      nextAttemptAt: null,
      lastError: 'Not sent: the customer withdrew their consent to e-mails.',
    },
    {
      where: {
        organisationId: customer.organisationId,
        toEmail: email,
        kind: ['counter-slip', 'counter-reminder'],
        sentAt: null,
        [Op.or]: [{ status: 'queued', attempts: 0 }, { status: 'failed' }],
      },
      transaction,
    },
  );
}

/**
 * Deletes the person: their row (name, e-mail, phone, notes, consent) goes. Their lamps and readings stay
 * for the shop's own decay curves, without the customer and without the lamp's free-text label (which
 * could name them).
 */
export async function deleteCustomer(customer: Customer): Promise<void> {
  await getSequelize().transaction(async (transaction) => {
    await CounterLamp.update(
      { customerId: null, label: null },
      { where: { customerId: customer.id }, transaction },
    );
    await customer.destroy({ transaction });
  });
}

/**
 * Withdraws consent for the customer a signed unsubscribe token names; the shop's name for the answer,
 * or null when the token does not verify (or its customer is gone).
 */
export async function withdrawConsentByToken(token: string, now = new Date()): Promise<string | null> {
  const id = customerOfToken(token);
  if (id === null) return null;
  const customer = await Customer.findByPk(id);
  if (!customer) return null;
  await withdrawConsent(customer, now);
  return (await organisationName(customer.organisationId)) ?? 'the shop';
}
