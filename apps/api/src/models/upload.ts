import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** Kinds of uploaded file. */
export type UploadKind = 'plate-set' | 'attitude-profile' | 'mesh';

/** A file uploaded into a mission, kept whole in PostgreSQL with its size and SHA-256. */
export class UploadModel extends Model<InferAttributes<UploadModel>, InferCreationAttributes<UploadModel>> {
  declare id: CreationOptional<string>;
  declare missionId: string;
  declare kind: UploadKind;
  declare fileName: string;
  declare contentType: string;
  declare sizeBytes: number;
  declare sha256: string;
  declare summary: CreationOptional<Record<string, unknown>>;
  declare data: Buffer;
  declare createdBy: string | null;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    UploadModel.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        missionId: { type: DataTypes.UUID, allowNull: false },
        kind: { type: DataTypes.STRING(24), allowNull: false },
        fileName: { type: DataTypes.STRING(255), allowNull: false },
        contentType: { type: DataTypes.STRING(120), allowNull: false },
        sizeBytes: { type: DataTypes.INTEGER, allowNull: false },
        sha256: { type: DataTypes.CHAR(64), allowNull: false },
        summary: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
        data: { type: DataTypes.BLOB, allowNull: false },
        createdBy: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE,
      },
      // `data` is left out of default reads: listings never need the bytes.
      { sequelize, tableName: 'uploads', modelName: 'Upload', updatedAt: false, defaultScope: { attributes: { exclude: ['data'] } } },
    );
  }
}
