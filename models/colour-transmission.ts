import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";

/** One entry of a production's colour list: the colour text as typed in the rig (name) → transmission %. */
export class ColourTransmission extends Model<
  InferAttributes<ColourTransmission>,
  InferCreationAttributes<ColourTransmission>
> {
  declare id: CreationOptional<number>;
  declare productionId: number;
  declare name: string;
  declare percent: number;
  declare version: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initColourTransmission(sequelize: Sequelize) {
  ColourTransmission.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      productionId: { type: DataTypes.INTEGER, allowNull: false },
      name: { type: DataTypes.STRING(120), allowNull: false },
      percent: { type: DataTypes.DOUBLE, allowNull: false },
      version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: "colour_transmissions", underscored: true },
  );
}
