import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";
import { ROLES, type Role } from "../lib/auth/role-list";

export { ROLES, type Role };

export class User extends Model<InferAttributes<User>, InferCreationAttributes<User>> {
  declare id: CreationOptional<string>;
  declare email: string;
  declare passwordHash: string;
  declare name: string;
  declare company: string | null;
  declare role: CreationOptional<Role>;
  declare emailVerifiedAt: Date | null;
  /** When the password last changed; sessions signed in before it no longer count. */
  declare passwordChangedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initUser(sequelize: Sequelize): void {
  User.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
      passwordHash: { type: DataTypes.STRING(100), allowNull: false },
      name: { type: DataTypes.STRING(120), allowNull: false },
      company: { type: DataTypes.STRING(160), allowNull: true },
      role: { type: DataTypes.ENUM(...ROLES), allowNull: false, defaultValue: "builder" },
      emailVerifiedAt: { type: DataTypes.DATE, allowNull: true },
      passwordChangedAt: { type: DataTypes.DATE, allowNull: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: "users", underscored: true },
  );
}
