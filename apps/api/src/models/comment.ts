import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { CommentSubjectType } from '@photon-ledger/shared';

/** A remark on a study, a case or a budget (line), threaded by parent id. */
export class CommentModel extends Model<InferAttributes<CommentModel>, InferCreationAttributes<CommentModel>> {
  declare id: CreationOptional<string>;
  declare missionId: string;
  declare subjectType: CommentSubjectType;
  declare subjectId: string;
  declare lineKey: CreationOptional<string | null>;
  declare parentId: CreationOptional<string | null>;
  declare authorId: string | null;
  declare body: string;
  declare mentionUserIds: CreationOptional<string[]>;
  declare resolved: CreationOptional<boolean>;
  declare resolvedBy: CreationOptional<string | null>;
  declare resolvedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    CommentModel.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        missionId: { type: DataTypes.UUID, allowNull: false },
        subjectType: { type: DataTypes.STRING(16), allowNull: false },
        subjectId: { type: DataTypes.UUID, allowNull: false },
        lineKey: { type: DataTypes.STRING(64), allowNull: true },
        parentId: { type: DataTypes.UUID, allowNull: true },
        authorId: { type: DataTypes.UUID, allowNull: true },
        body: { type: DataTypes.TEXT, allowNull: false },
        mentionUserIds: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
        resolved: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        resolvedBy: { type: DataTypes.UUID, allowNull: true },
        resolvedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'comments', modelName: 'Comment' },
    );
  }
}
