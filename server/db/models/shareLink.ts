import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";

export class ShareLink extends Model<InferAttributes<ShareLink>, InferCreationAttributes<ShareLink>> {
  declare id: CreationOptional<string>;
  declare diagramId: string;
  /** null: always the diagram's latest version. */
  declare versionNumber: number | null;
  declare tokenHash: string;
  declare createdBy: string | null;
  declare createdAt: CreationOptional<Date>;
  declare expiresAt: Date | null;
  declare revokedAt: CreationOptional<Date | null>;
  declare lastOpenedAt: CreationOptional<Date | null>;
  declare timesOpened: CreationOptional<number>;
}

export function initShareLinkModel(sequelize: Sequelize): void {
  ShareLink.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      diagramId: { type: DataTypes.UUID, allowNull: false },
      versionNumber: { type: DataTypes.INTEGER, allowNull: true },
      tokenHash: { type: DataTypes.TEXT, allowNull: false, unique: true },
      createdBy: { type: DataTypes.TEXT, allowNull: true },
      createdAt: DataTypes.DATE,
      expiresAt: { type: DataTypes.DATE, allowNull: true },
      revokedAt: { type: DataTypes.DATE, allowNull: true },
      lastOpenedAt: { type: DataTypes.DATE, allowNull: true },
      timesOpened: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    },
    { sequelize, tableName: "share_links", updatedAt: false },
  );
}
