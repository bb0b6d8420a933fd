import { ELECTRICAL_CODES, SUPPLY_SYSTEMS, type ElectricalCode, type SupplySystem } from "./electrical-options";
import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";

export type DisplayUnits = "metric" | "imperial";
export type NumberingRule = "from-stage-left" | "from-stage-right";

export class Production extends Model<InferAttributes<Production>, InferCreationAttributes<Production>> {
  declare id: CreationOptional<number>;
  declare name: string;
  declare venue: CreationOptional<string>;
  declare displayUnits: CreationOptional<DisplayUnits>;
  declare datumName: CreationOptional<string>;
  declare headHeight: CreationOptional<number>;
  declare faceHeight: CreationOptional<number>;
  declare showDeckHeight: CreationOptional<number>;
  declare backWallY: CreationOptional<number>;
  declare prosceniumWidth: CreationOptional<number>;
  declare prosceniumHeight: CreationOptional<number>;
  declare stageWidth: CreationOptional<number>;
  declare stageDepth: CreationOptional<number>;
  declare apronDepth: CreationOptional<number>;
  declare voltage: CreationOptional<number>;
  /** Continuous-load factor set for this production; null takes the electrical code's default. */
  declare derating: CreationOptional<number | null>;
  declare electricalCode: CreationOptional<ElectricalCode>;
  declare supplySystem: CreationOptional<SupplySystem>;
  declare cableKgPerM: CreationOptional<number>;
  declare hardwareKgPerUnit: CreationOptional<number>;
  declare numberingRule: CreationOptional<NumberingRule>;
  /** When the owner archived it (off the members' list until restored); null while in use. */
  declare archivedAt: CreationOptional<Date | null>;
  declare version: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initProduction(sequelize: Sequelize) {
  const metres = (defaultValue: number) => ({ type: DataTypes.DOUBLE, allowNull: false, defaultValue });
  Production.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      name: { type: DataTypes.STRING(160), allowNull: false },
      venue: { type: DataTypes.STRING(160), allowNull: false, defaultValue: "" },
      displayUnits: { type: DataTypes.ENUM("metric", "imperial"), allowNull: false, defaultValue: "metric" },
      datumName: { type: DataTypes.STRING(60), allowNull: false, defaultValue: "setting line" },
      headHeight: metres(1.7),
      faceHeight: metres(1.55),
      showDeckHeight: metres(0),
      backWallY: metres(10),
      prosceniumWidth: metres(10),
      prosceniumHeight: metres(6),
      stageWidth: metres(16),
      stageDepth: metres(10),
      apronDepth: metres(1.5),
      voltage: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 230 },
      derating: { type: DataTypes.DOUBLE, allowNull: true, defaultValue: null },
      electricalCode: { type: DataTypes.ENUM(...ELECTRICAL_CODES), allowNull: false, defaultValue: "none" },
      supplySystem: { type: DataTypes.ENUM(...SUPPLY_SYSTEMS), allowNull: false, defaultValue: "by-hand" },
      cableKgPerM: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0.5 },
      hardwareKgPerUnit: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 1 },
      numberingRule: {
        type: DataTypes.ENUM("from-stage-left", "from-stage-right"),
        allowNull: false,
        defaultValue: "from-stage-left",
      },
      archivedAt: { type: DataTypes.DATE, allowNull: true, defaultValue: null },
      version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: "productions", underscored: true },
  );
}
