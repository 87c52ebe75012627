// Run by crash-saves.test.ts in a process of its own (tsx), against a throwaway MariaDB the test kills
// with SIGKILL. It migrates that database, makes a staff member, an enclosure and a set of variants, then
// streams saves through the real PUT /api/variants/[id] handler — several workers, each saving its own
// variants one after another and carrying the version forward, as a studio does.
//
// stdout is one JSON object a line, which the test reads as it comes:
//   {ev:'ready', variants:[ids]}                      the world exists, saving starts
//   {ev:'try', v, base, seq, sha}                     a save is about to be sent (sha of the exact JSON stored)
//   {ev:'ack', v, version, seq, sha}                  the handler answered 200: the save is acknowledged
//   {ev:'fail', v, seq, status, retryAfter, code, ms} any other answer (503 while the database is down)
//   {ev:'stale', v, seq, current}                     409: an unacknowledged save did land; carry on from it
//   {ev:'paused'} / {ev:'done', ...counts}
// stdin takes commands, one a line: `pause` (finish the saves in flight, start no more), `resume`, `stop`.
import { createHash } from 'node:crypto';
import { createInterface } from 'node:readline';
import bcrypt from 'bcryptjs';
import * as enclosureDesigns from '@/app/api/enclosures/[id]/designs/route';
import * as designVariants from '@/app/api/designs/[id]/variants/route';
import * as variantItem from '@/app/api/variants/[id]/route';
import { getSequelize } from '@/lib/db';
import { migrateUp } from '@/lib/migrate';
import { serializeDesign } from '@/lib/variants/stored-design';
import { Enclosure, Membership, Organisation, User } from '@/models';
import { parseDesign, type Design } from '@/simulation';
import { EXAMPLE_DESIGN } from '@/simulation/testing/fixtures';
import { ORIGIN, sessionCookie } from '../api/http';

type Handler = (req: Request, ctx: { params: Promise<Record<string, string>> }) => Promise<Response>;

const WORKERS = Number(process.env.CRASH_WORKERS ?? 4);
const VARIANTS_PER_WORKER = Number(process.env.CRASH_VARIANTS_PER_WORKER ?? 3);

const emit = (o: Record<string, unknown>) => process.stdout.write(`${JSON.stringify(o)}\n`);

