// `npm run --silent bench:reminders [-- --lamps 8000 --keepers 4 --keep]`: the reminder job on one busy
// organisation. Creates an organisation of example data (invented keepers, each responsible for an equal
// share of the lamps, a quarter of the lamps with three meter readings, the rest new and never measured,
// so every lamp is due for a test or a replacement), then runs `npm run reminders` twice as a separate
// process — the second run must send nothing — and prints the times and counts; last line is JSON.
// Uses the configured database (.env) and its mail server; removes the organisation again unless --keep.
import { spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import { parseArgs } from 'node:util';
import bcrypt from 'bcryptjs';
import { closeSequelize } from '@/lib/db';
import { addDays, todayIso } from '@/lib/lamp-log/dates';
import { seedStartingCatalogue } from '@/lib/species/seed';
import { Enclosure, Lamp, LampType, MailMessage, Membership, Organisation, Reading, User } from '@/models';

if (existsSync('.env')) process.loadEnvFile('.env');

const { values } = parseArgs({
  options: {
    lamps: { type: 'string', default: '8000' },
    keepers: { type: 'string', default: '4' },
    keep: { type: 'boolean', default: false },
  },
});
const LAMPS = Number(values.lamps);
const KEEPERS = Number(values.keepers);
const PER_ENCLOSURE = 10;
const stamp = Date.now().toString(36);

async function seed() {
  const org = await Organisation.create({ name: `Example data: busy shop ${stamp} (reminder load test)` });
  await seedStartingCatalogue(org.id);
  const t5 = (await LampType.findOne({ where: { organisationId: org.id, tech: 't5' } }))!;
  const passwordHash = await bcrypt.hash(`example-${stamp}-not-for-sign-in`, 4);
  const keepers: User[] = [];
  for (let k = 0; k < KEEPERS; k++) {
    const user = await User.create({
      email: `example.keeper.${stamp}.${k + 1}@example.com`,
      name: `Example keeper ${k + 1}`,
      passwordHash,
    });
    await Membership.create({ organisationId: org.id, userId: user.id, role: 'keeper' });
    keepers.push(user);
  }
  const enclosures = await Enclosure.bulkCreate(
    Array.from({ length: Math.ceil(LAMPS / PER_ENCLOSURE) }, (_, e) => ({
      organisationId: org.id,
      keeperId: keepers[e % KEEPERS]!.id,
      name: `Example enclosure ${e + 1}`,
      widthCm: 120,
      heightCm: 60,
      depthCm: 60,
      speciesName: 'Bearded dragon',
      animalName: null,
      notes: 'Example data for the reminder load test.',
    })),
  );
  const today = todayIso();
  const lamps: Lamp[] = [];
  for (let from = 0; from < LAMPS; from += 1000) {
    lamps.push(
      ...(await Lamp.bulkCreate(
        Array.from({ length: Math.min(1000, LAMPS - from) }, (_, k) => {
          const i = from + k;
          return {
            enclosureId: enclosures[Math.floor(i / PER_ENCLOSURE)]!.id,
            lampTypeId: t5.id,
            label: `Example tube ${i + 1}`,
            firstUsedOn: addDays(today, i % 4 === 0 ? -400 : -3),
            hoursPerDay: 12,
            baskingDistanceCm: 30,
            createdById: null,
          };
        }),
      )),
    );
  }
  // A quarter of the lamps are old and measured in decline (due for replacement).
  const measured = lamps.filter((_, i) => i % 4 === 0);
  for (let from = 0; from < measured.length; from += 500) {
    await Reading.bulkCreate(
      measured.slice(from, from + 500).flatMap((lamp) =>
        (
          [
            [-400, 160],
            [-250, 100],
            [-100, 60],
          ] as const
        ).map(([d, v]) => ({
          lampId: lamp.id,
          takenAt: new Date(`${addDays(today, d)}T12:00:00Z`),
          distanceCm: 30,
          value: v,
          unit: 'uvb' as const,
          takenById: null,
        })),
      ),
    );
  }
  return { org, keepers };
}

function reminders(): { seconds: number; line: string; status: number | null } {
  const t0 = performance.now();
  // As `npm run reminders` runs it (server modules' `import 'server-only'` resolves to nothing here).
  const r = spawnSync('npx', ['tsx', '--import', './scripts/lib/server-only.mjs', 'scripts/reminders.ts'], {
    encoding: 'utf8',
    env: { ...process.env, LOG_LEVEL: 'warn' },
  });
  const seconds = (performance.now() - t0) / 1000;
  if (r.stderr.trim()) process.stderr.write(r.stderr);
  return { seconds, line: r.stdout.trim().split('\n').pop() ?? '', status: r.status };
}

const t0 = performance.now();
const { org, keepers } = await seed();
const seedSeconds = (performance.now() - t0) / 1000;
console.log(
  `seeded ${LAMPS} lamps for ${KEEPERS} keepers in ${seedSeconds.toFixed(1)} s (organisation #${org.id})`,
);
const first = reminders();
console.log(`first run (${first.seconds.toFixed(1)} s wall, exit ${first.status}): ${first.line}`);
const second = reminders();
console.log(`second run (${second.seconds.toFixed(1)} s wall, exit ${second.status}): ${second.line}`);
const messages = await MailMessage.findAll({ where: { organisationId: org.id } });
const perKeeper = keepers.map((k) => messages.filter((m) => m.toUserId === k.id).length);
const longest = Math.max(...messages.map((m) => m.body.length));
if (!values.keep) {
  try {
    await MailMessage.destroy({ where: { id: messages.map((m) => m.id) } });
    await Organisation.destroy({ where: { id: org.id } });
    await User.destroy({ where: { id: keepers.map((k) => k.id) } });
  } catch (e) {
    console.error(
      `could not remove the example organisation #${org.id}: ${e instanceof Error ? e.message : e}`,
    );
  }
}
await closeSequelize();
console.log(
  JSON.stringify({
    lamps: LAMPS,
    keepers: KEEPERS,
    firstRunSeconds: Number(first.seconds.toFixed(2)),
    secondRunSeconds: Number(second.seconds.toFixed(2)),
    messagesPerKeeper: perKeeper,
    sent: messages.filter((m) => m.status === 'sent').length,
    longestBodyChars: longest,
  }),
);
