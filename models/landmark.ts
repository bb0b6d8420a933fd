import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";

/** A named line on the plot ("lip", "SL leg 1", "header") that focus charts use to word shutter cuts. */
export class Landmark extends Model<InferAttributes<Landmark>, InferCreationAttributes<Landmark>> {
  declare id: CreationOptional<number>;
  declare productionId: number;
  declare name: string;
  declare x1: number;
  declare y1: number;
  declare x2: number;
  declare y2: number;
  declare version: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initLandmark(sequelize: Sequelize) {
  Landmark.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      productionId: { type: DataTypes.INTEGER, allowNull: false },
      name: { type: DataTypes.STRING(60), allowNull: false },
      x1: { type: DataTypes.DOUBLE, allowNull: false },
      y1: { type: DataTypes.DOUBLE, allowNull: false },
      x2: { type: DataTypes.DOUBLE, allowNull: false },
      y2: { type: DataTypes.DOUBLE, allowNull: false },
      version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: "landmarks", underscored: true },
  );
}
