import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";
import type { Team } from "./team";

/** Who did what, when: one row per write that matters (sign-in, tour saves, reviews, team changes). */
export class AuditEvent extends Model<InferAttributes<AuditEvent>, InferCreationAttributes<AuditEvent>> {
  declare id: CreationOptional<number>;
  declare teamId: ForeignKey<Team["id"]>;
  declare actorId: number | null;
  declare action: string;
  declare target: string;
  /** JSON text with details of the event. */
  declare detail: string | null;
  declare at: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    AuditEvent.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        actorId: { type: DataTypes.INTEGER, allowNull: true },
        action: { type: DataTypes.STRING(64), allowNull: false },
        target: { type: DataTypes.STRING(200), allowNull: false },
        detail: { type: DataTypes.TEXT, allowNull: true },
        at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
      },
      { sequelize, modelName: "AuditEvent", tableName: "audit_events", underscored: true, timestamps: false },
    );
  }
}
