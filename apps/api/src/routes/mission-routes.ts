import { Router } from 'express';
import {
  memberAddSchema,
  missionCreateSchema,
  missionListQuerySchema,
  missionParamsSchema,
  type MissionList,
} from '@photon-ledger/shared';
import { z } from 'zod';
import { parseInput } from '../middleware/validate';
import { currentUser, requireRole } from '../middleware/auth';
import { addMember, createMission, getMissionDetail, listMissions, removeMember } from '../services/mission-service';

const memberParamsSchema = missionParamsSchema.extend({ userId: z.uuid({ message: 'userId must be a UUID' }) });

/** Missions and their membership. Expects `requireUser` in front. */
export function missionRoutes(): Router {
  const router = Router();

  router.get('/missions', async (req, res) => {
    const query = parseInput(missionListQuerySchema, req.query, 'query');
    res.json({ missions: await listMissions(currentUser(res), query) } satisfies MissionList);
  });

  router.post('/missions', requireRole('admin', 'lead'), async (req, res) => {
    const input = parseInput(missionCreateSchema, req.body, 'body');
    res.status(201).json(await createMission(currentUser(res), input));
  });

  router.get('/missions/:missionId', async (req, res) => {
    const { missionId } = parseInput(missionParamsSchema, req.params, 'path');
    res.json(await getMissionDetail(currentUser(res), missionId));
  });

  router.post('/missions/:missionId/members', requireRole('admin'), async (req, res) => {
    const { missionId } = parseInput(missionParamsSchema, req.params, 'path');
    const { userId } = parseInput(memberAddSchema, req.body, 'body');
    await addMember(missionId, userId);
    res.status(204).end();
  });

  router.delete('/missions/:missionId/members/:userId', requireRole('admin'), async (req, res) => {
    const { missionId, userId } = parseInput(memberParamsSchema, req.params, 'path');
    await removeMember(missionId, userId);
    res.status(204).end();
  });

  return router;
}
