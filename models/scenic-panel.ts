import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";

/** A flat piece of scenery for the shadow study: a segment on the plan standing up to a height. */
export class ScenicPanel extends Model<InferAttributes<ScenicPanel>, InferCreationAttributes<ScenicPanel>> {
  declare id: CreationOptional<number>;
  declare productionId: number;
  declare name: string;
  declare x1: number;
  declare y1: number;
  declare x2: number;
  declare y2: number;
  declare height: number;
  declare version: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initScenicPanel(sequelize: Sequelize) {
  ScenicPanel.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      productionId: { type: DataTypes.INTEGER, allowNull: false },
      name: { type: DataTypes.STRING(60), allowNull: false },
      x1: { type: DataTypes.DOUBLE, allowNull: false },
      y1: { type: DataTypes.DOUBLE, allowNull: false },
      x2: { type: DataTypes.DOUBLE, allowNull: false },
      y2: { type: DataTypes.DOUBLE, allowNull: false },
      height: { type: DataTypes.DOUBLE, allowNull: false },
      version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: "scenic_panels", underscored: true },
  );
}