async function call(handler: Handler, method: string, p: string, id: number, cookie: string, body?: unknown) {
  const req = new Request(`${ORIGIN}${p}`, {
    method,
    headers: {
      origin: ORIGIN,
      cookie,
      ...(body === undefined ? {} : { 'content-type': 'application/json' }),
    },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  const res = await handler(req, { params: Promise.resolve({ id: String(id) }) });
  const text = await res.text();
  let json: any = null; // eslint-disable-line @typescript-eslint/no-explicit-any -- each caller reads its own shape
  try {
    json = JSON.parse(text);
  } catch {
    /* not JSON: reported by status */
  }
  return { status: res.status, json, retryAfter: res.headers.get('retry-after') };
}

/**
 * The design of save number `seq`: every object carries the number in its name and the lamps move with
 * it, so a stored document mixing two saves, or cut short, can never match any one acknowledged save.
 */
function designFor(seq: number): Design {
  return {
    ...EXAMPLE_DESIGN,
    objects: EXAMPLE_DESIGN.objects.map((o, i) => ({
      ...o,
      name: `save ${seq} object ${i} ${'x'.repeat(seq % 97)}`,
      ...(o.type === 'lamp' ? { x: 10 + ((seq * 7 + i * 13) % 100) } : {}),
    })),
  } as Design;
}

/** The exact text the save path stores (the engine's parser, then the same serialiser). */
function storedText(design: Design): string {
  const r = parseDesign(design);
  if (!r.ok) throw new Error(`test design does not validate: ${r.error.path} ${r.error.message}`);
  return serializeDesign(r.design);
}

async function makeWorld() {
  const sequelize = getSequelize();
  await migrateUp(sequelize);
  const org = await Organisation.create({ name: 'Crash test rooms' });
  const staff = await User.create({
    email: `crash-${Date.now()}@example.com`,
    name: 'Crash Tester',
    passwordHash: await bcrypt.hash('crash-test-password', 4),
  });
  await Membership.create({ organisationId: org.id, userId: staff.id, role: 'staff' });
  const enclosure = await Enclosure.create({
    organisationId: org.id,
    keeperId: staff.id,
    name: 'Crash enclosure',
    widthCm: 120,
    heightCm: 60,
    depthCm: 60,
    speciesName: null,
    animalName: null,
    notes: null,
  });
  const cookie = await sessionCookie(staff);
  const made = await call(
    enclosureDesigns.POST as Handler,
    'POST',
    `/api/enclosures/${enclosure.id}/designs`,
    enclosure.id,
    cookie,
    { name: 'Crash design', design: designFor(0) },
  );
  if (made.status !== 201) throw new Error(`creating the design answered ${made.status}`);
  const variants: number[] = [made.json.variant.id];
  while (variants.length < WORKERS * VARIANTS_PER_WORKER) {
    const v = await call(
      designVariants.POST as Handler,
      'POST',
      `/api/designs/${made.json.design.id}/variants`,
      made.json.design.id,
      cookie,
      { name: `Crash ${variants.length + 1}`, design: designFor(0) },
    );
    if (v.status !== 201) throw new Error(`creating a variant answered ${v.status}`);
    variants.push(v.json.variant.id);
  }
  return { cookie, variants };
}

async function main() {
  const { cookie, variants } = await makeWorld();
  let paused = false;
  let stopping = false;
  let seq = 0;
  const counts = { acks: 0, fails: 0, stale: 0 };
  const inFlight = new Set<Promise<void>>();

  const commands = createInterface({ input: process.stdin });
  // The test gone (its end of stdin closed): stop too rather than save on forever.
  commands.on('close', () => (stopping = true));
  commands.on('line', (line) => {
    const cmd = line.trim();
    if (cmd === 'pause') {
      // Workers check the flag before each save; the ones already sent are waited for.
      paused = true;
      void Promise.all(inFlight).then(() => emit({ ev: 'paused' }));
    } else if (cmd === 'resume') paused = false;
    else if (cmd === 'stop') stopping = true;
  });

  async function worker(mine: number[]) {
    const versions = new Map(mine.map((id) => [id, 1]));
    for (let turn = 0; !stopping; turn++) {
      if (paused) {
        await new Promise((r) => setTimeout(r, 50));
        continue;
      }
      const v = mine[turn % mine.length]!;
      const n = ++seq;
      const design = designFor(n);
      const sha = createHash('sha256').update(storedText(design)).digest('hex');
      const base = versions.get(v)!;
      emit({ ev: 'try', v, base, seq: n, sha });
      const t0 = performance.now();
      const save = call(variantItem.PUT as Handler, 'PUT', `/api/variants/${v}`, v, cookie, {
        design,
        baseVersion: base,
      });
      const tracked = save.then(
        () => undefined,
        () => undefined,
      );
      inFlight.add(tracked);
      try {
        const r = await save;
        const ms = Math.round(performance.now() - t0);
        if (r.status === 200) {
          versions.set(v, r.json.variant.version);
          counts.acks++;
          emit({ ev: 'ack', v, version: r.json.variant.version, seq: n, sha });
        } else if (r.status === 409 && r.json?.current) {
          // A save sent before the crash committed but its answer was lost: take the stored version.
          versions.set(v, r.json.current.version);
          counts.stale++;
          emit({ ev: 'stale', v, seq: n, current: r.json.current.version });
        } else {
          counts.fails++;
          emit({
            ev: 'fail',
            v,
            seq: n,
            status: r.status,
            retryAfter: r.retryAfter,
            code: r.json?.error?.code,
            ms,
          });
          await new Promise((res) => setTimeout(res, 150)); // a studio backs off before retrying
        }
      } catch (e) {
        counts.fails++;
        emit({ ev: 'fail', v, seq: n, threw: e instanceof Error ? e.message : String(e) });
      } finally {
        inFlight.delete(tracked);
      }
    }
  }

  emit({ ev: 'ready', variants });
  const groups = Array.from({ length: WORKERS }, (_, w) =>
    variants.slice(w * VARIANTS_PER_WORKER, (w + 1) * VARIANTS_PER_WORKER),
  );
  await Promise.all(groups.map(worker));
  emit({ ev: 'done', ...counts });
}

main().then(
  () => process.exit(0),
  (e) => {
    console.error(e);
    process.exit(1);
  },
);
