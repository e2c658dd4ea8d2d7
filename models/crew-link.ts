import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";

/**
 * A read-only link to one job's member schedule, for the crew (no account needed). The token itself is
 * never stored in the clear: `tokenHash` (SHA-256) is what a visitor's lookup matches, and `tokenSealed`
 * (AES-256-GCM, see lib/crew/token.ts) lets the owner copy the link again. A link is live while it is
 * not revoked and not past `expiresAt`; nothing is deleted, so the owner sees the history.
 */
export class CrewLink extends Model<InferAttributes<CrewLink>, InferCreationAttributes<CrewLink>> {
  declare id: CreationOptional<string>;
  declare jobId: string;
  declare ownerId: string;
  declare tokenHash: string;
  declare tokenSealed: string;
  /** the owner's own words for who has it, e.g. "Framing crew" */
  declare label: string | null;
  declare expiresAt: Date | null;
  declare revokedAt: CreationOptional<Date | null>;
  declare lastOpenedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initCrewLink(sequelize: Sequelize): void {
  CrewLink.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      jobId: { type: DataTypes.UUID, allowNull: false },
      ownerId: { type: DataTypes.UUID, allowNull: false },
      tokenHash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
      tokenSealed: { type: DataTypes.STRING(200), allowNull: false },
      label: { type: DataTypes.STRING(80), allowNull: true },
      expiresAt: { type: DataTypes.DATE, allowNull: true },
      revokedAt: { type: DataTypes.DATE, allowNull: true },
      lastOpenedAt: { type: DataTypes.DATE, allowNull: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: "crew_links", underscored: true },
  );
}
