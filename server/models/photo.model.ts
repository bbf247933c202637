import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export type PhotoContentType = 'image/jpeg' | 'image/png' | 'image/webp';

// A photo of a plant or of a log entry. The bytes live under UPLOAD_DIR/<groupId>/<fileName>;
// names are random, so a name says nothing about the group, the plant or the person.
export class Photo extends Model<InferAttributes<Photo>, InferCreationAttributes<Photo>> {
  declare id: CreationOptional<string>;
  declare groupId: string;
  declare plantId: string | null;
  declare logEntryId: string | null;
  declare fileName: string;
  declare thumbName: string | null;
  declare contentType: PhotoContentType;
  declare byteSize: number;
  declare uploadedBy: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Photo.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        groupId: { type: DataTypes.UUID, allowNull: false },
        plantId: { type: DataTypes.UUID, allowNull: true },
        logEntryId: { type: DataTypes.UUID, allowNull: true },
        fileName: { type: DataTypes.STRING(80), allowNull: false },
        thumbName: { type: DataTypes.STRING(80), allowNull: true },
        contentType: { type: DataTypes.STRING(20), allowNull: false },
        byteSize: { type: DataTypes.INTEGER, allowNull: false },
        uploadedBy: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'photos', underscored: true },
    );
  }
}
