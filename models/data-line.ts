import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";

/** A DMX data run as the electrician cables it: the units in order, optionally the universe it carries. */
export class DataLine extends Model<InferAttributes<DataLine>, InferCreationAttributes<DataLine>> {
  declare id: CreationOptional<number>;
  declare productionId: number;
  declare name: string;
  declare universe: number | null;
  declare fixtureIds: number[];
  declare version: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initDataLine(sequelize: Sequelize) {
  DataLine.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      productionId: { type: DataTypes.INTEGER, allowNull: false },
      name: { type: DataTypes.STRING(60), allowNull: false },
      universe: { type: DataTypes.INTEGER, allowNull: true },
      fixtureIds: { type: DataTypes.JSON, allowNull: false },
      version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: "data_lines", underscored: true },
  );
}
