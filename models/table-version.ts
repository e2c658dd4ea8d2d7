import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";

export type TableVersionSource = "seed" | "edit" | "import" | "restore";
export const TABLE_VERSION_SOURCES: readonly TableVersionSource[] = ["seed", "edit", "import", "restore"];

/**
 * One published version of the material tables. A version is never rewritten: an edit, an import or a
 * restore writes a new version (number + 1) with a full copy of every table's rows. The current version
 * is the one with the highest number (unique index, so finding it is one index probe).
 */
export class TableVersion extends Model<InferAttributes<TableVersion>, InferCreationAttributes<TableVersion>> {
  declare id: CreationOptional<string>;
  declare number: number;
  declare source: TableVersionSource;
  declare note: string;
  declare createdById: string | null;
  /** who made it, kept as text so the history still reads after the account is gone */
  declare createdByEmail: string | null;
  declare restoredFromId: string | null;
  /** the change from the version before: see ChangeSummary in lib/tables/db/diff.ts */
  declare summary: unknown;
  declare rowsAdded: number;
  declare rowsChanged: number;
  declare rowsRemoved: number;
  declare createdAt: CreationOptional<Date>;
}

export function initTableVersion(sequelize: Sequelize): void {
  TableVersion.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      number: { type: DataTypes.INTEGER, allowNull: false, unique: true },
      source: { type: DataTypes.ENUM(...TABLE_VERSION_SOURCES), allowNull: false },
      note: { type: DataTypes.TEXT, allowNull: false },
      createdById: { type: DataTypes.UUID, allowNull: true },
      createdByEmail: { type: DataTypes.STRING(254), allowNull: true },
      restoredFromId: { type: DataTypes.UUID, allowNull: true },
      summary: { type: DataTypes.JSONB, allowNull: false },
      rowsAdded: { type: DataTypes.INTEGER, allowNull: false },
      rowsChanged: { type: DataTypes.INTEGER, allowNull: false },
      rowsRemoved: { type: DataTypes.INTEGER, allowNull: false },
      createdAt: DataTypes.DATE,
    },
    { sequelize, tableName: "table_versions", underscored: true, updatedAt: false },
  );
}
