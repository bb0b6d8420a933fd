import { POSITION_KINDS, type PositionKind } from "./position-kinds";
import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";

export { POSITION_KINDS, type PositionKind };

/** A hanging position. Line kinds have both ends; point-hung kinds (see POINT_HUNG_KINDS) have x2, y2 null. */
export class Position extends Model<InferAttributes<Position>, InferCreationAttributes<Position>> {
  declare id: CreationOptional<number>;
  declare productionId: number;
  declare name: string;
  declare kind: PositionKind;
  declare x1: number;
  declare y1: number;
  declare x2: number | null;
  declare y2: number | null;
  declare trimHeight: number;
  declare ratedLoadKg: number | null;
  /** Lift lines of a flown pipe, equally spaced, one at each end (for the rigging check). */
  declare liftLines: CreationOptional<number | null>;
  declare sortOrder: CreationOptional<number>;
  declare version: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initPosition(sequelize: Sequelize) {
  Position.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      productionId: { type: DataTypes.INTEGER, allowNull: false },
      name: { type: DataTypes.STRING(80), allowNull: false },
      kind: { type: DataTypes.ENUM(...POSITION_KINDS), allowNull: false },
      x1: { type: DataTypes.DOUBLE, allowNull: false },
      y1: { type: DataTypes.DOUBLE, allowNull: false },
      x2: { type: DataTypes.DOUBLE, allowNull: true },
      y2: { type: DataTypes.DOUBLE, allowNull: true },
      trimHeight: { type: DataTypes.DOUBLE, allowNull: false },
      ratedLoadKg: { type: DataTypes.DOUBLE, allowNull: true },
      liftLines: { type: DataTypes.INTEGER, allowNull: true },
      sortOrder: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
      version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: "positions", underscored: true },
  );
}
