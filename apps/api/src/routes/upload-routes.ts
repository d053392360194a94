import { Router } from 'express';
import {
  ATTITUDE_PROFILE_MAX_BYTES,
  PLATE_SET_MAX_BYTES,
  missionParamsSchema,
  plateSetUploadFormSchema,
  uploadListQuerySchema,
  uploadRouteParamsSchema,
  type UploadList,
} from '@photon-ledger/shared';
import { currentUser } from '../middleware/auth';
import { receiveFile } from '../middleware/upload';
import { parseInput } from '../middleware/validate';
import { missionFor } from '../services/mission-access';
import { getUploadContent, listUploads, uploadAttitudeProfile, uploadPlateSet } from '../services/upload-service';
import type { RouteContext } from './route-context';

/** A file name safe inside a quoted header value (the exact name goes in filename*). */
function asciiFileName(name: string): string {
  return name.replace(/[^\x20-\x7e]|["\\]/g, '_');
}

/**
 * Uploaded files (plate-set CSV, attitude-profile CSV). Expects `requireUser` in front. The
 * caller's right to edit is checked before the file is read.
 */
export function uploadRoutes(_ctx: RouteContext): Router {
  const router = Router();

  router.post('/missions/:missionId/uploads/plate-set', async (req, res) => {
    const { missionId } = parseInput(missionParamsSchema, req.params, 'path');
    const user = currentUser(res);
    await missionFor(user, missionId, 'edit');
    const file = await receiveFile(req, res, PLATE_SET_MAX_BYTES);
    const form = parseInput(plateSetUploadFormSchema, file.fields, 'body');
    res.status(201).json(await uploadPlateSet(user, missionId, file, form));
  });

  router.post('/missions/:missionId/uploads/attitude-profile', async (req, res) => {
    const { missionId } = parseInput(missionParamsSchema, req.params, 'path');
    const user = currentUser(res);
    await missionFor(user, missionId, 'edit');
    const file = await receiveFile(req, res, ATTITUDE_PROFILE_MAX_BYTES);
    res.status(201).json(await uploadAttitudeProfile(user, missionId, file));
  });

  router.get('/missions/:missionId/uploads', async (req, res) => {
    const { missionId } = parseInput(missionParamsSchema, req.params, 'path');
    await missionFor(currentUser(res), missionId, 'read');
    const query = parseInput(uploadListQuerySchema, req.query, 'query');
    res.json({ uploads: await listUploads(missionId, query) } satisfies UploadList);
  });

  router.get('/missions/:missionId/uploads/:uploadId/content', async (req, res) => {
    const { missionId, uploadId } = parseInput(uploadRouteParamsSchema, req.params, 'path');
    await missionFor(currentUser(res), missionId, 'read');
    const content = await getUploadContent(missionId, uploadId);
    res.setHeader('Content-Type', content.contentType);
    res.setHeader('X-Content-Type-Options', 'nosniff');
    res.setHeader(
      'Content-Disposition',
      `attachment; filename="${asciiFileName(content.fileName)}"; filename*=UTF-8''${encodeURIComponent(content.fileName)}`,
    );
    res.send(content.data);
  });

  return router;
}
