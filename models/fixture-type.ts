import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";
import { LOAD_KINDS, type LoadKindValue } from "./electrical-options";
import { FIXTURE_MOUNTINGS, type FixtureMounting } from "./fixture-mountings";

export type DmxMode = { name: string; footprint: number };

export class FixtureType extends Model<InferAttributes<FixtureType>, InferCreationAttributes<FixtureType>> {
  declare id: CreationOptional<number>;
  declare productionId: number;
  declare name: string;
  declare family: string;
  declare coneMinDeg: number;
  declare coneMaxDeg: number;
  declare defaultSoftnessDeg: CreationOptional<number>;
  declare peakCandela: number;
  /** A zoom's peak at its narrowest cone (peakCandela is at the widest); null: one figure only. */
  declare peakCandelaNarrow: CreationOptional<number | null>;
  declare wattage: CreationOptional<number>;
  declare weightKg: CreationOptional<number>;
  declare dmxModes: DmxMode[];
  declare lensApertureM: CreationOptional<number>;
  declare frameSize: string | null;
  declare goboSize: string | null;
  declare lensDropM: CreationOptional<number>;
  /** Where the lens sits against the trim: under the pipe (less lensDropM), above it (plus lensRiseM), level, or on the floor. */
  declare mounting: CreationOptional<FixtureMounting>;
  declare lensRiseM: CreationOptional<number>;
  /** The room one unit takes along a pipe (centre to centre), used to space units placed on the plot. */
  declare bodyWidthM: CreationOptional<number>;
  /** lamp or switch-mode; null: not said, read from the family (lib/checks/load-kind.ts). */
  declare loadKind: CreationOptional<LoadKindValue | null>;
  declare cells: CreationOptional<number>;
  declare version: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initFixtureType(sequelize: Sequelize) {
  FixtureType.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      productionId: { type: DataTypes.INTEGER, allowNull: false },
      name: { type: DataTypes.STRING(80), allowNull: false },
      family: { type: DataTypes.STRING(24), allowNull: false },
      coneMinDeg: { type: DataTypes.DOUBLE, allowNull: false },
      coneMaxDeg: { type: DataTypes.DOUBLE, allowNull: false },
      defaultSoftnessDeg: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 2 },
      peakCandela: { type: DataTypes.DOUBLE, allowNull: false },
      peakCandelaNarrow: { type: DataTypes.DOUBLE, allowNull: true },
      wattage: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0 },
      weightKg: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0 },
      dmxModes: { type: DataTypes.JSON, allowNull: false },
      lensApertureM: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0.15 },
      frameSize: { type: DataTypes.STRING(40), allowNull: true },
      goboSize: { type: DataTypes.STRING(20), allowNull: true },
      lensDropM: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0.4 },
      mounting: { type: DataTypes.ENUM(...FIXTURE_MOUNTINGS), allowNull: false, defaultValue: "under-hung" },
      lensRiseM: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0.35 },
      bodyWidthM: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0.45 },
      loadKind: { type: DataTypes.ENUM(...LOAD_KINDS), allowNull: true },
      cells: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
      version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: "fixture_types", underscored: true },
  );
}
