import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { StudyCaseStatus } from '@photon-ledger/shared';

/** One case of a trade study: the values it sets, its status, its budget line values or error. */
export class StudyCaseModel extends Model<InferAttributes<StudyCaseModel>, InferCreationAttributes<StudyCaseModel>> {
  declare id: CreationOptional<string>;
  declare studyId: string;
  declare caseIndex: number;
  declare parameters: Record<string, number>;
  declare status: CreationOptional<StudyCaseStatus>;
  declare lines: CreationOptional<Record<string, number | null> | null>;
  declare errorMessage: CreationOptional<string | null>;
  declare workerId: CreationOptional<string | null>;
  declare attempts: CreationOptional<number>;
  declare startedAt: CreationOptional<Date | null>;
  declare heartbeatAt: CreationOptional<Date | null>;
  declare finishedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    StudyCaseModel.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        studyId: { type: DataTypes.UUID, allowNull: false },
        caseIndex: { type: DataTypes.INTEGER, allowNull: false },
        parameters: { type: DataTypes.JSONB, allowNull: false },
        status: { type: DataTypes.STRING(16), allowNull: false, defaultValue: 'queued' },
        lines: { type: DataTypes.JSONB, allowNull: true },
        errorMessage: { type: DataTypes.TEXT, allowNull: true },
        workerId: { type: DataTypes.STRING(120), allowNull: true },
        attempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        startedAt: { type: DataTypes.DATE, allowNull: true },
        heartbeatAt: { type: DataTypes.DATE, allowNull: true },
        finishedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'study_cases', modelName: 'StudyCase' },
    );
  }
}
