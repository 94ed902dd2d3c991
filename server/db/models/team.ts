import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";
import type { Role } from "@shared/api/teams";

export class Team extends Model<InferAttributes<Team>, InferCreationAttributes<Team>> {
  declare id: CreationOptional<string>;
  declare name: string;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export class Membership extends Model<InferAttributes<Membership>, InferCreationAttributes<Membership>> {
  declare teamId: string;
  declare userId: string;
  declare role: Role;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export class Invitation extends Model<InferAttributes<Invitation>, InferCreationAttributes<Invitation>> {
  declare id: CreationOptional<string>;
  declare teamId: string;
  declare email: string;
  declare role: Role;
  declare tokenHash: string;
  declare invitedBy: string;
  declare expiresAt: Date;
  declare acceptedAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

const uuid = { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 };
const role = { type: DataTypes.TEXT, allowNull: false };

export function initTeamModels(sequelize: Sequelize): void {
  Team.init(
    { id: uuid, name: { type: DataTypes.TEXT, allowNull: false }, createdAt: DataTypes.DATE, updatedAt: DataTypes.DATE },
    { sequelize, tableName: "teams" },
  );
  Membership.init(
    {
      teamId: { type: DataTypes.UUID, primaryKey: true },
      userId: { type: DataTypes.TEXT, primaryKey: true },
      role,
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: "memberships" },
  );
  Invitation.init(
    {
      id: uuid,
      teamId: { type: DataTypes.UUID, allowNull: false },
      email: { type: DataTypes.TEXT, allowNull: false },
      role,
      tokenHash: { type: DataTypes.TEXT, allowNull: false, unique: true },
      invitedBy: { type: DataTypes.TEXT, allowNull: false },
      expiresAt: { type: DataTypes.DATE, allowNull: false },
      acceptedAt: { type: DataTypes.DATE, allowNull: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: "invitations" },
  );
}
