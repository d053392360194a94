import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { Mission, MissionRegime } from '@photon-ledger/shared';

/** A programme's mission: the unit of membership and the home of vehicles, scenarios and runs. */
export class MissionModel extends Model<InferAttributes<MissionModel>, InferCreationAttributes<MissionModel>> {
  declare id: CreationOptional<string>;
  declare slug: string;
  declare name: string;
  declare regime: MissionRegime;
  declare summary: string;
  declare createdBy: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    MissionModel.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        slug: { type: DataTypes.STRING(60), allowNull: false, unique: true },
        name: { type: DataTypes.STRING(120), allowNull: false },
        regime: { type: DataTypes.STRING(16), allowNull: false },
        summary: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        createdBy: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'missions', modelName: 'Mission' },
    );
  }
}

/** The public view of a mission row. */
export function toMission(row: MissionModel): Mission {
  return {
    id: row.id,
    slug: row.slug,
    name: row.name,
    regime: row.regime,
    summary: row.summary,
    createdAt: row.createdAt.toISOString(),
  };
}
