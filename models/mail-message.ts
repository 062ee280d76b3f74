import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";
import type { Team } from "./team";

/** A message the mailer sent (or, locally, stored instead of sending); listed in Outbox. */
export class MailMessage extends Model<InferAttributes<MailMessage>, InferCreationAttributes<MailMessage>> {
  declare id: CreationOptional<number>;
  declare teamId: ForeignKey<Team["id"]> | null;
  declare to: string;
  declare subject: string;
  declare text: string;
  declare html: string | null;
  declare sentAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    MailMessage.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        to: { type: DataTypes.STRING(1000), allowNull: false },
        subject: { type: DataTypes.STRING(300), allowNull: false },
        text: { type: DataTypes.TEXT, allowNull: false },
        html: { type: DataTypes.TEXT, allowNull: true },
        sentAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
      },
      { sequelize, modelName: "MailMessage", tableName: "mail_messages", underscored: true, timestamps: false },
    );
  }
}
