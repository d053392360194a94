import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { ReviewState, ReviewSubjectType } from '@photon-ledger/shared';

/** The review of one subject (a study or a run's budget): its state and, once approved, what was frozen. */
export class ReviewModel extends Model<InferAttributes<ReviewModel>, InferCreationAttributes<ReviewModel>> {
  declare id: CreationOptional<string>;
  declare missionId: string;
  declare subjectType: ReviewSubjectType;
  declare subjectId: string;
  declare state: ReviewState;
  declare submittedBy: CreationOptional<string | null>;
  declare submittedAt: CreationOptional<Date | null>;
  declare decidedBy: CreationOptional<string | null>;
  declare decidedAt: CreationOptional<Date | null>;
  declare reason: CreationOptional<string | null>;
  declare note: CreationOptional<string | null>;
  declare frozenIds: CreationOptional<Record<string, string | string[]> | null>;
  declare contentHash: CreationOptional<string | null>;
  declare frozenAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    ReviewModel.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        missionId: { type: DataTypes.UUID, allowNull: false },
        subjectType: { type: DataTypes.STRING(16), allowNull: false },
        subjectId: { type: DataTypes.UUID, allowNull: false },
        state: { type: DataTypes.STRING(20), allowNull: false },
        submittedBy: { type: DataTypes.UUID, allowNull: true },
        submittedAt: { type: DataTypes.DATE, allowNull: true },
        decidedBy: { type: DataTypes.UUID, allowNull: true },
        decidedAt: { type: DataTypes.DATE, allowNull: true },
        reason: { type: DataTypes.TEXT, allowNull: true },
        note: { type: DataTypes.TEXT, allowNull: true },
        frozenIds: { type: DataTypes.JSONB, allowNull: true },
        contentHash: { type: DataTypes.CHAR(64), allowNull: true },
        frozenAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'reviews', modelName: 'Review' },
    );
  }
}
