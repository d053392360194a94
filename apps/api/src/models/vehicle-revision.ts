import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { VehicleSpec } from '@photon-ledger/shared';

/** One immutable revision of a vehicle: the spec (shared vehicleSpecSchema) plus columns for listing. */
export class VehicleRevisionModel extends Model<InferAttributes<VehicleRevisionModel>, InferCreationAttributes<VehicleRevisionModel>> {
  declare id: CreationOptional<string>;
  declare vehicleId: string;
  declare revision: number;
  declare spec: VehicleSpec;
  declare kind: string;
  declare massKg: number;
  declare surfaceCount: number;
  declare totalAreaM2: number;
  declare note: CreationOptional<string>;
  declare sourceUploadId: string | null;
  declare createdBy: string | null;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    VehicleRevisionModel.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        vehicleId: { type: DataTypes.UUID, allowNull: false },
        revision: { type: DataTypes.INTEGER, allowNull: false },
        spec: { type: DataTypes.JSONB, allowNull: false },
        kind: { type: DataTypes.STRING(16), allowNull: false },
        massKg: { type: DataTypes.DOUBLE, allowNull: false },
        surfaceCount: { type: DataTypes.INTEGER, allowNull: false },
        totalAreaM2: { type: DataTypes.DOUBLE, allowNull: false },
        note: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        sourceUploadId: { type: DataTypes.UUID, allowNull: true },
        createdBy: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'vehicle_revisions', modelName: 'VehicleRevision', updatedAt: false },
    );
  }
}
