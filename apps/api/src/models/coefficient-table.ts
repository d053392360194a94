import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { CoefficientTableStatus } from '@photon-ledger/shared';

/** Settings a table was computed with. */
export interface StoredTableSettings {
  stepDeg: number;
  samplesPerFacet: number;
  specularBounce: boolean;
}

/** Cost of a finished table. */
export interface StoredTableStats {
  rays: number;
  raysPerSecond: number;
  computeMs: number;
}

/**
 * An SRP coefficient table of a mesh: its cache key (geometry, resolved optics, settings), state,
 * and once succeeded its values (`data`, little-endian float64, left out of default reads).
 */
export class CoefficientTableModel extends Model<InferAttributes<CoefficientTableModel>, InferCreationAttributes<CoefficientTableModel>> {
  declare id: CreationOptional<string>;
  declare missionId: string;
  declare meshId: string;
  declare cacheKey: string;
  declare settings: StoredTableSettings;
  declare resolvedOptics: Record<string, unknown>;
  declare status: CreationOptional<CoefficientTableStatus>;
  declare progress: CreationOptional<number>;
  declare polarCount: number;
  declare azimuthCount: number;
  declare chunkCount: number;
  declare chunksDone: CreationOptional<number>;
  declare error: CreationOptional<string | null>;
  declare stats: CreationOptional<StoredTableStats | null>;
  declare data: CreationOptional<Buffer | null>;
  declare createdBy: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare finishedAt: CreationOptional<Date | null>;

  static initModel(sequelize: Sequelize): void {
    CoefficientTableModel.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        missionId: { type: DataTypes.UUID, allowNull: false },
        meshId: { type: DataTypes.UUID, allowNull: false },
        cacheKey: { type: DataTypes.CHAR(64), allowNull: false },
        settings: { type: DataTypes.JSONB, allowNull: false },
        resolvedOptics: { type: DataTypes.JSONB, allowNull: false },
        status: { type: DataTypes.STRING(16), allowNull: false, defaultValue: 'queued' },
        progress: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0 },
        polarCount: { type: DataTypes.INTEGER, allowNull: false },
        azimuthCount: { type: DataTypes.INTEGER, allowNull: false },
        chunkCount: { type: DataTypes.INTEGER, allowNull: false },
        chunksDone: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        error: { type: DataTypes.TEXT, allowNull: true },
        stats: { type: DataTypes.JSONB, allowNull: true },
        data: { type: DataTypes.BLOB, allowNull: true },
        createdBy: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
        finishedAt: { type: DataTypes.DATE, allowNull: true },
      },
      { sequelize, tableName: 'coefficient_tables', modelName: 'CoefficientTable', defaultScope: { attributes: { exclude: ['data'] } } },
    );
  }
}
