import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";

/** dimmed: through a dimmer; non-dim: a dimmer set to switch fully on; constant: a direct (hard) power circuit. */
export const CIRCUIT_POWER = ["dimmed", "non-dim", "constant"] as const;
export type CircuitPower = (typeof CIRCUIT_POWER)[number];

/** A circuit or dimmer with its rating; fixtures name it in their circuit (or dimmer) field. */
export class Circuit extends Model<InferAttributes<Circuit>, InferCreationAttributes<Circuit>> {
  declare id: CreationOptional<number>;
  declare productionId: number;
  declare name: string;
  declare ratingA: number;
  declare phase: string | null;
  declare power: CreationOptional<CircuitPower>;
  declare version: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initCircuit(sequelize: Sequelize) {
  Circuit.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      productionId: { type: DataTypes.INTEGER, allowNull: false },
      name: { type: DataTypes.STRING(20), allowNull: false },
      ratingA: { type: DataTypes.DOUBLE, allowNull: false },
      phase: { type: DataTypes.STRING(8), allowNull: true },
      power: { type: DataTypes.ENUM(...CIRCUIT_POWER), allowNull: false, defaultValue: "dimmed" },
      version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: "circuits", underscored: true },
  );
}
