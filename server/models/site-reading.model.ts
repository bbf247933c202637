import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { ReadingSource } from '../schemas/readings';

/** One day's air temperatures at a site, in °C; the key is (site, date). */
export class SiteReading extends Model<InferAttributes<SiteReading>, InferCreationAttributes<SiteReading>> {
  declare siteId: string;
  declare date: string;
  declare tminC: number;
  declare tmaxC: number;
  declare rainMm: number | null;
  declare source: ReadingSource;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    SiteReading.init(
      {
        siteId: { type: DataTypes.UUID, allowNull: false, primaryKey: true },
        // DATEONLY keeps the day as 'YYYY-MM-DD' text, free of any time zone.
        date: { type: DataTypes.DATEONLY, allowNull: false, primaryKey: true },
        tminC: { type: DataTypes.REAL, allowNull: false },
        tmaxC: { type: DataTypes.REAL, allowNull: false },
        rainMm: { type: DataTypes.REAL, allowNull: true },
        source: { type: DataTypes.STRING(12), allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'site_readings', underscored: true },
    );
  }
}
