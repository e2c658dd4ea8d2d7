import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";
import type { User } from "./user";

export type AuthTokenPurpose = "verify-email" | "reset-password";
export const AUTH_TOKEN_PURPOSES: readonly AuthTokenPurpose[] = ["verify-email", "reset-password"];

/**
 * A single-use token mailed to a user. Only the SHA-256 hash of the token is stored, so a copy of the
 * table does not let anyone verify an address or reset a password.
 */
export class AuthToken extends Model<InferAttributes<AuthToken>, InferCreationAttributes<AuthToken>> {
  declare id: CreationOptional<string>;
  declare userId: ForeignKey<User["id"]>;
  declare purpose: AuthTokenPurpose;
  declare tokenHash: string;
  declare expiresAt: Date;
  declare usedAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initAuthToken(sequelize: Sequelize): void {
  AuthToken.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      purpose: { type: DataTypes.ENUM(...AUTH_TOKEN_PURPOSES), allowNull: false },
      tokenHash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
      expiresAt: { type: DataTypes.DATE, allowNull: false },
      usedAt: { type: DataTypes.DATE, allowNull: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: "auth_tokens", underscored: true },
  );
}
