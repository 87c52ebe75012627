import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

export const JOB_OUTCOMES = ['running', 'succeeded', 'partial', 'failed', 'abandoned'] as const;
/**
 * `partial`: the run finished but some units of work failed (they are retried later); `failed`: the run
 * itself stopped with an error; `abandoned`: its process died while running (found by the next run).
 */
export type JobOutcome = (typeof JOB_OUTCOMES)[number];

export type JobCounts = Record<string, number>;

/** Counts as stored (JSON text); an unreadable value reads as no counts rather than failing a page. */
export function parseCounts(json: string): JobCounts {
  try {
    const v = JSON.parse(json) as unknown;
    if (!v || typeof v !== 'object' || Array.isArray(v)) return {};
    return Object.fromEntries(Object.entries(v).filter(([, n]) => typeof n === 'number')) as JobCounts;
  } catch {
    return {};
  }
}

/** One run of a background job (lib/jobs). */
export class JobRun extends Model<InferAttributes<JobRun>, InferCreationAttributes<JobRun>> {
  declare id: CreationOptional<number>;
  declare job: string;
  declare startedAt: Date;
  declare finishedAt: CreationOptional<Date | null>;
  declare outcome: JobOutcome;
  declare countsJson: string;
  declare error: CreationOptional<string | null>;
  /** Which machine and process ran it, for reading the logs. */
  declare host: string;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static register(sequelize: Sequelize) {
    JobRun.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        job: { type: DataTypes.STRING(60), allowNull: false },
        startedAt: { type: DataTypes.DATE(3), allowNull: false },
        finishedAt: { type: DataTypes.DATE(3), allowNull: true },
        outcome: { type: DataTypes.ENUM(...JOB_OUTCOMES), allowNull: false },
        countsJson: { type: DataTypes.TEXT, allowNull: false },
        error: { type: DataTypes.TEXT, allowNull: true },
        host: { type: DataTypes.STRING(120), allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'job_runs' },
    );
  }
}

/** A run's counts for one organisation: what an owner may see of a run that served everyone. */
export class JobRunCount extends Model<InferAttributes<JobRunCount>, InferCreationAttributes<JobRunCount>> {
  declare id: CreationOptional<number>;
  declare jobRunId: number;
  declare organisationId: number;
  declare countsJson: string;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static register(sequelize: Sequelize) {
    JobRunCount.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        jobRunId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        organisationId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        countsJson: { type: DataTypes.TEXT, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'job_run_counts' },
    );
  }
}

/**
 * A unit of work that failed (one keeper's message, one lamp's due state): kept until it succeeds, and
 * not tried again before `nextAttemptAt` (back-off), so one bad unit neither stops a run nor is hammered.
 */
export class JobUnit extends Model<InferAttributes<JobUnit>, InferCreationAttributes<JobUnit>> {
  declare id: CreationOptional<number>;
  declare job: string;
  declare unitKey: string;
  declare organisationId: number | null;
  /** What the unit is, in words an owner understands ("Reminder e-mail to Ann Example"). */
  declare label: string;
  declare attempts: number;
  declare nextAttemptAt: Date;
  declare lastError: string;
  declare lastRunId: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static register(sequelize: Sequelize) {
    JobUnit.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        job: { type: DataTypes.STRING(60), allowNull: false },
        unitKey: { type: DataTypes.STRING(160), allowNull: false },
        organisationId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        label: { type: DataTypes.STRING(250), allowNull: false },
        attempts: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        nextAttemptAt: { type: DataTypes.DATE(3), allowNull: false },
        lastError: { type: DataTypes.TEXT, allowNull: false },
        lastRunId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'job_units' },
    );
  }
}
