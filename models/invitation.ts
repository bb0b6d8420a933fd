import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";
import { ROLES, type Role } from "./roles";

/** An owner's invitation to join a production with a role; the link's token is stored only as its SHA-256. */
export class Invitation extends Model<InferAttributes<Invitation>, InferCreationAttributes<Invitation>> {
  declare id: CreationOptional<number>;
  declare productionId: number;
  declare email: string;
  declare role: Role;
  declare tokenHash: string;
  declare invitedByUserId: number | null;
  declare expiresAt: Date;
  declare usedAt: CreationOptional<Date | null>;
  declare usedByUserId: CreationOptional<number | null>;
  declare withdrawnAt: CreationOptional<Date | null>;
  declare version: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initInvitation(sequelize: Sequelize) {
  Invitation.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      productionId: { type: DataTypes.INTEGER, allowNull: false },
      email: { type: DataTypes.STRING(254), allowNull: false },
      role: { type: DataTypes.ENUM(...ROLES), allowNull: false },
      tokenHash: { type: DataTypes.CHAR(64), allowNull: false },
      invitedByUserId: { type: DataTypes.INTEGER, allowNull: true },
      expiresAt: { type: DataTypes.DATE(3), allowNull: false },
      usedAt: { type: DataTypes.DATE(3), allowNull: true },
      usedByUserId: { type: DataTypes.INTEGER, allowNull: true },
      withdrawnAt: { type: DataTypes.DATE(3), allowNull: true },
      version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
      createdAt: DataTypes.DATE(3),
      updatedAt: DataTypes.DATE(3),
    },
    { sequelize, tableName: "invitations", underscored: true },
  );
}
