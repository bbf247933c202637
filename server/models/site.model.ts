import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { SiteHazard } from '../schemas/site';

export class Site extends Model<InferAttributes<Site>, InferCreationAttributes<Site>> {
  declare id: CreationOptional<string>;
  declare groupId: string;
  declare name: string;
  declare latitude: number;
  declare longitude: number;
  declare elevationM: number | null;
  declare timeZone: string;
  declare hazards: SiteHazard[];
  declare notes: string;
  declare archivedAt: Date | null;
  /** The weather station whose daily readings the site pulls, if any. */
  declare stationId: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Site.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        groupId: { type: DataTypes.UUID, allowNull: false },
        name: { type: DataTypes.STRING(100), allowNull: false },
        latitude: { type: DataTypes.DOUBLE, allowNull: false },
        longitude: { type: DataTypes.DOUBLE, allowNull: false },
        elevationM: { type: DataTypes.DOUBLE, allowNull: true },
        timeZone: { type: DataTypes.STRING(64), allowNull: false },
        hazards: { type: DataTypes.ARRAY(DataTypes.STRING(30)), allowNull: false, defaultValue: [] },
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        archivedAt: { type: DataTypes.DATE, allowNull: true },
        stationId: { type: DataTypes.STRING(64), allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'sites', underscored: true },
    );
  }
}
