import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";

/** A named mark on the deck ("Area 3") that several fixtures aim at. */
export class FocusPoint extends Model<InferAttributes<FocusPoint>, InferCreationAttributes<FocusPoint>> {
  declare id: CreationOptional<number>;
  declare productionId: number;
  declare name: string;
  declare x: number;
  declare y: number;
  declare version: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initFocusPoint(sequelize: Sequelize) {
  FocusPoint.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      productionId: { type: DataTypes.INTEGER, allowNull: false },
      name: { type: DataTypes.STRING(60), allowNull: false },
      x: { type: DataTypes.DOUBLE, allowNull: false },
      y: { type: DataTypes.DOUBLE, allowNull: false },
      version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: "focus_points", underscored: true },
  );
}
