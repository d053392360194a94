import type { User } from '@photon-ledger/shared';
import { AppError } from '../errors/app-error';
import type { MissionModel } from '../models';
import { getVisibleMission } from './mission-service';

/**
 * What a request wants to do in a mission:
 * - `read`: see inputs and results (every member; admins see every mission);
 * - `comment`: add a remark (members, reviewers included; not admins, who only manage membership);
 * - `edit`: change inputs (vehicles, scenarios, uploads) and start or cancel runs (engineers and leads);
 * - `lead`: set requirements and margins, approve (leads only).
 */
export type MissionAction = 'read' | 'comment' | 'edit' | 'lead';

const allowed: Record<MissionAction, readonly User['role'][]> = {
  read: ['admin', 'engineer', 'lead', 'reviewer'],
  comment: ['engineer', 'lead', 'reviewer'],
  edit: ['engineer', 'lead'],
  lead: ['lead'],
};

const why: Record<MissionAction, string> = {
  read: 'reading this mission',
  comment: 'commenting',
  edit: 'changing inputs or runs needs the role engineer or lead',
  lead: 'setting requirements and approving needs the role lead',
};

/**
 * Loads the mission for `action`: 404 when the user may not see it (unknown and foreign missions are
 * not told apart), then 403 when their role may not do `action` there. Every mission-scoped route
 * starts with this.
 */
export async function missionFor(user: User, missionId: string, action: MissionAction): Promise<MissionModel> {
  const mission = await getVisibleMission(user, missionId);
  if (!allowed[action].includes(user.role)) {
    throw new AppError('forbidden', `${why[action]}; you are ${user.role}`);
  }
  return mission;
}
