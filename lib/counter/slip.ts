import 'server-only';
import { invalid } from '@/lib/errors';
import { UniqueConstraintError } from 'sequelize';

import { deliverSoon } from '@/lib/auth/mail-soon';
import { config } from '@/lib/config';
import { isExampleData, organisationContact } from '@/lib/organisations/queries';
import { CounterReading, Customer, MailMessage, type CounterLamp } from '@/models';
import type { CounterLampView } from './queries';
import { unsubscribeToken } from '@/lib/customers/unsubscribe-token';
import { slipContent, slipText, type SlipContent } from './slip-content';

/**
 * The test slip: an e-mail to the customer with the lamp, the reading, the verdict, the next test date,
 * the shop and the cautions — only what the test supports — sent through the outbox once per reading,
 * and only to a customer who agreed to e-mails. Every slip carries the one-click link that stops them.
 * The same content is drawn as a one-page PDF (lib/reports/slip-pdf.ts) for the counter to print or hand on.
 */

/** The link in every e-mail to a customer that stops them, without signing in. */
export function unsubscribeUrl(customerId: number): string {
  return new URL(`/api/unsubscribe?token=${unsubscribeToken(customerId)}`, config().APP_URL).toString();
}

/** What the slip of the lamp's latest reading says (the e-mail and the PDF say the same). */
export async function slipContentOf(
  view: CounterLampView,
  customerName: string | null,
): Promise<SlipContent> {
  if (!view.answer || view.readings.length === 0)
    throw invalid('reading', 'This lamp has no reading to report.');
  const [shop, exampleData] = await Promise.all([
    organisationContact(view.organisationId),
    isExampleData(view.organisationId),
  ]);
  return slipContent({
    shop: shop?.name ?? 'The shop',
    contact: shop?.line ?? null,
    customerName,
    lamp: view,
    exampleData,
  });
}

/** The name of the lamp's customer, or null for a lamp kept without one (a walk-in). */
export async function customerNameOf(lamp: CounterLamp): Promise<string | null> {
  if (!lamp.customerId) return null;
  return (await Customer.findByPk(lamp.customerId, { attributes: ['name'] }))?.name ?? null;
}

/** Queues the slip of the lamp's latest reading; null when it was sent before. */
export async function sendSlip(lamp: CounterLamp, view: CounterLampView): Promise<MailMessage | null> {
  const customer = lamp.customerId ? await Customer.findByPk(lamp.customerId) : null;
  if (!customer)
    throw invalid('customer', 'This lamp is kept without a customer: there is nobody to send a slip to.');
  if (!customer.email) throw invalid('customer.email', 'The customer has no e-mail address.');
  if (!customer.reminderConsentAt)
    throw invalid(
      'customer.reminderConsent',
      'The customer has not agreed to e-mails: ask them first, and record it.',
    );
  const last = await CounterReading.findOne({
    where: { counterLampId: lamp.id },
    order: [['takenAt', 'DESC']],
  });
  if (!last || !view.answer) throw invalid('reading', 'This lamp has no reading to report.');
  const { subject, text } = slipText(await slipContentOf(view, customer.name), unsubscribeUrl(customer.id));
  try {
    const message = await MailMessage.create({
      kind: 'counter-slip',
      toEmail: customer.email,
      toUserId: null,
      organisationId: lamp.organisationId,
      subject,
      body: text,
      dedupeKey: `counter-slip:reading:${last.id}`,
    });
    deliverSoon(message.id);
    return message;
  } catch (e) {
    if (e instanceof UniqueConstraintError) return null;
    throw e;
  }
}
