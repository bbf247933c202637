import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

// A person's reminder settings; a person without a row has the defaults (see the migration).
// `tasks` null means every task, so a task added to the catalogue later is included by default.
export class ReminderPreference extends Model<InferAttributes<ReminderPreference>, InferCreationAttributes<ReminderPreference>> {
  declare userId: string;
  declare isEnabled: CreationOptional<boolean>;
  declare leadDays: CreationOptional<number>;
  declare tasks: string[] | null;
  declare isOpeningOn: CreationOptional<boolean>;
  declare isClosingOn: CreationOptional<boolean>;
  declare isWeeklyOn: CreationOptional<boolean>;
  declare pausedUntil: string | null;
  declare calendarTokenHash: string | null;
  declare calendarNonce: string | null;
  declare calendarCreatedAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    ReminderPreference.init(
      {
        userId: { type: DataTypes.UUID, primaryKey: true },
        isEnabled: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
        leadDays: { type: DataTypes.SMALLINT, allowNull: false, defaultValue: 3 },
        tasks: { type: DataTypes.ARRAY(DataTypes.STRING(30)), allowNull: true },
        isOpeningOn: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
        isClosingOn: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
        isWeeklyOn: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
        pausedUntil: { type: DataTypes.DATEONLY, allowNull: true },
        calendarTokenHash: { type: DataTypes.CHAR(64), allowNull: true },
        calendarNonce: { type: DataTypes.STRING(64), allowNull: true },
        calendarCreatedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'reminder_preferences', underscored: true },
    );
  }
}
