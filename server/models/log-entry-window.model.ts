import { DataTypes, Model, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

// Which care windows an entry marked done, so that deleting the entry opens them again.
export class LogEntryWindow extends Model<InferAttributes<LogEntryWindow>, InferCreationAttributes<LogEntryWindow>> {
  declare logEntryId: string;
  declare windowId: string;

  static initModel(sequelize: Sequelize): void {
    LogEntryWindow.init(
      {
        logEntryId: { type: DataTypes.UUID, allowNull: false, primaryKey: true },
        windowId: { type: DataTypes.UUID, allowNull: false, primaryKey: true },
      },
      { sequelize, tableName: 'log_entry_windows', underscored: true, timestamps: false },
    );
  }
}
