import { DataTypes, type QueryInterface } from "sequelize";
import type { MigrationFn } from "umzug";

export const up: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.createTable("custom_bodies", {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    team_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "teams", key: "id" }, onDelete: "CASCADE" },
    slug: { type: DataTypes.STRING(64), allowNull: false },
    name: { type: DataTypes.STRING(120), allowNull: false },
    epoch_tdb_s: { type: DataTypes.DOUBLE, allowNull: false },
    a_km: { type: DataTypes.DOUBLE, allowNull: false },
    e: { type: DataTypes.DOUBLE, allowNull: false },
    i_rad: { type: DataTypes.DOUBLE, allowNull: false },
    raan_rad: { type: DataTypes.DOUBLE, allowNull: false },
    argp_rad: { type: DataTypes.DOUBLE, allowNull: false },
    nu_rad: { type: DataTypes.DOUBLE, allowNull: false },
    mu_km3_s2: { type: DataTypes.DOUBLE, allowNull: false },
    radius_km: { type: DataTypes.DOUBLE, allowNull: false },
    min_alt_km: { type: DataTypes.DOUBLE, allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex("custom_bodies", ["team_id", "slug"], { unique: true });
  await qi.createTable("mail_messages", {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    team_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: "teams", key: "id" }, onDelete: "CASCADE" },
    to: { type: DataTypes.STRING(1000), allowNull: false },
    subject: { type: DataTypes.STRING(300), allowNull: false },
    text: { type: DataTypes.TEXT, allowNull: false },
    html: { type: DataTypes.TEXT, allowNull: true },
    sent_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex("mail_messages", ["team_id", "sent_at"]);
  await qi.createTable("audit_events", {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    team_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "teams", key: "id" }, onDelete: "CASCADE" },
    actor_id: { type: DataTypes.INTEGER, allowNull: true },
    action: { type: DataTypes.STRING(64), allowNull: false },
    target: { type: DataTypes.STRING(200), allowNull: false },
    detail: { type: DataTypes.TEXT, allowNull: true },
    at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex("audit_events", ["team_id", "at"]);
};

export const down: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.dropTable("audit_events");
  await qi.dropTable("mail_messages");
  await qi.dropTable("custom_bodies");
};
