import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";

/** Failed sign-ins per e-mail address (rows exist for unknown addresses too, so a lock reveals nothing). */
export class SignInThrottle extends Model<InferAttributes<SignInThrottle>, InferCreationAttributes<SignInThrottle>> {
  declare id: CreationOptional<number>;
  declare email: string;
  declare failures: number;
  declare lockedUntil: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    SignInThrottle.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
        failures: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        lockedUntil: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, modelName: "SignInThrottle", tableName: "sign_in_throttles", underscored: true },
    );
  }
}
