import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { MeshFormat, MeshGroup, MeshUnit } from '@photon-ledger/shared';

type Vec3 = [number, number, number];

/**
 * A triangle mesh imported into a mission (body frame, metres). `geometry` is little-endian:
 * 9 float64 per triangle, then one uint32 group index per triangle; it is left out of default
 * reads (a 200 000-triangle mesh is 15 MB).
 */
export class MeshModel extends Model<InferAttributes<MeshModel>, InferCreationAttributes<MeshModel>> {
  declare id: CreationOptional<string>;
  declare missionId: string;
  declare uploadId: string;
  declare name: string;
  declare fileName: string;
  declare format: MeshFormat;
  declare units: MeshUnit;
  declare rotationDeg: Vec3;
  declare translationM: Vec3;
  declare triangleCount: number;
  declare droppedDegenerate: number;
  declare groups: MeshGroup[];
  declare totalAreaM2: number;
  declare boundsM: { min: Vec3; max: Vec3 };
  declare geometry: Buffer;
  declare geometrySha256: string;
  declare createdBy: string | null;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    MeshModel.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        missionId: { type: DataTypes.UUID, allowNull: false },
        uploadId: { type: DataTypes.UUID, allowNull: false },
        name: { type: DataTypes.STRING(120), allowNull: false },
        fileName: { type: DataTypes.STRING(255), allowNull: false },
        format: { type: DataTypes.STRING(16), allowNull: false },
        units: { type: DataTypes.STRING(4), allowNull: false },
        rotationDeg: { type: DataTypes.JSONB, allowNull: false },
        translationM: { type: DataTypes.JSONB, allowNull: false },
        triangleCount: { type: DataTypes.INTEGER, allowNull: false },
        droppedDegenerate: { type: DataTypes.INTEGER, allowNull: false },
        groups: { type: DataTypes.JSONB, allowNull: false },
        totalAreaM2: { type: DataTypes.DOUBLE, allowNull: false },
        boundsM: { type: DataTypes.JSONB, allowNull: false },
        geometry: { type: DataTypes.BLOB, allowNull: false },
        geometrySha256: { type: DataTypes.CHAR(64), allowNull: false },
        createdBy: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'meshes', modelName: 'Mesh', updatedAt: false, defaultScope: { attributes: { exclude: ['geometry'] } } },
    );
  }
}
