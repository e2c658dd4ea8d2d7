import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";

/** A structural steel grade in one table version (ksi). */
export class SteelGradeRow extends Model<InferAttributes<SteelGradeRow>, InferCreationAttributes<SteelGradeRow>> {
  declare id: CreationOptional<string>;
  declare versionId: string;
  declare name: string;
  declare Fy: number;
  declare Fu: number;
}

export function initSteelGrade(sequelize: Sequelize): void {
  SteelGradeRow.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      versionId: { type: DataTypes.UUID, allowNull: false, field: "version_id" },
      name: { type: DataTypes.STRING(20), allowNull: false },
      Fy: { type: DataTypes.DOUBLE, allowNull: false, field: "fy_ksi" },
      Fu: { type: DataTypes.DOUBLE, allowNull: false, field: "fu_ksi" },
    },
    { sequelize, tableName: "steel_grades", underscored: true, timestamps: false },
  );
}
