import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";

/** One recorded change: who changed what, with the row before and after (the basis of revisions). */
export class ChangeEntry extends Model<InferAttributes<ChangeEntry>, InferCreationAttributes<ChangeEntry>> {
  declare id: CreationOptional<number>;
  declare productionId: number;
  declare userId: number | null;
  declare entity: string;
  declare entityId: number | null;
  declare action: "create" | "update" | "delete";
  declare before: Record<string, unknown> | null;
  declare after: Record<string, unknown> | null;
  declare createdAt: CreationOptional<Date>;
}

export function initChangeEntry(sequelize: Sequelize) {
  ChangeEntry.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      productionId: { type: DataTypes.INTEGER, allowNull: false },
      userId: { type: DataTypes.INTEGER, allowNull: true },
      entity: { type: DataTypes.STRING(40), allowNull: false },
      entityId: { type: DataTypes.INTEGER, allowNull: true },
      action: { type: DataTypes.ENUM("create", "update", "delete"), allowNull: false },
      before: { type: DataTypes.JSON, allowNull: true },
      after: { type: DataTypes.JSON, allowNull: true },
      createdAt: DataTypes.DATE,
    },
    { sequelize, tableName: "change_entries", underscored: true, updatedAt: false },
  );
}
