import { Op, UniqueConstraintError, type WhereOptions } from 'sequelize';
import type { Mission, MissionCreate, MissionDetail, MissionListQuery, User } from '@photon-ledger/shared';
import { MissionMemberModel, MissionModel, UserModel, toMission } from '../models';
import { AppError, notFound } from '../errors/app-error';

/** Admins manage membership and so see every mission; everyone else sees their own. */
function seesAll(user: User): boolean {
  return user.role === 'admin';
}

/** Missions visible to the user, filtered and sorted by name. */
export async function listMissions(user: User, query: MissionListQuery): Promise<Mission[]> {
  const where: WhereOptions<MissionModel> = {};
  if (query.regime) Object.assign(where, { regime: query.regime });
  if (query.q) {
    const like = `%${query.q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
    Object.assign(where, { [Op.or]: [{ name: { [Op.iLike]: like } }, { slug: { [Op.iLike]: like } }] });
  }
  const rows = await MissionModel.findAll({
    where,
    order: [['name', 'ASC']],
    include: seesAll(user)
      ? []
      : [{ model: UserModel, as: 'members', attributes: [], where: { id: user.id }, through: { attributes: [] } }],
  });
  return rows.map(toMission);
}

/**
 * Loads a mission the user may see; an unknown mission and a foreign one both answer 404,
 * so nobody learns which missions exist outside their own.
 */
export async function getVisibleMission(user: User, missionId: string): Promise<MissionModel> {
  // One round trip (every mission-scoped request starts here): the mission, if the user may see it.
  const rows = await MissionModel.sequelize!.query(
    `SELECT m.* FROM missions m
      WHERE m.id = :missionId
        AND (:seesAll OR EXISTS (SELECT 1 FROM mission_members mm WHERE mm.mission_id = m.id AND mm.user_id = :userId))`,
    { replacements: { missionId, userId: user.id, seesAll: seesAll(user) }, model: MissionModel, mapToModel: true },
  );
  const row = rows[0];
  if (!row) throw notFound('mission');
  return row;
}

/** A mission with its members. */
export async function getMissionDetail(user: User, missionId: string): Promise<MissionDetail> {
  const mission = await getVisibleMission(user, missionId);
  const members = await UserModel.findAll({
    include: [{ model: MissionModel, as: 'missions', attributes: [], where: { id: missionId }, through: { attributes: [] } }],
    order: [['displayName', 'ASC']],
  });
  return {
    ...toMission(mission),
    members: members.map((m) => ({ userId: m.id, displayName: m.displayName, email: m.email, role: m.role })),
  };
}

/** Creates a mission with its creator as the first member, in one transaction. */
export async function createMission(user: User, input: MissionCreate): Promise<Mission> {
  const sequelize = MissionModel.sequelize!;
  try {
    return await sequelize.transaction(async (transaction) => {
      const row = await MissionModel.create({ ...input, createdBy: user.id }, { transaction });
      await MissionMemberModel.create({ missionId: row.id, userId: user.id }, { transaction });
      return toMission(row);
    });
  } catch (err) {
    if (err instanceof UniqueConstraintError) {
      throw new AppError('conflict', `a mission with slug "${input.slug}" already exists`, {
        fields: { slug: 'already taken: choose another slug' },
        cause: err,
      });
    }
    throw err;
  }
}

/** Adds a member to a mission (idempotent). */
export async function addMember(missionId: string, userId: string): Promise<void> {
  const mission = await MissionModel.findByPk(missionId);
  if (!mission) throw notFound('mission');
  const user = await UserModel.findByPk(userId);
  if (!user) throw new AppError('validation_failed', 'no such user', { fields: { userId: 'no user has this id' } });
  await MissionMemberModel.findOrCreate({ where: { missionId, userId } });
}

/** Removes a member from a mission; removing a non-member is not an error. */
export async function removeMember(missionId: string, userId: string): Promise<void> {
  const mission = await MissionModel.findByPk(missionId);
  if (!mission) throw notFound('mission');
  await MissionMemberModel.destroy({ where: { missionId, userId } });
}
