import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";
import type { Team } from "./team";
import type { User } from "./user";

export const TOUR_STATUSES = ["draft", "in_review", "returned", "baselined"] as const;
export type TourStatus = (typeof TOUR_STATUSES)[number];

/**
 * A tour: the stored tour JSON (`specJson`, validated by lib/validation/tour.ts) plus summary
 * columns computed by the server's own evaluation (never taken from the browser).
 * Summary units are in the column names; null where the tour has no solution.
 */
export class Tour extends Model<InferAttributes<Tour>, InferCreationAttributes<Tour>> {
  declare id: CreationOptional<number>;
  declare teamId: ForeignKey<Team["id"]>;
  declare ownerId: ForeignKey<User["id"]>;
  declare name: string;
  declare status: CreationOptional<TourStatus>;
  /** Optimistic-locking counter; every save increments it. */
  declare version: CreationOptional<number>;
  declare specJson: string;
  /** 'vsop' | 'mean' (the tour's ephemeris choice). */
  declare ephemeris: string;
  /** Comma-separated body ids of the chain, for filtering. */
  declare chain: string;
  declare launchTdbS: number | null;
  declare arrivalTdbS: number | null;
  declare c3Km2S2: number | null;
  declare launchVinfKmS: number | null;
  declare totalDvKmS: number | null;
  declare tofS: number | null;
  declare arrivalVinfKmS: number | null;
  declare minFlybyMarginKm: number | null;
  declare violationCount: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Tour.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        name: { type: DataTypes.STRING(120), allowNull: false },
        status: { type: DataTypes.STRING(16), allowNull: false, defaultValue: "draft" },
        version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
        specJson: { type: DataTypes.TEXT, allowNull: false },
        ephemeris: { type: DataTypes.STRING(8), allowNull: false, defaultValue: "vsop" },
        chain: { type: DataTypes.STRING(1000), allowNull: false, defaultValue: "" },
        launchTdbS: { type: DataTypes.DOUBLE, field: "launch_tdb_s" },
        arrivalTdbS: { type: DataTypes.DOUBLE, field: "arrival_tdb_s" },
        c3Km2S2: { type: DataTypes.DOUBLE, field: "c3_km2_s2" },
        launchVinfKmS: { type: DataTypes.DOUBLE, field: "launch_vinf_km_s" },
        totalDvKmS: { type: DataTypes.DOUBLE, field: "total_dv_km_s" },
        tofS: { type: DataTypes.DOUBLE, field: "tof_s" },
        arrivalVinfKmS: { type: DataTypes.DOUBLE, field: "arrival_vinf_km_s" },
        minFlybyMarginKm: { type: DataTypes.DOUBLE, field: "min_flyby_margin_km" },
        violationCount: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0, field: "violation_count" },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, modelName: "Tour", tableName: "tours", underscored: true },
    );
  }
}
