// kill -9 of the database server in the middle of a stream of saves. A MariaDB of this test's own (never
// the shared test instance) takes saves through the real PUT /api/variants/[id] handler, run by
// crash-saves.child.ts in a process of its own; the server is killed with SIGKILL by its pid while saves
// are in flight, restarted on the same data folder, and then:
//   - every acknowledged save is there with exactly its content and version; a save in flight at the kill
//     is either wholly there (one version on) or not at all — never half-written or mixed;
//   - while the server was down the app answered 503 with Retry-After;
//   - the same app process saves again once the server is back, by itself.
import { createHash } from 'node:crypto';
import path from 'node:path';
import mariadb from 'mariadb';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { eventChild, type ChildEvent, type EventChild } from './child-stream';
import { throwawayMariaDB, THROWAWAY_PASSWORD, THROWAWAY_USER, type Throwaway } from './throwaway-mariadb';

const CHILD = path.join(import.meta.dirname, 'crash-saves.child.ts');
const ACKS_BEFORE_KILL = 60;
const ACKS_AFTER_RESTART = 20;

type Try = { v: number; base: number; seq: number; sha: string };
type Ack = { v: number; version: number; seq: number; sha: string };

let db: Throwaway;
let child: EventChild | undefined;

beforeAll(async () => {
  db = await throwawayMariaDB('baskwell_crash_test');
}, 120_000);

afterAll(async () => {
  child?.kill();
  await db?.destroy();
}, 60_000);

const of = <T>(events: ChildEvent[], ev: string) => events.filter((e) => e.ev === ev) as unknown as T[];

describe('kill -9 of the database during a stream of saves', () => {
  it(
    'keeps every acknowledged save whole, answers 503 while down, and recovers by itself',
    { timeout: 300_000 },
    async () => {
      const firstPid = await db.start();
      expect((await db.sql('SELECT @@innodb_flush_log_at_trx_commit')).trim()).toBe('1');
      child = eventChild(CHILD, db.env());
      await child.until('ready', (e) => e.some((x) => x.ev === 'ready'), 120_000);
      const variants = (child.events.find((e) => e.ev === 'ready')!.variants as number[]).slice();

      await child.until(
        `${ACKS_BEFORE_KILL} acknowledged saves`,
        (e) => of(e, 'ack').length >= ACKS_BEFORE_KILL,
        120_000,
      );
      const atKill = child.events.length;
      const answered = new Set(
        child.events.filter((e) => e.ev !== 'try' && 'seq' in e).map((e) => e.seq as number),
      );
      const inFlightAtKill = of<Try>(child.events, 'try').filter((t) => !answered.has(t.seq)).length;
      process.kill(firstPid, 'SIGKILL');

      // Saves sent after the kill fail cleanly while the server is down.
      await child.until(
        'failed saves after the kill',
        (e) => of(e.slice(atKill), 'fail').length >= 8,
        60_000,
      );
      child.send('pause');
      await child.until('the saves in flight to settle', (e) => e.some((x) => x.ev === 'paused'), 60_000);
      expect(db.pid()).toBeNull();

      const acks = of<Ack>(child.events, 'ack');
      const tries = of<Try>(child.events, 'try');
      const stale = of<ChildEvent>(child.events, 'stale');
      expect(stale).toEqual([]); // nothing crossed before the restart: each worker saves its own variants

      const failures = of<ChildEvent>(child.events.slice(atKill), 'fail');
      for (const f of failures) {
        expect(f.threw, JSON.stringify(f)).toBeUndefined();
        expect(f.status, JSON.stringify(f)).toBe(503);
        expect(f.code, JSON.stringify(f)).toBe('unavailable');
        expect(Number(f.retryAfter), JSON.stringify(f)).toBeGreaterThanOrEqual(1);
      }
      const slowest = Math.max(...failures.map((f) => Number(f.ms)));

      // Restart on the same data folder and port: InnoDB replays its redo log.
      const secondPid = await db.start();
      expect(secondPid).not.toBe(firstPid);
      const conn = await mariadb.createConnection({
        host: '127.0.0.1',
        port: db.port,
        user: THROWAWAY_USER,
        password: THROWAWAY_PASSWORD,
        database: db.database,
      });
      let rows: { id: number; version: number; design_json: string }[];
      try {
        const check = (await conn.query('CHECK TABLE variants')) as { Msg_text: string }[];
        expect(check.at(-1)?.Msg_text).toBe('OK');
        rows = await conn.query('SELECT id, version, design_json FROM variants WHERE id IN (?) ORDER BY id', [
          variants,
        ]);
      } finally {
        await conn.end();
      }
      expect(rows.map((r) => r.id)).toEqual([...variants].sort((a, b) => a - b));

      let landedUnacknowledged = 0;
      for (const row of rows) {
        const stored = createHash('sha256').update(row.design_json).digest('hex');
        const mine = acks.filter((a) => a.v === row.id).sort((a, b) => a.version - b.version);
        const last = mine.at(-1);
        const lastVersion = last?.version ?? 1;
        const context = `variant ${row.id}: stored version ${row.version}, last acknowledged ${lastVersion}`;
        // Versions of one variant were acknowledged in order, one apart: none was skipped or lost.
        expect(
          mine.map((a) => a.version),
          context,
        ).toEqual(mine.map((_, i) => i + 2));
        expect(row.version, `${context}: an acknowledged save was lost`).toBeGreaterThanOrEqual(lastVersion);
        if (row.version === lastVersion) {
          if (last) expect(stored, `${context}: content differs from the acknowledged save`).toBe(last.sha);
        } else {
          // One more version: only the save in flight at the kill (sent on the last acknowledged version).
          expect(row.version, context).toBe(lastVersion + 1);
          const pending = tries.filter((t) => t.v === row.id && t.base === lastVersion).map((t) => t.sha);
          expect(pending, `${context}: content matches no save sent on version ${lastVersion}`).toContain(
            stored,
          );
          landedUnacknowledged++;
        }
        expect(() => JSON.parse(row.design_json), context).not.toThrow();
      }

      // The same app process, untouched, saves again now the server is back.
      const atResume = child.events.length;
      child.send('resume');
      await child.until(
        `${ACKS_AFTER_RESTART} saves acknowledged after the restart`,
        (e) => {
          const acked = of<Ack>(e.slice(atResume), 'ack');
          // Every variant saved again, so each one whose last save landed unanswered has met its 409.
          return acked.length >= ACKS_AFTER_RESTART && variants.every((v) => acked.some((a) => a.v === v));
        },
        120_000,
      );
      child.send('stop');
      expect(await child.exited).toBe(0);
      const after = child.events.slice(atResume);
      // A save that landed without its answer makes its worker's next save stale once: a 409, nothing lost.
      expect(of(after, 'stale').length).toBe(landedUnacknowledged);

      console.info(
        `kill -9: ${acks.length} saves acknowledged before the kill over ${variants.length} variants, ` +
          `${inFlightAtKill} in flight at the kill (${landedUnacknowledged} of them landed), ` +
          `${failures.length} answered 503 while down (slowest ${slowest} ms), ` +
          `${of(after, 'ack').length} acknowledged after the restart in the same process`,
      );
    },
  );
});
