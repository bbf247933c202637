import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** A site's mean daily minimum and maximum for one month, in °C: typed in, or computed from its readings. */
export class SiteNormal extends Model<InferAttributes<SiteNormal>, InferCreationAttributes<SiteNormal>> {
  declare siteId: string;
  declare month: number;
  declare tminC: number;
  declare tmaxC: number;
  declare source: 'manual' | 'computed';
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    SiteNormal.init(
      {
        siteId: { type: DataTypes.UUID, allowNull: false, primaryKey: true },
        month: { type: DataTypes.SMALLINT, allowNull: false, primaryKey: true },
        tminC: { type: DataTypes.REAL, allowNull: false },
        tmaxC: { type: DataTypes.REAL, allowNull: false },
        source: { type: DataTypes.STRING(12), allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'site_normals', underscored: true },
    );
  }
}
