import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";
import type { Tour } from "./tour";

/** One saved state of a tour: its JSON, the server's summary at that time, author and note. */
export class TourRevision extends Model<InferAttributes<TourRevision>, InferCreationAttributes<TourRevision>> {
  declare id: CreationOptional<number>;
  declare tourId: ForeignKey<Tour["id"]>;
  declare version: number;
  declare specJson: string;
  declare summaryJson: string;
  declare authorId: number | null;
  declare note: string | null;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    TourRevision.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        version: { type: DataTypes.INTEGER, allowNull: false },
        specJson: { type: DataTypes.TEXT, allowNull: false },
        summaryJson: { type: DataTypes.TEXT, allowNull: false },
        authorId: { type: DataTypes.INTEGER, allowNull: true },
        note: { type: DataTypes.STRING(2000), allowNull: true },
        createdAt: DataTypes.DATE,
      },
      { sequelize, modelName: "TourRevision", tableName: "tour_revisions", underscored: true, updatedAt: false },
    );
  }
}
