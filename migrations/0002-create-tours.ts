import { DataTypes, type QueryInterface } from "sequelize";
import type { MigrationFn } from "umzug";

const ts = {
  created_at: { type: DataTypes.DATE, allowNull: false },
  updated_at: { type: DataTypes.DATE, allowNull: false },
};

export const up: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.createTable("tours", {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    team_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "teams", key: "id" }, onDelete: "CASCADE" },
    owner_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "users", key: "id" } },
    name: { type: DataTypes.STRING(120), allowNull: false },
    status: { type: DataTypes.STRING(16), allowNull: false, defaultValue: "draft" },
    version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
    spec_json: { type: DataTypes.TEXT, allowNull: false },
    ephemeris: { type: DataTypes.STRING(8), allowNull: false, defaultValue: "vsop" },
    chain: { type: DataTypes.STRING(1000), allowNull: false, defaultValue: "" },
    launch_tdb_s: { type: DataTypes.DOUBLE, allowNull: true },
    arrival_tdb_s: { type: DataTypes.DOUBLE, allowNull: true },
    c3_km2_s2: { type: DataTypes.DOUBLE, allowNull: true },
    launch_vinf_km_s: { type: DataTypes.DOUBLE, allowNull: true },
    total_dv_km_s: { type: DataTypes.DOUBLE, allowNull: true },
    tof_s: { type: DataTypes.DOUBLE, allowNull: true },
    arrival_vinf_km_s: { type: DataTypes.DOUBLE, allowNull: true },
    min_flyby_margin_km: { type: DataTypes.DOUBLE, allowNull: true },
    violation_count: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    ...ts,
  });
  await qi.addIndex("tours", ["team_id", "status"]);
  await qi.createTable("tour_revisions", {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    tour_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "tours", key: "id" }, onDelete: "CASCADE" },
    version: { type: DataTypes.INTEGER, allowNull: false },
    spec_json: { type: DataTypes.TEXT, allowNull: false },
    summary_json: { type: DataTypes.TEXT, allowNull: false },
    author_id: { type: DataTypes.INTEGER, allowNull: true },
    note: { type: DataTypes.STRING(2000), allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex("tour_revisions", ["tour_id", "version"]);
  await qi.createTable("comments", {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    tour_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "tours", key: "id" }, onDelete: "CASCADE" },
    author_id: { type: DataTypes.INTEGER, allowNull: false },
    body: { type: DataTypes.TEXT, allowNull: false },
    node_id: { type: DataTypes.STRING(64), allowNull: true },
    ...ts,
  });
  await qi.addIndex("comments", ["tour_id"]);
};

export const down: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.dropTable("comments");
  await qi.dropTable("tour_revisions");
  await qi.dropTable("tours");
};
