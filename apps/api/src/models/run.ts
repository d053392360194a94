import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { Scenario } from '@photon-ledger/shared';

/** Where a run stands. */
export type RunStatus = 'queued' | 'running' | 'succeeded' | 'failed' | 'cancelled';

/** One analysis run of a scenario, with the scenario and vehicle revision it was made from. */
export class RunModel extends Model<InferAttributes<RunModel>, InferCreationAttributes<RunModel>> {
  declare id: CreationOptional<string>;
  declare missionId: string;
  declare scenarioId: string;
  declare vehicleRevisionId: string;
  declare scenarioSpec: Scenario;
  declare status: CreationOptional<RunStatus>;
  declare progress: CreationOptional<number>;
  declare cancelRequested: CreationOptional<boolean>;
  declare errorMessage: CreationOptional<string | null>;
  declare workerId: CreationOptional<string | null>;
  declare attempts: CreationOptional<number>;
  declare rerunOf: CreationOptional<string | null>;
  declare queuedAt: CreationOptional<Date>;
  declare startedAt: CreationOptional<Date | null>;
  declare heartbeatAt: CreationOptional<Date | null>;
  declare finishedAt: CreationOptional<Date | null>;
  declare createdBy: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    RunModel.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        missionId: { type: DataTypes.UUID, allowNull: false },
        scenarioId: { type: DataTypes.UUID, allowNull: false },
        vehicleRevisionId: { type: DataTypes.UUID, allowNull: false },
        scenarioSpec: { type: DataTypes.JSONB, allowNull: false },
        status: { type: DataTypes.STRING(16), allowNull: false, defaultValue: 'queued' },
        progress: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0 },
        cancelRequested: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        errorMessage: { type: DataTypes.TEXT, allowNull: true },
        workerId: { type: DataTypes.STRING(120), allowNull: true },
        attempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        rerunOf: { type: DataTypes.UUID, allowNull: true },
        queuedAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
        startedAt: { type: DataTypes.DATE, allowNull: true },
        heartbeatAt: { type: DataTypes.DATE, allowNull: true },
        finishedAt: { type: DataTypes.DATE, allowNull: true },
        createdBy: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'runs', modelName: 'Run' },
    );
  }
}
