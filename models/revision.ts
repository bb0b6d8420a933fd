import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";

import { REVISION_PURPOSES, type RevisionPurpose } from "./revision-purposes";

export { REVISION_PURPOSES, type RevisionPurpose };

/** One issued revision of a production's paperwork, with the snapshot it was issued from (JSON text). */
export class Revision extends Model<InferAttributes<Revision>, InferCreationAttributes<Revision>> {
  declare id: CreationOptional<number>;
  declare productionId: number;
  declare sequence: number;
  declare label: string;
  declare issuedFor: RevisionPurpose;
  declare note: string | null;
  declare issuedByUserId: number | null;
  declare snapshot: string;
  declare summary: string;
  declare createdAt: CreationOptional<Date>;
}

export function initRevision(sequelize: Sequelize) {
  Revision.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      productionId: { type: DataTypes.INTEGER, allowNull: false },
      sequence: { type: DataTypes.INTEGER, allowNull: false },
      label: { type: DataTypes.STRING(40), allowNull: false },
      issuedFor: { type: DataTypes.ENUM(...REVISION_PURPOSES), allowNull: false },
      note: { type: DataTypes.TEXT, allowNull: true },
      issuedByUserId: { type: DataTypes.INTEGER, allowNull: true },
      snapshot: { type: DataTypes.TEXT("long"), allowNull: false },
      summary: { type: DataTypes.TEXT, allowNull: false },
      createdAt: DataTypes.DATE(3),
    },
    { sequelize, tableName: "revisions", underscored: true, updatedAt: false },
  );
}
