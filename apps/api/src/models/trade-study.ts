import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** A trade study: base snapshots, the definition as posted, and how many cases it made. */
export class TradeStudyModel extends Model<InferAttributes<TradeStudyModel>, InferCreationAttributes<TradeStudyModel>> {
  declare id: CreationOptional<string>;
  declare missionId: string;
  declare name: string;
  declare scenarioId: string | null;
  declare vehicleRevisionId: string;
  declare baseScenario: Record<string, unknown>;
  declare baseVehicle: Record<string, unknown>;
  declare definition: Record<string, unknown>;
  declare caseCount: number;
  declare cancelRequested: CreationOptional<boolean>;
  declare createdBy: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    TradeStudyModel.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        missionId: { type: DataTypes.UUID, allowNull: false },
        name: { type: DataTypes.STRING(200), allowNull: false },
        scenarioId: { type: DataTypes.UUID, allowNull: true },
        vehicleRevisionId: { type: DataTypes.UUID, allowNull: false },
        baseScenario: { type: DataTypes.JSONB, allowNull: false },
        baseVehicle: { type: DataTypes.JSONB, allowNull: false },
        definition: { type: DataTypes.JSONB, allowNull: false },
        caseCount: { type: DataTypes.INTEGER, allowNull: false },
        cancelRequested: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        createdBy: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'trade_studies', modelName: 'TradeStudy' },
    );
  }
}
