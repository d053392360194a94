import type { Sequelize } from 'sequelize';
import { UserModel } from './user';
import { MissionModel } from './mission';
import { MissionMemberModel } from './mission-member';
import { UploadModel } from './upload';
import { VehicleModel } from './vehicle';
import { VehicleRevisionModel } from './vehicle-revision';
import { ScenarioModel } from './scenario';
import { RunModel } from './run';
import { RunResultModel } from './run-result';
import { RunSampleChunkModel } from './run-sample-chunk';
import { RequirementModel } from './requirement';
import { AuditEntryModel } from './audit-entry';

/** Registers every model and association on a connection. */
export function initModels(sequelize: Sequelize): void {
  UserModel.initModel(sequelize);
  MissionModel.initModel(sequelize);
  MissionMemberModel.initModel(sequelize);
  UploadModel.initModel(sequelize);
  VehicleModel.initModel(sequelize);
  VehicleRevisionModel.initModel(sequelize);
  ScenarioModel.initModel(sequelize);
  RunModel.initModel(sequelize);
  RunResultModel.initModel(sequelize);
  RunSampleChunkModel.initModel(sequelize);
  RequirementModel.initModel(sequelize);
  AuditEntryModel.initModel(sequelize);
  MissionModel.belongsToMany(UserModel, { through: MissionMemberModel, foreignKey: 'missionId', otherKey: 'userId', as: 'members' });
  UserModel.belongsToMany(MissionModel, { through: MissionMemberModel, foreignKey: 'userId', otherKey: 'missionId', as: 'missions' });
  VehicleModel.hasMany(VehicleRevisionModel, { foreignKey: 'vehicleId', as: 'revisions' });
  VehicleRevisionModel.belongsTo(VehicleModel, { foreignKey: 'vehicleId', as: 'vehicle' });
  ScenarioModel.belongsTo(VehicleRevisionModel, { foreignKey: 'vehicleRevisionId', as: 'vehicleRevision' });
  RunModel.belongsTo(ScenarioModel, { foreignKey: 'scenarioId', as: 'scenario' });
  RunModel.hasOne(RunResultModel, { foreignKey: 'runId', as: 'result' });
}

export { UserModel, toUser } from './user';
export { MissionModel, toMission } from './mission';
export { MissionMemberModel } from './mission-member';
export { UploadModel, type UploadKind } from './upload';
export { VehicleModel } from './vehicle';
export { VehicleRevisionModel } from './vehicle-revision';
export { ScenarioModel } from './scenario';
export { RunModel, type RunStatus } from './run';
export { RunResultModel } from './run-result';
export { RunSampleChunkModel } from './run-sample-chunk';
export { RequirementModel } from './requirement';
export { AuditEntryModel, audit, type AuditRecord } from './audit-entry';
