import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { HealthFlag, PlantForm, PlantTypeCode } from '../schemas/catalogue';
import type { Site } from './site.model';

export class Plant extends Model<InferAttributes<Plant>, InferCreationAttributes<Plant>> {
  declare id: CreationOptional<string>;
  declare groupId: string;
  declare siteId: string;
  declare typeCode: PlantTypeCode;
  declare cultivar: string;
  declare rootstock: string;
  declare form: PlantForm;
  declare plantedYear: number | null;
  declare heightM: number | null;
  declare positionLabel: string;
  declare healthFlags: HealthFlag[];
  declare notes: string;
  declare archivedAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare site?: NonAttribute<Site>;

  static initModel(sequelize: Sequelize): void {
    Plant.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        groupId: { type: DataTypes.UUID, allowNull: false },
        siteId: { type: DataTypes.UUID, allowNull: false },
        typeCode: { type: DataTypes.STRING(30), allowNull: false },
        cultivar: { type: DataTypes.STRING(100), allowNull: false, defaultValue: '' },
        rootstock: { type: DataTypes.STRING(60), allowNull: false, defaultValue: '' },
        form: { type: DataTypes.STRING(30), allowNull: false },
        plantedYear: { type: DataTypes.INTEGER, allowNull: true },
        heightM: { type: DataTypes.DOUBLE, allowNull: true },
        positionLabel: { type: DataTypes.STRING(100), allowNull: false, defaultValue: '' },
        healthFlags: { type: DataTypes.ARRAY(DataTypes.STRING(30)), allowNull: false, defaultValue: [] },
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        archivedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'plants', underscored: true },
    );
  }
}
