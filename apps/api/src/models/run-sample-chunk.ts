import { DataTypes, Model, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/**
 * A run of consecutive ephemeris samples: `rowCount` packed rows of `layout.stride` little-endian
 * float64 numbers (the run result's layout), so a million samples are a few hundred rows to store
 * and stream rather than a million.
 */
export class RunSampleChunkModel extends Model<InferAttributes<RunSampleChunkModel>, InferCreationAttributes<RunSampleChunkModel>> {
  declare runId: string;
  declare chunkIndex: number;
  declare tStart: number;
  declare tEnd: number;
  declare rowCount: number;
  declare data: Buffer;

  static initModel(sequelize: Sequelize): void {
    RunSampleChunkModel.init(
      {
        runId: { type: DataTypes.UUID, primaryKey: true },
        chunkIndex: { type: DataTypes.INTEGER, primaryKey: true },
        tStart: { type: DataTypes.DOUBLE, allowNull: false },
        tEnd: { type: DataTypes.DOUBLE, allowNull: false },
        rowCount: { type: DataTypes.INTEGER, allowNull: false },
        data: { type: DataTypes.BLOB, allowNull: false },
      },
      { sequelize, tableName: 'run_sample_chunks', modelName: 'RunSampleChunk', timestamps: false },
    );
  }
}
