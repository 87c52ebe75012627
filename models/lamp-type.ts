import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import { LAMP_TECH_IDS as ENGINE_LAMP_TECH_IDS } from '@/simulation';

/** The generic lamp technologies of the design file (the design file's `tech`), as the engine defines them. */
export const LAMP_TECH_IDS = ENGINE_LAMP_TECH_IDS;
export type LampTechId = (typeof LAMP_TECH_IDS)[number];

export const LAMP_FORMS = ['tube', 'bulb'] as const;
export type LampForm = (typeof LAMP_FORMS)[number];

/**
 * One entry of an organisation's lamp catalogue: a generic lamp technology with the defaults a new lamp
 * of this kind gets in a design (never a brand or a product). Seeded from the engine's presets; owners
 * and staff may edit entries and add their own. `sourcesJson` holds, per field, where the default comes
 * from, so the catalogue can say which figures are published and which are common practice.
 * Lamps in the lamp log reference this row by `id`.
 */
export class LampType extends Model<InferAttributes<LampType>, InferCreationAttributes<LampType>> {
  declare id: CreationOptional<number>;
  declare organisationId: number;
  declare name: string;
  declare tech: LampTechId;
  declare form: LampForm;
  /** Tubes only: the lit length along the tube, cm. */
  declare lengthCm: number | null;
  /** UVB µW/cm² directly below, 30 cm away, new, bare; 0 for heat-only lamps. */
  declare uvbAt30: number;
  /** UV Index per µW/cm² of broadband UVB for this technology's spectrum. */
  declare uviPerUvb: number;
  /** Share of electrical power leaving as radiant heat (0..1). */
  declare radiantFraction: number;
  /** Full beam angle, degrees (360: bare, all around). */
  declare beamDeg: number;
  declare reflectorGain: number;
  declare watts: number;
  /** Months until UVB output halves (null: no UV output or no decay model). */
  declare halfLifeMonths: number | null;
  /** Decay curve parameters as the engine takes them (JSON; null: the technology's default). */
  declare decayJson: string | null;
  /** The shop's own measured decay curve, when adopted for this type (lib/population/adoption.ts). */
  declare adoptedCurveJson: CreationOptional<string | null>;
  /** Typical replacement interval, months (null: replace on failure). */
  declare replaceAfterMonths: number | null;
  declare notes: string | null;
  /** JSON object: field name -> where the default comes from. */
  declare sourcesJson: string;
  /** The engine preset this entry was seeded from (null: added by the organisation). */
  declare presetKey: string | null;
  declare createdById: number | null;
  declare updatedById: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static register(sequelize: Sequelize) {
    LampType.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        organisationId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        name: { type: DataTypes.STRING(120), allowNull: false },
        tech: { type: DataTypes.ENUM(...LAMP_TECH_IDS), allowNull: false },
        form: { type: DataTypes.ENUM(...LAMP_FORMS), allowNull: false },
        lengthCm: { type: DataTypes.DOUBLE, allowNull: true },
        uvbAt30: { type: DataTypes.DOUBLE, allowNull: false },
        uviPerUvb: { type: DataTypes.DOUBLE, allowNull: false },
        radiantFraction: { type: DataTypes.DOUBLE, allowNull: false },
        beamDeg: { type: DataTypes.DOUBLE, allowNull: false },
        reflectorGain: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 1 },
        watts: { type: DataTypes.DOUBLE, allowNull: false },
        halfLifeMonths: { type: DataTypes.DOUBLE, allowNull: true },
        decayJson: { type: DataTypes.TEXT, allowNull: true },
        adoptedCurveJson: { type: DataTypes.TEXT, allowNull: true },
        replaceAfterMonths: { type: DataTypes.DOUBLE, allowNull: true },
        notes: { type: DataTypes.TEXT, allowNull: true },
        sourcesJson: { type: DataTypes.TEXT, allowNull: false },
        presetKey: { type: DataTypes.STRING(60), allowNull: true },
        createdById: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        updatedById: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'lamp_types' },
    );
  }
}
