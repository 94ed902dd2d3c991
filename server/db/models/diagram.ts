import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";

export class Diagram extends Model<InferAttributes<Diagram>, InferCreationAttributes<Diagram>> {
  declare id: CreationOptional<string>;
  declare teamId: string;
  declare title: string;
  declare description: CreationOptional<string>;
  declare createdBy: string;
  declare archivedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export class DiagramVersion extends Model<InferAttributes<DiagramVersion>, InferCreationAttributes<DiagramVersion>> {
  declare id: CreationOptional<string>;
  declare diagramId: string;
  declare number: number;
  declare document: unknown;
  declare result: unknown;
  declare message: CreationOptional<string>;
  declare createdBy: string;
  declare createdAt: CreationOptional<Date>;
}

export function initDiagramModels(sequelize: Sequelize): void {
  Diagram.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      teamId: { type: DataTypes.UUID, allowNull: false },
      title: { type: DataTypes.TEXT, allowNull: false },
      description: { type: DataTypes.TEXT, allowNull: false, defaultValue: "" },
      createdBy: { type: DataTypes.TEXT, allowNull: false },
      archivedAt: { type: DataTypes.DATE, allowNull: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: "diagrams" },
  );
  DiagramVersion.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      diagramId: { type: DataTypes.UUID, allowNull: false },
      number: { type: DataTypes.INTEGER, allowNull: false },
      document: { type: DataTypes.JSON, allowNull: false }, // JSON keeps the key order the author wrote
      result: { type: DataTypes.JSONB, allowNull: true },
      message: { type: DataTypes.TEXT, allowNull: false, defaultValue: "" },
      createdBy: { type: DataTypes.TEXT, allowNull: false },
      createdAt: DataTypes.DATE,
    },
    { sequelize, tableName: "diagram_versions", updatedAt: false },
  );
}
