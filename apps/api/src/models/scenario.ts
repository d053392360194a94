import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { Scenario } from '@photon-ledger/shared';

/** A mission's scenario: the shared scenario spec with `vehicle: { ref: <vehicle revision id> }`. */
export class ScenarioModel extends Model<InferAttributes<ScenarioModel>, InferCreationAttributes<ScenarioModel>> {
  declare id: CreationOptional<string>;
  declare missionId: string;
  declare name: string;
  declare vehicleRevisionId: string;
  declare spec: Scenario;
  declare createdBy: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    ScenarioModel.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        missionId: { type: DataTypes.UUID, allowNull: false },
        name: { type: DataTypes.STRING(120), allowNull: false },
        vehicleRevisionId: { type: DataTypes.UUID, allowNull: false },
        spec: { type: DataTypes.JSONB, allowNull: false },
        createdBy: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'scenarios', modelName: 'Scenario' },
    );
  }
}
