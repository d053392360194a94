import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { CoefficientTableStatus } from '@photon-ledger/shared';

/**
 * One band of polar rows [firstPolarRow, endPolarRow) of a coefficient table: one queued job,
 * claimed by a worker with a guarded UPDATE and kept alive by its heartbeat.
 */
export class CoefficientTableChunkModel extends Model<InferAttributes<CoefficientTableChunkModel>, InferCreationAttributes<CoefficientTableChunkModel>> {
  declare id: CreationOptional<string>;
  declare tableId: string;
  declare chunkIndex: number;
  declare firstPolarRow: number;
  declare endPolarRow: number;
  declare status: CreationOptional<CoefficientTableStatus>;
  declare rowsDone: CreationOptional<number>;
  declare data: CreationOptional<Buffer | null>;
  declare rays: CreationOptional<number | null>;
  declare computeMs: CreationOptional<number | null>;
  declare workerId: CreationOptional<string | null>;
  declare attempts: CreationOptional<number>;
  declare error: CreationOptional<string | null>;
  declare startedAt: CreationOptional<Date | null>;
  declare heartbeatAt: CreationOptional<Date | null>;
  declare finishedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    CoefficientTableChunkModel.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        tableId: { type: DataTypes.UUID, allowNull: false },
        chunkIndex: { type: DataTypes.INTEGER, allowNull: false },
        firstPolarRow: { type: DataTypes.INTEGER, allowNull: false },
        endPolarRow: { type: DataTypes.INTEGER, allowNull: false },
        status: { type: DataTypes.STRING(16), allowNull: false, defaultValue: 'queued' },
        rowsDone: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        data: { type: DataTypes.BLOB, allowNull: true },
        rays: { type: DataTypes.DOUBLE, allowNull: true },
        computeMs: { type: DataTypes.DOUBLE, allowNull: true },
        workerId: { type: DataTypes.STRING(120), allowNull: true },
        attempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        error: { type: DataTypes.TEXT, allowNull: true },
        startedAt: { type: DataTypes.DATE, allowNull: true },
        heartbeatAt: { type: DataTypes.DATE, allowNull: true },
        finishedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'coefficient_table_chunks', modelName: 'CoefficientTableChunk', defaultScope: { attributes: { exclude: ['data'] } } },
    );
  }
}
