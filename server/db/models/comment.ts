import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";
import type { CommentPin } from "@shared/api/comments";

/** A review comment: a thread's root (threadId null, on a version, maybe pinned) or a reply to one. */
export class Comment extends Model<InferAttributes<Comment>, InferCreationAttributes<Comment>> {
  declare id: CreationOptional<string>;
  declare diagramId: string;
  declare versionNumber: number;
  declare threadId: string | null;
  declare pin: CommentPin | null;
  declare body: string;
  declare authorId: string;
  declare resolvedAt: CreationOptional<Date | null>;
  declare resolvedBy: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initCommentModel(sequelize: Sequelize): void {
  Comment.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      diagramId: { type: DataTypes.UUID, allowNull: false },
      versionNumber: { type: DataTypes.INTEGER, allowNull: false },
      threadId: { type: DataTypes.UUID, allowNull: true },
      pin: { type: DataTypes.JSONB, allowNull: true },
      body: { type: DataTypes.TEXT, allowNull: false },
      authorId: { type: DataTypes.TEXT, allowNull: false },
      resolvedAt: { type: DataTypes.DATE, allowNull: true },
      resolvedBy: { type: DataTypes.TEXT, allowNull: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: "comments" },
  );
}
