import 'server-only';
import { organisationName } from '@/lib/organisations/queries';
import { CounterLamp, CounterReading, LampType, MailMessage, SpeciesSheet, type Customer } from '@/models';

/**
 * Everything the shop holds about one customer, for their own request (a copy of their data): their
 * record, their consent to e-mails (when given, when withdrawn, and every e-mail sent to them under it),
 * and their lamps with every reading and the verdict given at each test. Plain JSON, one file.
 */
export async function customerExport(customer: Customer, now = new Date()) {
  const [shop, lamps, mail] = await Promise.all([
    organisationName(customer.organisationId),
    CounterLamp.findAll({
      where: { customerId: customer.id },
      include: [
        { model: LampType, as: 'lampType', required: false, attributes: ['name'] },
        { model: CounterReading, as: 'readings', required: false },
      ],
      order: [['id', 'ASC']],
    }) as Promise<(CounterLamp & { lampType: LampType | null; readings: CounterReading[] })[]>,
    customer.email
      ? MailMessage.findAll({
          where: {
            organisationId: customer.organisationId,
            toEmail: customer.email,
            kind: ['counter-slip', 'counter-reminder'],
          },
          order: [['id', 'ASC']],
        })
      : [],
  ]);
  const sheets = new Map(
    (
      await SpeciesSheet.findAll({
        where: { id: [...new Set(lamps.map((l) => l.speciesSheetId).filter((x): x is number => !!x))] },
        attributes: ['id', 'commonName'],
      })
    ).map((s) => [s.id, s.commonName]),
  );
  return {
    exportedAt: now.toISOString(),
    shop,
    customer: {
      id: customer.id,
      name: customer.name,
      email: customer.email ?? null,
      phone: customer.phone ?? null,
      notes: customer.notes ?? null,
      createdAt: customer.createdAt.toISOString(),
      updatedAt: customer.updatedAt.toISOString(),
    },
    consent: {
      reminderEmails: Boolean(customer.reminderConsentAt),
      givenAt: customer.reminderConsentAt?.toISOString() ?? null,
      withdrawnAt: customer.reminderConsentWithdrawnAt?.toISOString() ?? null,
      emailsSent: mail.map((m) => ({
        kind: m.kind === 'counter-slip' ? 'test slip' : 're-test reminder',
        subject: m.subject,
        to: m.toEmail,
        queuedAt: m.createdAt.toISOString(),
        sentAt: m.sentAt?.toISOString() ?? null,
        status: m.status,
      })),
    },
    lamps: lamps.map((l) => ({
      id: l.id,
      label: l.label ?? null,
      lampType: l.lampType?.name ?? null,
      firstUsedOn: l.firstUsedOn,
      firstUsedEstimated: l.firstUsedEstimated,
      hoursPerDay: l.hoursPerDay,
      species: l.speciesSheetId ? (sheets.get(l.speciesSheetId) ?? null) : null,
      baskingDistanceCm: l.baskingDistanceCm ?? null,
      readings: [...l.readings]
        .sort((a, b) => a.takenAt.getTime() - b.takenAt.getTime())
        .map((r) => ({
          takenAt: r.takenAt.toISOString(),
          distanceCm: r.distanceCm,
          value: r.value,
          unit: r.unit,
          through: r.through,
          throughTransmission: r.throughTransmission ?? null,
          warmedUp: r.warmedUp,
          meter: r.meter ?? null,
          verdict: r.verdict,
          testAgainOn: r.testAgainOn ?? null,
        })),
    })),
  };
}
