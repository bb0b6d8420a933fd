import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";

/** The column mapping a production last used to import a rig file (keyed by normalised header). */
export class ImportMapping extends Model<InferAttributes<ImportMapping>, InferCreationAttributes<ImportMapping>> {
  declare id: CreationOptional<number>;
  declare productionId: number;
  declare columns: Record<string, string>;
  declare lengthUnit: CreationOptional<"m" | "ft">;
  declare version: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initImportMapping(sequelize: Sequelize) {
  ImportMapping.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      productionId: { type: DataTypes.INTEGER, allowNull: false },
      columns: { type: DataTypes.JSON, allowNull: false },
      lengthUnit: { type: DataTypes.ENUM("m", "ft"), allowNull: false, defaultValue: "m" },
      version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: "import_mappings", underscored: true },
  );
}
