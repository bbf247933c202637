import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { StoreItem, StoreMethod, StoreUnit } from '../schemas/store';

// A batch of stored produce. Dates are calendar days (`YYYY-MM-DD`); warnOn and useBy are fixed
// when the batch is stored (server/care/keeping.ts).
export class StoreBatch extends Model<InferAttributes<StoreBatch>, InferCreationAttributes<StoreBatch>> {
  declare id: CreationOptional<string>;
  declare groupId: string;
  declare item: StoreItem;
  declare label: string;
  declare quantity: number;
  declare unit: StoreUnit;
  declare method: StoreMethod;
  declare storedOn: string;
  declare warnOn: string;
  declare useBy: string;
  declare keepSource: string;
  declare notes: string;
  declare usedOn: string | null;
  declare usedBy: string | null;
  declare createdBy: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    StoreBatch.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        groupId: { type: DataTypes.UUID, allowNull: false },
        item: { type: DataTypes.STRING(30), allowNull: false },
        label: { type: DataTypes.STRING(100), allowNull: false, defaultValue: '' },
        quantity: { type: DataTypes.REAL, allowNull: false },
        unit: { type: DataTypes.STRING(12), allowNull: false },
        method: { type: DataTypes.STRING(10), allowNull: false },
        storedOn: { type: DataTypes.DATEONLY, allowNull: false },
        warnOn: { type: DataTypes.DATEONLY, allowNull: false },
        useBy: { type: DataTypes.DATEONLY, allowNull: false },
        keepSource: { type: DataTypes.TEXT, allowNull: false },
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        usedOn: { type: DataTypes.DATEONLY, allowNull: true },
        usedBy: { type: DataTypes.UUID, allowNull: true },
        createdBy: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'store_batches', underscored: true },
    );
  }
}

/** Which plants a batch came from. */
export class StoreBatchPlant extends Model<InferAttributes<StoreBatchPlant>, InferCreationAttributes<StoreBatchPlant>> {
  declare batchId: string;
  declare plantId: string;

  static initModel(sequelize: Sequelize): void {
    StoreBatchPlant.init(
      {
        batchId: { type: DataTypes.UUID, allowNull: false, primaryKey: true },
        plantId: { type: DataTypes.UUID, allowNull: false, primaryKey: true },
      },
      { sequelize, tableName: 'store_batch_plants', underscored: true, timestamps: false },
    );
  }
}
