import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";
import type { Team } from "./team";

export const ROLES = ["lead", "designer", "analyst", "viewer"] as const;
export type Role = (typeof ROLES)[number];

/** A person who signs in; `passwordHash` is a bcrypt hash. Deactivated users cannot sign in. */
export class User extends Model<InferAttributes<User>, InferCreationAttributes<User>> {
  declare id: CreationOptional<number>;
  declare teamId: ForeignKey<Team["id"]>;
  declare email: string;
  declare name: string;
  declare role: Role;
  declare passwordHash: string | null;
  declare active: CreationOptional<boolean>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    User.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
        name: { type: DataTypes.STRING(120), allowNull: false },
        role: { type: DataTypes.STRING(16), allowNull: false },
        passwordHash: { type: DataTypes.STRING(100), allowNull: true },
        active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, modelName: "User", tableName: "users", underscored: true },
    );
  }
}
