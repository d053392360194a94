/**
 * Every API route with who may call it and the shared schemas of its path, query, body and answer.
 * The OpenAPI document is generated from this table, and the permission test walks it (so a route
 * missing here fails a test: see route-catalogue.test.ts).
 */
import { z } from 'zod';
import {
  healthSchema,
  loginRequestSchema,
  meResponseSchema,
  memberAddSchema,
  missionCreateSchema,
  missionDetailSchema,
  missionListQuerySchema,
  missionListSchema,
  missionParamsSchema,
  missionSchema,
  publicConfigSchema,
  userSchema,
} from '@photon-ledger/shared';
import type { MissionAction } from '../services/mission-access';
import { inputRoutes } from './catalogue-inputs';
import { runRoutes } from './catalogue-runs';
import { resultRoutes } from './catalogue-results';
import { studyRouteDocs } from './catalogue-studies';
import { reviewRouteDocs } from './catalogue-reviews';
import { meshRouteDocs } from './catalogue-meshes';

/**
 * Who may call a route: `public` (no sign-in), `signed-in` (any role), `admin`, `admin-or-lead`,
 * or a mission action (membership of the path's mission, then the role rule of
 * services/mission-access.ts).
 */
export type RouteAccess = 'public' | 'signed-in' | 'admin' | 'admin-or-lead' | MissionAction;

/** One documented route. `path` is Express style (`/missions/:missionId`), relative to /api. */
export interface RouteDoc {
  method: 'get' | 'post' | 'put' | 'delete';
  path: string;
  summary: string;
  tag: string;
  access: RouteAccess;
  params?: z.ZodObject;
  query?: z.ZodObject;
  body?: z.ZodType;
  /** multipart/form-data: the form fields besides `file` (the upload itself). */
  multipart?: z.ZodType;
  response: {
    status: number;
    /** JSON answer; omitted for 204 and for files. */
    schema?: z.ZodType;
    /** A file answer (text/csv...) instead of JSON. */
    contentType?: string;
  };
}

const memberParams = missionParamsSchema.extend({ userId: z.uuid() });

/** Routes of the walking skeleton: health, sign-in, missions and membership. */
const coreRoutes: RouteDoc[] = [
  { method: 'get', path: '/health', summary: 'Service and database health', tag: 'service', access: 'public', response: { status: 200, schema: healthSchema } },
  {
    method: 'get',
    path: '/public-config',
    summary: 'What the sign-in page may know (demo accounts in demo mode)',
    tag: 'service',
    access: 'public',
    response: { status: 200, schema: publicConfigSchema },
  },
  {
    method: 'post',
    path: '/auth/login',
    summary: 'Sign in: sets the httpOnly session cookie',
    tag: 'session',
    access: 'public',
    body: loginRequestSchema,
    response: { status: 200, schema: meResponseSchema },
  },
  { method: 'post', path: '/auth/logout', summary: 'Sign out: clears the session cookie', tag: 'session', access: 'public', response: { status: 204 } },
  { method: 'get', path: '/me', summary: 'The signed-in user', tag: 'session', access: 'signed-in', response: { status: 200, schema: meResponseSchema } },
  {
    method: 'get',
    path: '/users',
    summary: 'Every user (administrators)',
    tag: 'users',
    access: 'admin',
    response: { status: 200, schema: z.object({ users: z.array(userSchema) }) },
  },
  {
    method: 'get',
    path: '/missions',
    summary: 'Missions visible to the caller',
    tag: 'missions',
    access: 'signed-in',
    query: missionListQuerySchema,
    response: { status: 200, schema: missionListSchema },
  },
  {
    method: 'post',
    path: '/missions',
    summary: 'Create a mission (its creator becomes a member)',
    tag: 'missions',
    access: 'admin-or-lead',
    body: missionCreateSchema,
    response: { status: 201, schema: missionSchema },
  },
  {
    method: 'get',
    path: '/missions/:missionId',
    summary: 'A mission with its members',
    tag: 'missions',
    access: 'read',
    params: missionParamsSchema,
    response: { status: 200, schema: missionDetailSchema },
  },
  {
    method: 'post',
    path: '/missions/:missionId/members',
    summary: 'Add a member',
    tag: 'missions',
    access: 'admin',
    params: missionParamsSchema,
    body: memberAddSchema,
    response: { status: 204 },
  },
  {
    method: 'delete',
    path: '/missions/:missionId/members/:userId',
    summary: 'Remove a member',
    tag: 'missions',
    access: 'admin',
    params: memberParams,
    response: { status: 204 },
  },
];

/** Every route, in the order the document lists them. */
export const routeCatalogue: RouteDoc[] = [...coreRoutes, ...inputRoutes, ...runRoutes, ...resultRoutes, ...studyRouteDocs, ...reviewRouteDocs, ...meshRouteDocs];
