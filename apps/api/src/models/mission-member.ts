import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** Membership of a user in a mission: what they may see at all. */
export class MissionMemberModel extends Model<InferAttributes<MissionMemberModel>, InferCreationAttributes<MissionMemberModel>> {
  declare missionId: string;
  declare userId: string;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    MissionMemberModel.init(
      {
        missionId: { type: DataTypes.UUID, primaryKey: true },
        userId: { type: DataTypes.UUID, primaryKey: true },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'mission_members', modelName: 'MissionMember', updatedAt: false },
    );
  }
}
