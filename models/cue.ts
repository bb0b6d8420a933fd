import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";

/** A cue. `number` is DECIMAL(10,3), which the driver returns as a string; the data layer converts. */
export class Cue extends Model<InferAttributes<Cue>, InferCreationAttributes<Cue>> {
  declare id: CreationOptional<number>;
  declare productionId: number;
  declare number: string;
  declare label: CreationOptional<string>;
  declare page: string | null;
  declare upTime: CreationOptional<number>;
  declare downTime: number | null;
  declare delay: CreationOptional<number>;
  /** The down fade's own wait; null: it waits as long as the up fade (`delay`). */
  declare downDelay: CreationOptional<number | null>;
  declare follow: number | null;
  declare link: string | null;
  declare block: CreationOptional<boolean>;
  declare callNote: string | null;
  declare version: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export class CueLevel extends Model<InferAttributes<CueLevel>, InferCreationAttributes<CueLevel>> {
  declare id: CreationOptional<number>;
  declare cueId: number;
  declare channel: number;
  declare level: number;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initCue(sequelize: Sequelize) {
  Cue.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      productionId: { type: DataTypes.INTEGER, allowNull: false },
      number: { type: DataTypes.DECIMAL(10, 3), allowNull: false },
      label: { type: DataTypes.STRING(160), allowNull: false, defaultValue: "" },
      page: { type: DataTypes.STRING(20), allowNull: true },
      upTime: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 5 },
      downTime: { type: DataTypes.DOUBLE, allowNull: true },
      delay: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0 },
      downDelay: { type: DataTypes.DOUBLE, allowNull: true },
      follow: { type: DataTypes.DOUBLE, allowNull: true },
      link: { type: DataTypes.DECIMAL(10, 3), allowNull: true },
      block: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
      callNote: { type: DataTypes.TEXT, allowNull: true },
      version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: "cues", underscored: true },
  );
  CueLevel.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      cueId: { type: DataTypes.INTEGER, allowNull: false },
      channel: { type: DataTypes.INTEGER, allowNull: false },
      level: { type: DataTypes.DOUBLE, allowNull: false },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: "cue_levels", underscored: true },
  );
}
