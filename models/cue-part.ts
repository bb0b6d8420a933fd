import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";

/** A part of a cue: channels that fade with their own times. Written only with its cue (the cue's version guards it). */
export class CuePart extends Model<InferAttributes<CuePart>, InferCreationAttributes<CuePart>> {
  declare id: CreationOptional<number>;
  declare cueId: number;
  declare part: number;
  declare label: CreationOptional<string>;
  declare upTime: number;
  declare downTime: number | null;
  declare delay: CreationOptional<number>;
  declare channels: number[];
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initCuePart(sequelize: Sequelize) {
  CuePart.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      cueId: { type: DataTypes.INTEGER, allowNull: false },
      part: { type: DataTypes.TINYINT, allowNull: false },
      label: { type: DataTypes.STRING(60), allowNull: false, defaultValue: "" },
      upTime: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 5 },
      downTime: { type: DataTypes.DOUBLE, allowNull: true },
      delay: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0 },
      // MariaDB keeps JSON as text; parse on the way out so callers always get an array.
      channels: {
        type: DataTypes.JSON,
        allowNull: false,
        get() {
          const raw = this.getDataValue("channels") as unknown;
          return (typeof raw === "string" ? JSON.parse(raw) : (raw ?? [])) as number[];
        },
      },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: "cue_parts", underscored: true },
  );
}
