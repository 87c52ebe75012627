// The e-mail server is down: reminders wait in the outbox and go out exactly once when it returns.
// A real SMTP server of this test's own (the project's fake one) on a port that first refuses
// connections (nothing listens), then answers; the reminder job sends through nodemailer as lib/mail
// does, so the refusal is a real ECONNREFUSED, not a thrown stub.
import nodemailer from 'nodemailer';
import { afterAll, describe, expect, it } from 'vitest';
import { addDays, todayIso } from '@/lib/lamp-log/dates';
import type { Mail } from '@/lib/mail';
import { runReminders } from '@/lib/reminders/run';
import { seedStartingCatalogue } from '@/lib/species/seed';
import { Lamp, LampType, MailMessage } from '@/models';
import { startFakeSmtp, type FakeSmtp } from '@/scripts/fake-smtp/server';
import { freePort } from '../helpers/ports';
import { createEnclosure, createMember, createOrganisation, withTestDatabase } from '../helpers/db';

withTestDatabase();

let smtp: FakeSmtp | null = null;
afterAll(async () => {
  await smtp?.close();
});

/** Sends through SMTP on `port` with lib/mail's transport settings. */
function senderTo(port: number) {
  const transport = nodemailer.createTransport({
    host: '127.0.0.1',
    port,
    secure: false,
    connectionTimeout: 5_000,
    greetingTimeout: 5_000,
    socketTimeout: 10_000,
  });
  return async (mail: Mail) => {
    await transport.sendMail({ from: 'Baskwell <no-reply@baskwell.example>', ...mail });
  };
}

describe('e-mail server down', () => {
  it(
    'delays the reminder, then sends it exactly once when the server returns',
    { timeout: 60_000 },
    async () => {
      const org = await createOrganisation('Outage shop');
      await seedStartingCatalogue(org.id);
      const { user: keeper } = await createMember('keeper', org);
      const enclosure = await createEnclosure(org, keeper, {
        name: 'Rainforest tank',
        speciesName: 'Bearded dragon',
      });
      const t5 = (await LampType.findOne({ where: { organisationId: org.id, tech: 't5' } }))!;
      // New and never measured: due for its first test with a meter.
      await Lamp.create({
        enclosureId: enclosure.id,
        lampTypeId: t5.id,
        label: 'Fresh tube',
        firstUsedOn: addDays(todayIso(), -3),
        hoursPerDay: 12,
        createdById: null,
      });
      const port = await freePort();
      const send = senderTo(port);

      // Down: twice, as the hourly job would try (the second time after the first back-off). The message
      // is queued once and kept for later.
      const minutes = (m: number) => new Date(Date.now() + m * 60_000);
      const first = await runReminders({ send });
      expect(first).toMatchObject({ due: 1, queued: 1, sent: 0, failed: 1 });
      const second = await runReminders({ send, now: minutes(6) });
      expect(second).toMatchObject({ queued: 0, sent: 0, failed: 1 });
      const row = (await MailMessage.findOne({ where: { toEmail: keeper.email } }))!;
      expect(row).toMatchObject({ status: 'failed', attempts: 2 });
      expect(row.lastError).toMatch(/ECONNREFUSED/);
      expect(await MailMessage.count()).toBe(1);

      // Back, on the same port.
      smtp = await startFakeSmtp({ smtpPort: port, httpPort: 0, dir: null, quiet: true });
      const back = await runReminders({ send, now: minutes(60) });
      expect(back).toMatchObject({ queued: 0, sent: 1, failed: 0 });
      const again = await runReminders({ send, now: minutes(120) });
      expect(again).toMatchObject({ queued: 0, sent: 0, failed: 0 });

      const received = smtp.store.list({ to: keeper.email });
      expect(received).toHaveLength(1);
      expect(received[0]!.subject).toBe('Baskwell lamp log: 1 lamp to test');
      expect(received[0]!.text).toContain('Fresh tube (Rainforest tank): Test with a meter by');
      await row.reload();
      expect(row).toMatchObject({ status: 'sent', attempts: 3, lastError: null });
      expect(await MailMessage.count()).toBe(1);
    },
  );
});
