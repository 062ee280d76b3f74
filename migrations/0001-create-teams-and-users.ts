import { DataTypes, type QueryInterface } from "sequelize";
import type { MigrationFn } from "umzug";

const ts = {
  created_at: { type: DataTypes.DATE, allowNull: false },
  updated_at: { type: DataTypes.DATE, allowNull: false },
};

export const up: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.createTable("teams", {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    name: { type: DataTypes.STRING(120), allowNull: false },
    ...ts,
  });
  await qi.createTable("users", {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    team_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "teams", key: "id" }, onDelete: "CASCADE" },
    email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
    name: { type: DataTypes.STRING(120), allowNull: false },
    role: { type: DataTypes.STRING(16), allowNull: false },
    password_hash: { type: DataTypes.STRING(100), allowNull: true },
    active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
    ...ts,
  });
  await qi.addIndex("users", ["team_id"]);
  await qi.createTable("sign_in_throttles", {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
    failures: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    locked_until: { type: DataTypes.DATE, allowNull: true },
    ...ts,
  });
  await qi.createTable("invitations", {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    team_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "teams", key: "id" }, onDelete: "CASCADE" },
    email: { type: DataTypes.STRING(254), allowNull: false },
    role: { type: DataTypes.STRING(16), allowNull: false },
    token_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    expires_at: { type: DataTypes.DATE, allowNull: false },
    accepted_at: { type: DataTypes.DATE, allowNull: true },
    invited_by_id: { type: DataTypes.INTEGER, allowNull: true },
    ...ts,
  });
  await qi.addIndex("invitations", ["team_id"]);
};

export const down: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.dropTable("invitations");
  await qi.dropTable("sign_in_throttles");
  await qi.dropTable("users");
  await qi.dropTable("teams");
};
