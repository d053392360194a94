import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize, type Transaction } from 'sequelize';

/** One line of the audit log: who changed what, and when. Written in the same transaction as the change. */
export class AuditEntryModel extends Model<InferAttributes<AuditEntryModel>, InferCreationAttributes<AuditEntryModel>> {
  declare id: CreationOptional<string>;
  declare at: CreationOptional<Date>;
  declare userId: string | null;
  declare missionId: string | null;
  /** Verb in kebab-case: 'vehicle-revision-created', 'run-cancelled', 'requirement-set'... */
  declare action: string;
  declare entityType: string;
  declare entityId: string;
  declare detail: CreationOptional<Record<string, unknown>>;

  static initModel(sequelize: Sequelize): void {
    AuditEntryModel.init(
      {
        id: { type: DataTypes.BIGINT, primaryKey: true, autoIncrement: true },
        at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
        userId: { type: DataTypes.UUID, allowNull: true },
        missionId: { type: DataTypes.UUID, allowNull: true },
        action: { type: DataTypes.STRING(48), allowNull: false },
        entityType: { type: DataTypes.STRING(32), allowNull: false },
        entityId: { type: DataTypes.STRING(64), allowNull: false },
        detail: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
      },
      { sequelize, tableName: 'audit_log', modelName: 'AuditEntry', timestamps: false },
    );
  }
}

/** What one audit line records. */
export interface AuditRecord {
  userId: string | null;
  missionId: string | null;
  action: string;
  entityType: string;
  entityId: string;
  detail?: Record<string, unknown>;
}

/** Appends an audit line inside the caller's transaction (so it exists exactly when the change does). */
export async function audit(record: AuditRecord, transaction: Transaction): Promise<void> {
  await AuditEntryModel.create({ ...record, detail: record.detail ?? {} }, { transaction });
}
