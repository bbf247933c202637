import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { WindowBasis } from '../care';

// A plant's care window for one season, stored by the worker's daily pass (it writes in bulk with
// SQL; this model is for reading and for the work log, which sets doneAt and doneBy). Dates are
// calendar days as `YYYY-MM-DD`; a window's state on a day follows from opens and closes.
// The database works out the id from plant, season and rule (a generated column), and the wording
// (source, reason, how-to) lives in care_window_wordings, shared by every window that says the same.
export class CareWindow extends Model<InferAttributes<CareWindow>, InferCreationAttributes<CareWindow>> {
  declare id: CreationOptional<string>;
  declare plantId: string;
  declare groupId: string;
  declare siteId: string;
  declare season: number;
  declare task: string;
  declare ruleKey: string;
  declare opens: string;
  declare closes: string;
  declare basis: WindowBasis;
  declare wordingId: string;
  declare triggerDegreeDays: number | null;
  declare triggerBaseC: number | null;
  declare triggerSince: string | null;
  declare triggerReachedOn: string | null;
  declare computedAt: CreationOptional<Date>;
  declare doneAt: Date | null;
  declare doneBy: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    CareWindow.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true },
        plantId: { type: DataTypes.UUID, allowNull: false },
        groupId: { type: DataTypes.UUID, allowNull: false },
        siteId: { type: DataTypes.UUID, allowNull: false },
        season: { type: DataTypes.INTEGER, allowNull: false },
        task: { type: DataTypes.STRING(30), allowNull: false },
        ruleKey: { type: DataTypes.STRING(60), allowNull: false },
        opens: { type: DataTypes.DATEONLY, allowNull: false },
        closes: { type: DataTypes.DATEONLY, allowNull: false },
        basis: { type: DataTypes.STRING(12), allowNull: false },
        wordingId: { type: DataTypes.UUID, allowNull: false },
        triggerDegreeDays: { type: DataTypes.REAL, allowNull: true },
        triggerBaseC: { type: DataTypes.REAL, allowNull: true },
        triggerSince: { type: DataTypes.DATEONLY, allowNull: true },
        triggerReachedOn: { type: DataTypes.DATEONLY, allowNull: true },
        computedAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
        doneAt: { type: DataTypes.DATE, allowNull: true },
        doneBy: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'care_windows', underscored: true },
    );
  }
}
