import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { ReadingUnit } from './reading';
import type { ReadingThrough, ReadingWarmedUp } from '@/shared/reading-setup';
import { READING_THROUGH, READING_WARMED_UP } from '@/shared/reading-setup';
import { READING_UNITS } from './reading';

/**
 * A lamp a customer brought to the counter: its lamp type, age and use, and (optionally) the species and
 * basking distance at home. `customerId` is null for a walk-in kept without a record, and after the
 * customer was deleted: the lamp and its readings stay, anonymous.
 */
export class CounterLamp extends Model<InferAttributes<CounterLamp>, InferCreationAttributes<CounterLamp>> {
  declare id: CreationOptional<number>;
  declare organisationId: number;
  declare customerId: number | null;
  declare lampTypeId: number;
  declare label: CreationOptional<string | null>;
  /** Date of first use (YYYY-MM-DD); approximate when `firstUsedEstimated`. */
  declare firstUsedOn: string;
  declare firstUsedEstimated: CreationOptional<boolean>;
  declare hoursPerDay: number;
  declare speciesSheetId: CreationOptional<number | null>;
  /** Distance from the lamp to the basking spot at home, cm. */
  declare baskingDistanceCm: CreationOptional<number | null>;
  /** Share of UVB passing what lies between lamp and basking spot at home; null: nothing. */
  declare baskingTransmission: CreationOptional<number | null>;
  declare createdById: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static register(sequelize: Sequelize) {
    CounterLamp.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        organisationId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        customerId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        lampTypeId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        label: { type: DataTypes.STRING(120), allowNull: true },
        firstUsedOn: { type: DataTypes.DATEONLY, allowNull: false },
        firstUsedEstimated: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        hoursPerDay: { type: DataTypes.DOUBLE, allowNull: false },
        speciesSheetId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        baskingDistanceCm: { type: DataTypes.DOUBLE, allowNull: true },
        baskingTransmission: { type: DataTypes.DOUBLE, allowNull: true },
        createdById: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'counter_lamps' },
    );
  }
}

export const COUNTER_VERDICTS = ['keep', 'test-again', 'replace', 'no-verdict'] as const;
export type CounterVerdictKind = (typeof COUNTER_VERDICTS)[number];

/** One meter reading taken at the counter, with the same set-up fields as a lamp-log reading. */
export class CounterReading extends Model<
  InferAttributes<CounterReading>,
  InferCreationAttributes<CounterReading>
> {
  declare id: CreationOptional<number>;
  declare counterLampId: number;
  declare takenAt: Date;
  declare distanceCm: number;
  declare value: number;
  declare unit: ReadingUnit;
  declare through: CreationOptional<ReadingThrough>;
  declare throughTransmission: CreationOptional<number | null>;
  declare warmedUp: CreationOptional<ReadingWarmedUp>;
  declare meter: CreationOptional<string | null>;
  declare verdict: CounterVerdictKind;
  declare testAgainOn: CreationOptional<string | null>;
  declare takenById: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static register(sequelize: Sequelize) {
    CounterReading.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        counterLampId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        takenAt: { type: DataTypes.DATE, allowNull: false },
        distanceCm: { type: DataTypes.DOUBLE, allowNull: false },
        value: { type: DataTypes.DOUBLE, allowNull: false },
        unit: { type: DataTypes.ENUM(...READING_UNITS), allowNull: false },
        through: { type: DataTypes.ENUM(...READING_THROUGH), allowNull: false, defaultValue: 'not-recorded' },
        throughTransmission: { type: DataTypes.DOUBLE, allowNull: true },
        warmedUp: {
          type: DataTypes.ENUM(...READING_WARMED_UP),
          allowNull: false,
          defaultValue: 'not-recorded',
        },
        meter: { type: DataTypes.STRING(160), allowNull: true },
        verdict: { type: DataTypes.ENUM(...COUNTER_VERDICTS), allowNull: false },
        testAgainOn: { type: DataTypes.DATEONLY, allowNull: true },
        takenById: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'counter_readings' },
    );
  }
}
