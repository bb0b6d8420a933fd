import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";

/** A device hung on a fixture (scroller, gobo rotator, iris, barn doors …), with its own DMX, power and weight. */
export class Accessory extends Model<InferAttributes<Accessory>, InferCreationAttributes<Accessory>> {
  declare id: CreationOptional<number>;
  declare productionId: number;
  declare fixtureId: number;
  declare kind: string;
  declare universe: number | null;
  declare address: number | null;
  declare footprint: number | null;
  declare wattage: CreationOptional<number>;
  declare weightKg: CreationOptional<number>;
  declare notes: string | null;
  declare version: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initAccessory(sequelize: Sequelize) {
  Accessory.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      productionId: { type: DataTypes.INTEGER, allowNull: false },
      fixtureId: { type: DataTypes.INTEGER, allowNull: false },
      kind: { type: DataTypes.STRING(40), allowNull: false },
      universe: { type: DataTypes.INTEGER, allowNull: true },
      address: { type: DataTypes.INTEGER, allowNull: true },
      footprint: { type: DataTypes.INTEGER, allowNull: true },
      wattage: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0 },
      weightKg: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0 },
      notes: { type: DataTypes.STRING(400), allowNull: true },
      version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: "accessories", underscored: true },
  );
}
