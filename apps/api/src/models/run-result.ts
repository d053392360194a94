import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** The stored outcome of a succeeded run, besides its samples (see RunSampleChunkModel). */
export class RunResultModel extends Model<InferAttributes<RunResultModel>, InferCreationAttributes<RunResultModel>> {
  declare runId: string;
  declare summary: Record<string, unknown>;
  declare events: { name: string; tSeconds: number; utc: string }[];
  /** srp-core's SrpBudget computed without requirements. */
  declare budget: Record<string, unknown>;
  declare layout: { stride: number; forceNames: string[] };
  declare sampleCount: number;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    RunResultModel.init(
      {
        runId: { type: DataTypes.UUID, primaryKey: true },
        summary: { type: DataTypes.JSONB, allowNull: false },
        events: { type: DataTypes.JSONB, allowNull: false },
        budget: { type: DataTypes.JSONB, allowNull: false },
        layout: { type: DataTypes.JSONB, allowNull: false },
        sampleCount: { type: DataTypes.INTEGER, allowNull: false },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'run_results', modelName: 'RunResult', updatedAt: false },
    );
  }
}
