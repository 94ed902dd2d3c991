import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";
import type { AuditKind } from "@shared/api/audit";

export class AuditEvent extends Model<InferAttributes<AuditEvent>, InferCreationAttributes<AuditEvent>> {
  declare id: CreationOptional<string>;
  declare teamId: string;
  declare actorId: string | null;
  declare kind: AuditKind;
  declare diagramId: string | null;
  declare subject: string | null;
  declare detail: CreationOptional<Record<string, unknown>>;
  declare count: CreationOptional<number>;
  declare at: CreationOptional<Date>;
}

export function initAuditModel(sequelize: Sequelize): void {
  AuditEvent.init(
    {
      id: { type: DataTypes.BIGINT, primaryKey: true, autoIncrement: true },
      teamId: { type: DataTypes.UUID, allowNull: false },
      actorId: { type: DataTypes.TEXT, allowNull: true },
      kind: { type: DataTypes.TEXT, allowNull: false },
      diagramId: { type: DataTypes.UUID, allowNull: true },
      subject: { type: DataTypes.TEXT, allowNull: true },
      detail: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
      count: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
      at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
    },
    { sequelize, tableName: "audit_events", timestamps: false },
  );
}
