import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";

/** Where a performer stands for the shadow study: a plan point, their height and shoulder width. */
export class PerformerMark extends Model<InferAttributes<PerformerMark>, InferCreationAttributes<PerformerMark>> {
  declare id: CreationOptional<number>;
  declare productionId: number;
  declare name: string;
  declare x: number;
  declare y: number;
  declare height: CreationOptional<number>;
  declare shoulderWidth: CreationOptional<number>;
  declare version: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initPerformerMark(sequelize: Sequelize) {
  PerformerMark.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      productionId: { type: DataTypes.INTEGER, allowNull: false },
      name: { type: DataTypes.STRING(60), allowNull: false },
      x: { type: DataTypes.DOUBLE, allowNull: false },
      y: { type: DataTypes.DOUBLE, allowNull: false },
      height: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 1.75 },
      shoulderWidth: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0.5 },
      version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: "performer_marks", underscored: true },
  );
}
