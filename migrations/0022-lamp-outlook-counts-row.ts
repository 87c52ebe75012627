import type { QueryInterface } from 'sequelize';

/**
 * The lamp log's summary ("12 to replace, 30 to test soon", and how many wait to be recomputed) at a
 * cost that does not grow with the organisation.
 *
 * - `lamp_outlook_counts` holds, per organisation, how many stored outlooks have each status and were
 *   computed for each day: a handful of rows an organisation (five statuses × the days rows were
 *   computed for, one day once the daily pass has run), where the grouped COUNT it replaces read one
 *   index entry per lamp.
 * - `lamps.outlook_pending` is 1 while a lamp has no stored outlook of its current `outlook_version`
 *   (a new lamp, or a change not yet recomputed), with an index, so "how many wait" reads the waiting
 *   lamps only instead of comparing every lamp with its outlook.
 *
 * The counts are kept by triggers on `lamp_outlooks`, in the transaction of the write that changes
 * them, so no writer can forget them: the app's recompute, a test or script that inserts outlooks by
 * hand. MariaDB does not fire triggers for rows a foreign key's ON DELETE CASCADE removes, so deleting a
 * lamp or an enclosure first deletes the outlooks it would take with it (whose trigger then counts them
 * out); an organisation's counts go with the organisation by cascade.
 *
 * The flag is set by a trigger on `lamps` whenever `outlook_version` changes (a change recorded by the
 * app's hooks, or a migration that bumps every lamp), and cleared by the app's writer of outlooks
 * (lib/lamp-log/outlook-store.ts) once the row it stored is of the lamp's current version. (A trigger
 * on `lamp_outlooks` cannot clear it: MariaDB refuses a trigger that writes a table its statement reads,
 * and an INSERT … SELECT FROM lamps would then fail.) A flag left set by a crash between the two only
 * makes the lamp log say a lamp is being brought up to date, and the next pass clears it.
 *
 * The counts start from a recount of the stored outlooks. Nothing here holds data a user typed: `down`
 * drops the triggers, the table, the column and its index.
 */

const TRIGGERS = [
  `CREATE TRIGGER lamp_outlooks_count_insert AFTER INSERT ON lamp_outlooks FOR EACH ROW
   BEGIN
     INSERT INTO lamp_outlook_counts (organisation_id, status_rank, as_of, n)
       VALUES (NEW.organisation_id, NEW.status_rank, NEW.as_of, 1)
       ON DUPLICATE KEY UPDATE n = n + 1;
   END`,
  `CREATE TRIGGER lamp_outlooks_count_update AFTER UPDATE ON lamp_outlooks FOR EACH ROW
   BEGIN
     IF NOT (OLD.organisation_id <=> NEW.organisation_id AND OLD.status_rank <=> NEW.status_rank
             AND OLD.as_of <=> NEW.as_of) THEN
       UPDATE lamp_outlook_counts SET n = n - 1
        WHERE organisation_id = OLD.organisation_id AND status_rank = OLD.status_rank AND as_of = OLD.as_of;
       DELETE FROM lamp_outlook_counts
        WHERE organisation_id = OLD.organisation_id AND status_rank = OLD.status_rank AND as_of = OLD.as_of
          AND n <= 0;
       INSERT INTO lamp_outlook_counts (organisation_id, status_rank, as_of, n)
         VALUES (NEW.organisation_id, NEW.status_rank, NEW.as_of, 1)
         ON DUPLICATE KEY UPDATE n = n + 1;
     END IF;
   END`,
  `CREATE TRIGGER lamp_outlooks_count_delete AFTER DELETE ON lamp_outlooks FOR EACH ROW
   BEGIN
     UPDATE lamp_outlook_counts SET n = n - 1
      WHERE organisation_id = OLD.organisation_id AND status_rank = OLD.status_rank AND as_of = OLD.as_of;
     DELETE FROM lamp_outlook_counts
      WHERE organisation_id = OLD.organisation_id AND status_rank = OLD.status_rank AND as_of = OLD.as_of
        AND n <= 0;
   END`,
  // A change to what the outlook is computed from adds one to the version: the stored one is behind.
  `CREATE TRIGGER lamps_outlook_pending BEFORE UPDATE ON lamps FOR EACH ROW
   BEGIN
     IF NEW.outlook_version <> OLD.outlook_version THEN
       SET NEW.outlook_pending = 1;
     END IF;
   END`,
  `CREATE TRIGGER lamps_outlook_uncount BEFORE DELETE ON lamps FOR EACH ROW
     DELETE FROM lamp_outlooks WHERE lamp_id = OLD.id`,
  `CREATE TRIGGER enclosures_outlook_uncount BEFORE DELETE ON enclosures FOR EACH ROW
     DELETE o FROM lamp_outlooks o JOIN lamps l ON l.id = o.lamp_id WHERE l.enclosure_id = OLD.id`,
];

const TRIGGER_NAMES = TRIGGERS.map((t) => /CREATE TRIGGER (\w+)/.exec(t)![1]!);

export async function up({ context: qi }: { context: QueryInterface }) {
  const q = (sql: string) => qi.sequelize.query(sql);
  await q(`CREATE TABLE lamp_outlook_counts (
    organisation_id INT UNSIGNED NOT NULL,
    status_rank TINYINT UNSIGNED NOT NULL,
    as_of DATE NOT NULL,
    n INT NOT NULL,
    PRIMARY KEY (organisation_id, status_rank, as_of),
    CONSTRAINT lamp_outlook_counts_organisation FOREIGN KEY (organisation_id)
      REFERENCES organisations (id) ON DELETE CASCADE
  ) ENGINE=InnoDB`);
  await q(`ALTER TABLE lamps ADD COLUMN outlook_pending TINYINT(1) NOT NULL DEFAULT 1,
           ADD INDEX lamps_outlook_pending (outlook_pending, enclosure_id)`);
  for (const sql of TRIGGERS) await q(sql);
  // From here the triggers keep both; start them from what is stored. A write landing between the
  // triggers' creation and these statements is counted by its trigger and by the recount alike, which
  // is why the recount replaces rather than adds.
  await q(`REPLACE INTO lamp_outlook_counts (organisation_id, status_rank, as_of, n)
           SELECT organisation_id, status_rank, as_of, COUNT(*) FROM lamp_outlooks
            GROUP BY organisation_id, status_rank, as_of`);
  await q(`UPDATE lamps l LEFT JOIN lamp_outlooks o ON o.lamp_id = l.id
              SET l.outlook_pending = (o.lamp_id IS NULL OR o.source_version <> l.outlook_version)`);
}

export async function down({ context: qi }: { context: QueryInterface }) {
  const q = (sql: string) => qi.sequelize.query(sql);
  for (const name of TRIGGER_NAMES) await q(`DROP TRIGGER IF EXISTS ${name}`);
  await q('ALTER TABLE lamps DROP INDEX lamps_outlook_pending, DROP COLUMN outlook_pending');
  await q('DROP TABLE lamp_outlook_counts');
}
