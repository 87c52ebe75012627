import { DataTypes, type QueryInterface } from 'sequelize';
import { dropForeignKeys, id, ref, stamps } from './columns';

/**
 * Background jobs get a record of their runs and of the units of work that failed, and the outbox a
 * body that fits any message and a time before which a failed delivery is not retried (back-off).
 *
 * - `job_runs`: one row per run of a job (start, end, outcome, counts, the error that stopped it).
 * - `job_run_counts`: the same counts per organisation, so an owner sees their organisation's share of
 *   a run without seeing anyone else's.
 * - `job_units`: a unit of work (one keeper's message, one lamp's due state) that failed, with its
 *   attempts, last error and the time of its next attempt; the row goes once the unit succeeds.
 * - `mail_messages.body` grows from TEXT (64 KB) to MEDIUMTEXT (16 MB); existing rows are kept as they are.
 *   `next_attempt_at` holds a failed delivery back (back-off); `organisation_id` says whose it is.
 */

export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('job_runs', {
    id: id(),
    job: { type: DataTypes.STRING(60), allowNull: false },
    started_at: { type: DataTypes.DATE(3), allowNull: false },
    finished_at: { type: DataTypes.DATE(3), allowNull: true },
    outcome: {
      type: DataTypes.ENUM('running', 'succeeded', 'partial', 'failed', 'abandoned'),
      allowNull: false,
    },
    counts_json: { type: DataTypes.TEXT, allowNull: false },
    error: { type: DataTypes.TEXT, allowNull: true },
    host: { type: DataTypes.STRING(120), allowNull: false },
    ...stamps(),
  });
  await qi.addIndex('job_runs', ['job', 'started_at'], { name: 'job_runs_job_started' });
  await qi.addIndex('job_runs', ['job', 'outcome', 'finished_at'], { name: 'job_runs_job_outcome' });

  await qi.createTable('job_run_counts', {
    id: id(),
    job_run_id: ref('job_runs', 'CASCADE'),
    organisation_id: ref('organisations', 'CASCADE'),
    counts_json: { type: DataTypes.TEXT, allowNull: false },
    ...stamps(),
  });
  await qi.addIndex('job_run_counts', ['organisation_id', 'job_run_id'], {
    name: 'job_run_counts_organisation',
    unique: true,
  });

  await qi.createTable('job_units', {
    id: id(),
    job: { type: DataTypes.STRING(60), allowNull: false },
    unit_key: { type: DataTypes.STRING(160), allowNull: false },
    organisation_id: ref('organisations', 'CASCADE', true),
    label: { type: DataTypes.STRING(250), allowNull: false },
    attempts: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    next_attempt_at: { type: DataTypes.DATE(3), allowNull: false },
    last_error: { type: DataTypes.TEXT, allowNull: false },
    last_run_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    ...stamps(),
  });
  await qi.addIndex('job_units', ['job', 'unit_key'], { name: 'job_units_job_key', unique: true });
  await qi.addIndex('job_units', ['organisation_id', 'updated_at'], { name: 'job_units_organisation' });

  await qi.sequelize.query('ALTER TABLE mail_messages MODIFY body MEDIUMTEXT NOT NULL');
  await qi.addColumn('mail_messages', 'next_attempt_at', { type: DataTypes.DATE(3), allowNull: true });
  // Which organisation a message concerns, so its owner can see the ones that could not be delivered.
  await qi.addColumn('mail_messages', 'organisation_id', ref('organisations', 'SET NULL', true));
  await qi.addIndex('mail_messages', ['organisation_id', 'status'], { name: 'mail_messages_organisation' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await dropForeignKeys(qi, 'mail_messages', 'organisation_id');
  await qi.sequelize.query('ALTER TABLE mail_messages DROP INDEX mail_messages_organisation');
  await qi.sequelize.query(
    'ALTER TABLE mail_messages DROP COLUMN organisation_id, DROP COLUMN next_attempt_at',
  );
  // A body longer than 64 KB would be cut by going back to TEXT: refuse rather than lose it.
  const [rows] = await qi.sequelize.query(
    'SELECT COUNT(*) AS n FROM mail_messages WHERE LENGTH(body) > 65535',
  );
  if (Number((rows as { n: number }[])[0]?.n ?? 0) > 0) {
    throw new Error('Some e-mail bodies are longer than 64 KB; the body column cannot shrink back to TEXT.');
  }
  await qi.sequelize.query('ALTER TABLE mail_messages MODIFY body TEXT NOT NULL');
  await qi.dropTable('job_units');
  await qi.dropTable('job_run_counts');
  await qi.dropTable('job_runs');
}
