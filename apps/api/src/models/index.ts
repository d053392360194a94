import type { Sequelize } from 'sequelize';
import { UserModel } from './user';
import { MissionModel } from './mission';
import { MissionMemberModel } from './mission-member';

/** Registers every model and association on a connection. */
export function initModels(sequelize: Sequelize): void {
  UserModel.initModel(sequelize);
  MissionModel.initModel(sequelize);
  MissionMemberModel.initModel(sequelize);
  MissionModel.belongsToMany(UserModel, { through: MissionMemberModel, foreignKey: 'missionId', otherKey: 'userId', as: 'members' });
  UserModel.belongsToMany(MissionModel, { through: MissionMemberModel, foreignKey: 'userId', otherKey: 'missionId', as: 'missions' });
}

export { UserModel, toUser } from './user';
export { MissionModel, toMission } from './mission';
export { MissionMemberModel } from './mission-member';
