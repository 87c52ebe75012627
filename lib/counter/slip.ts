import 'server-only';
import { invalid } from '@/lib/errors';
import { UniqueConstraintError } from 'sequelize';

import { deliverSoon } from '@/lib/auth/mail-soon';
import { config } from '@/lib/config';
import { organisationName } from '@/lib/organisations/queries';
import { CounterReading, Customer, MailMessage, type CounterLamp } from '@/models';
import type { CounterLampView } from './queries';
import { unsubscribeToken } from '@/lib/customers/unsubscribe-token';

/**
 * The test slip: an e-mail to the customer with the lamp, the reading, the verdict, the next test date,
 * the shop and the cautions — only what the test supports — sent through the outbox once per reading,
 * and only to a customer who agreed to e-mails. Every slip carries the one-click link that stops them.
 */

const round = (v: number) => (v >= 10 ? Math.round(v) : Math.round(v * 10) / 10);
const value = (v: number, unit: string) => (unit === 'uvb' ? `${round(v)} µW/cm²` : `UV Index ${round(v)}`);

export function composeSlip(input: {
  shop: string;
  customerName: string;
  lamp: CounterLampView;
  unsubscribeUrl: string;
}): { subject: string; text: string } {
  const { lamp, shop } = input;
  const last = lamp.readings[lamp.readings.length - 1]!;
  const v = lamp.answer!.verdict;
  const lines = [
    `Hello ${input.customerName},`,
    '',
    `${shop} tested your lamp on ${last.takenAt.slice(0, 10)}.`,
    '',
    `Lamp: ${lamp.label ? `${lamp.label} (${lamp.lampTypeName})` : lamp.lampTypeName}, in use since ${lamp.firstUsedEstimated ? 'about ' : ''}${lamp.firstUsedOn}.`,
    `Reading: ${value(last.value, last.unit)} at ${round(last.distanceCm)} cm below the lamp.`,
    ...(v.output
      ? [`Output left: about ${Math.round(v.output.share * 100)} % of a new lamp of this type.`]
      : []),
    ...(v.basking
      ? [
          `At the basking spot at home: about ${value(v.basking.valueNow, v.basking.unit)}; the need is ${v.basking.needLabel}.`,
        ]
      : []),
    '',
    `Verdict: ${v.headline}`,
    ...(v.testAgainOn ? [`Next test: by ${v.testAgainOn}.`] : []),
    '',
    'Please note:',
    ...v.cautions.map((c) => `- ${c}`),
    '',
    `${shop}`,
    '',
    `To stop e-mails about your lamp tests from ${shop}, open this link (no sign-in needed): ${input.unsubscribeUrl}`,
  ];
  return { subject: `Your lamp test at ${shop}: ${v.headline.split(':')[0]}`, text: lines.join('\n') };
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
  const shop = (await organisationName(lamp.organisationId)) ?? 'The shop';
  const unsubscribeUrl = new URL(
    `/api/unsubscribe?token=${unsubscribeToken(customer.id)}`,
    config().APP_URL,
  ).toString();
  const { subject, text } = composeSlip({ shop, customerName: customer.name, lamp: view, unsubscribeUrl });
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
