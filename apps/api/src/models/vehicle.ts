import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** A vehicle of a mission; its geometry and optics live in immutable revisions. */
export class VehicleModel extends Model<InferAttributes<VehicleModel>, InferCreationAttributes<VehicleModel>> {
  declare id: CreationOptional<string>;
  declare missionId: string;
  declare name: string;
  declare kind: string;
  /** Number of the newest revision (1, 2, ...). */
  declare latestRevision: CreationOptional<number>;
  declare createdBy: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    VehicleModel.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        missionId: { type: DataTypes.UUID, allowNull: false },
        name: { type: DataTypes.STRING(120), allowNull: false },
        kind: { type: DataTypes.STRING(16), allowNull: false },
        latestRevision: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        createdBy: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'vehicles', modelName: 'Vehicle' },
    );
  }
}
