import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";
import type { Team } from "./team";
import type { Role } from "./user";

/** An invitation to join a team; only the SHA-256 of the one-time token is stored. */
export class Invitation extends Model<InferAttributes<Invitation>, InferCreationAttributes<Invitation>> {
  declare id: CreationOptional<number>;
  declare teamId: ForeignKey<Team["id"]>;
  declare email: string;
  declare role: Role;
  declare tokenHash: string;
  declare expiresAt: Date;
  declare acceptedAt: Date | null;
  declare invitedById: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Invitation.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        email: { type: DataTypes.STRING(254), allowNull: false },
        role: { type: DataTypes.STRING(16), allowNull: false },
        tokenHash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
        expiresAt: { type: DataTypes.DATE, allowNull: false },
        acceptedAt: { type: DataTypes.DATE, allowNull: true },
        invitedById: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, modelName: "Invitation", tableName: "invitations", underscored: true },
    );
  }
}
