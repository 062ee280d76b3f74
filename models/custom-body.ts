import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";
import type { Team } from "./team";

/**
 * A team's own small body, served by both ephemerides from its osculating heliocentric elements
 * (mean ecliptic and equinox of J2000). Its body id is `custom:<slug>`.
 * Units: km, rad, TDB s past J2000, km³/s².
 */
export class CustomBody extends Model<InferAttributes<CustomBody>, InferCreationAttributes<CustomBody>> {
  declare id: CreationOptional<number>;
  declare teamId: ForeignKey<Team["id"]>;
  declare slug: string;
  declare name: string;
  declare epochTdbS: number;
  declare aKm: number;
  declare e: number;
  declare iRad: number;
  declare raanRad: number;
  declare argpRad: number;
  /** True anomaly at epoch (the CSV's mean anomaly converted on import), rad. */
  declare nuRad: number;
  declare muKm3S2: number;
  declare radiusKm: number;
  declare minAltKm: number;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    CustomBody.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        slug: { type: DataTypes.STRING(64), allowNull: false },
        name: { type: DataTypes.STRING(120), allowNull: false },
        epochTdbS: { type: DataTypes.DOUBLE, allowNull: false, field: "epoch_tdb_s" },
        aKm: { type: DataTypes.DOUBLE, allowNull: false, field: "a_km" },
        e: { type: DataTypes.DOUBLE, allowNull: false },
        iRad: { type: DataTypes.DOUBLE, allowNull: false, field: "i_rad" },
        raanRad: { type: DataTypes.DOUBLE, allowNull: false, field: "raan_rad" },
        argpRad: { type: DataTypes.DOUBLE, allowNull: false, field: "argp_rad" },
        nuRad: { type: DataTypes.DOUBLE, allowNull: false, field: "nu_rad" },
        muKm3S2: { type: DataTypes.DOUBLE, allowNull: false, field: "mu_km3_s2" },
        radiusKm: { type: DataTypes.DOUBLE, allowNull: false, field: "radius_km" },
        minAltKm: { type: DataTypes.DOUBLE, allowNull: false, field: "min_alt_km" },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, modelName: "CustomBody", tableName: "custom_bodies", underscored: true },
    );
  }
}
