import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { LogKind } from '../schemas/log';

// One job in the work log. `details` holds the kind's own fields as the shared schema parsed them.
export class LogEntry extends Model<InferAttributes<LogEntry>, InferCreationAttributes<LogEntry>> {
  declare id: CreationOptional<string>;
  declare groupId: string;
  declare kind: LogKind;
  declare details: Record<string, unknown>;
  declare doneOn: string;
  declare doneBy: string | null;
  declare recordedBy: string | null;
  declare notes: string;
  declare overrideReason: string | null;
  declare pickingSafeFrom: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    LogEntry.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        groupId: { type: DataTypes.UUID, allowNull: false },
        kind: { type: DataTypes.STRING(20), allowNull: false },
        details: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
        doneOn: { type: DataTypes.DATEONLY, allowNull: false },
        doneBy: { type: DataTypes.UUID, allowNull: true },
        recordedBy: { type: DataTypes.UUID, allowNull: true },
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        overrideReason: { type: DataTypes.TEXT, allowNull: true },
        pickingSafeFrom: { type: DataTypes.DATEONLY, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'log_entries', underscored: true },
    );
  }
}
