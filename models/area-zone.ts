import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";

export type PlanPoint = { x: number; y: number };

/** An acting area drawn on the plot as a polygon in plan metres (read by the coverage study). */
export class AreaZone extends Model<InferAttributes<AreaZone>, InferCreationAttributes<AreaZone>> {
  declare id: CreationOptional<number>;
  declare productionId: number;
  declare name: string;
  declare polygon: PlanPoint[];
  declare version: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initAreaZone(sequelize: Sequelize) {
  AreaZone.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      productionId: { type: DataTypes.INTEGER, allowNull: false },
      name: { type: DataTypes.STRING(60), allowNull: false },
      // MariaDB stores JSON as text; parse on the way out so callers always get an array.
      polygon: {
        type: DataTypes.JSON,
        allowNull: false,
        get(this: AreaZone) {
          const raw = this.getDataValue("polygon") as unknown;
          return (typeof raw === "string" ? JSON.parse(raw) : raw) as PlanPoint[];
        },
      },
      version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: "area_zones", underscored: true },
  );
}
