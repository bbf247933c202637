import { DataTypes, Model, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { Verdict } from '../care';
import type { Guard } from '../schemas/log';

// A plant an entry covers, with the stone-fruit check's answer for it when the entry was a cut on stone fruit.
export class LogEntryPlant extends Model<InferAttributes<LogEntryPlant>, InferCreationAttributes<LogEntryPlant>> {
  declare logEntryId: string;
  declare plantId: string;
  declare guardVerdict: Verdict | null;
  declare guardRules: Guard['rules'] | null;

  static initModel(sequelize: Sequelize): void {
    LogEntryPlant.init(
      {
        logEntryId: { type: DataTypes.UUID, allowNull: false, primaryKey: true },
        plantId: { type: DataTypes.UUID, allowNull: false, primaryKey: true },
        guardVerdict: { type: DataTypes.STRING(10), allowNull: true },
        guardRules: { type: DataTypes.JSONB, allowNull: true },
      },
      { sequelize, tableName: 'log_entry_plants', underscored: true, timestamps: false },
    );
  }
}
