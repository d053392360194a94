/**
 * Every route of the catalogue × every role (admin, engineer, lead, reviewer, and a non-member:
 * the reviewer on a mission they do not belong to), each with a VALID request, asserting the
 * exact status: the documented success status when the role may, 403 when the role may not, 404
 * for a non-member on a mission-scoped route. A route added to the catalogue without a request
 * here fails the test.
 */
import { readFileSync } from 'node:fs';
import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type request from 'supertest';
import { vehicleSpecSchema, type Role } from '@photon-ledger/shared';
import { startApi, demoUser, type ApiHarness } from '../../test/api-harness';
import { storeRun } from '../../test/stored-run';
import { routeCatalogue, type RouteAccess, type RouteDoc } from '../openapi/route-catalogue';

type Agent = ReturnType<typeof request.agent>;
type Who = Role | 'non-member';
const everyone: Who[] = ['admin', 'engineer', 'lead', 'reviewer', 'non-member'];

const fixture = (relative: string) => readFileSync(new URL(`../../../../fixtures/${relative}`, import.meta.url));
const vehicleFile = () => vehicleSpecSchema.parse(JSON.parse(fixture('vehicles/corvina-2.vehicle.json').toString('utf8')));

/** May `who` call a route with this access rule? (The rule of services/mission-access.ts and the role guards.) */
function allowed(access: RouteAccess, who: Who): boolean {
  const role: Role = who === 'non-member' ? 'reviewer' : who;
  switch (access) {
    case 'public':
    case 'signed-in':
      return true;
    case 'admin':
      return role === 'admin';
    case 'admin-or-lead':
      return role === 'admin' || role === 'lead';
    case 'read':
      return who !== 'non-member';
    case 'comment':
      return who !== 'non-member' && role !== 'admin';
    case 'edit':
      return who !== 'non-member' && (role === 'engineer' || role === 'lead');
    case 'lead':
      return who !== 'non-member' && role === 'lead';
  }
}

const missionScoped = (access: RouteAccess) => access === 'read' || access === 'comment' || access === 'edit' || access === 'lead';

/** A valid request for a route: the concrete URL (after /api) and what to send. */
interface Prepared {
  url: string;
  body?: object;
  file?: { name: string; bytes: Buffer; fields?: Record<string, string> };
  /** Sign in afresh for this call (sign-out would end the shared session). */
  freshAgent?: boolean;
}

describe('permissions: every route × every role', () => {
  let api: ApiHarness;
  const agents = {} as Record<Role, Agent>;
  let corvina = '';
  let halyard = '';
  let vehicleId = '';
  let revisionId = '';
  let scenarioId = '';
  let editableScenario: { id: string; name: string; spec: object } = { id: '', name: '', spec: {} };
  let doneRunId = '';
  let uploadId = '';
  let removableUserId = '';

  const mission = (who: Who) => (who === 'non-member' ? halyard : corvina);

  beforeAll(async () => {
    api = await startApi();
    for (const role of ['admin', 'engineer', 'lead', 'reviewer'] as const) agents[role] = await api.signedIn(role);
    const missions = (await agents.admin.get('/api/missions')).body.missions as { id: string; slug: string }[];
    corvina = missions.find((m) => m.slug === 'corvina-2')!.id;
    halyard = missions.find((m) => m.slug === 'halyard-1')!.id;

    const v = await agents.engineer.post(`/api/missions/${corvina}/vehicles`).send({ name: `Permissions box-wing ${randomUUID().slice(0, 6)}`, spec: vehicleFile() });
    expect(v.status).toBe(201);
    vehicleId = v.body.vehicle.id;
    revisionId = v.body.revision.id;

    const stored = await storeRun(api.sequelize, { missionId: corvina, spanDays: 0.1, outputStepS: 900 });
    doneRunId = stored.runId;
    scenarioId = stored.scenarioId;
    const s = await agents.engineer.get(`/api/missions/${corvina}/scenarios/${scenarioId}`);
    expect(s.status).toBe(200);
    // Requirements live with the mission in the API, not in a scenario.
    editableScenario = { id: scenarioId, name: s.body.name, spec: { ...s.body.spec, requirements: [] } };

    const u = await agents.engineer
      .post(`/api/missions/${corvina}/uploads/attitude-profile`)
      .attach('file', fixture('uploads/corvina-2-yaw-follow.attitude.csv'), 'yaw.csv');
    expect(u.status).toBe(201);
    uploadId = u.body.upload.id;

    // Membership routes move the administrator (who sees every mission anyway), so the
    // reviewer stays a non-member of halyard-1 and everyone else keeps their missions.
    const users = (await agents.admin.get('/api/users')).body.users as { id: string; role: Role }[];
    removableUserId = users.find((x) => x.role === 'admin')!.id;
  }, 120_000);

  afterAll(async () => {
    // Leave membership as the seed made it: other test files count members.
    for (const id of [corvina, halyard]) if (id) await agents.admin?.delete(`/api/missions/${id}/members/${removableUserId}`);
    await api?.close();
  });

  /** A fresh scenario with no runs, for a delete. */
  async function scenarioWithoutRuns(): Promise<string> {
    const { spec } = editableScenario as { spec: Record<string, unknown> };
    const name = `Deletable ${randomUUID().slice(0, 8)}`;
    const res = await agents.engineer.post(`/api/missions/${corvina}/scenarios`).send({ name, spec: { ...spec, name, vehicle: { ref: revisionId } } });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    return res.body.id as string;
  }

  /** The body of a one-case study of the permissions scenario. */
  function studyBody(): object {
    return { name: `Permissions study ${randomUUID().slice(0, 8)}`, scenarioId, design: { kind: 'grid', parameters: [{ path: 'vehicle.massKg', values: [1500] }] }, lines: ['srp.accel.max', 'torque.max'] };
  }

  /** A new study with its case queued (for a cancel). */
  async function newStudy(): Promise<string> {
    const res = await agents.engineer.post(`/api/missions/${corvina}/studies`).send(studyBody());
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    return res.body.id as string;
  }

  let sharedStudyId: string | null = null;
  /** One study for the read routes, made on first use. */
  async function sharedStudy(): Promise<string> {
    sharedStudyId ??= await newStudy();
    return sharedStudyId;
  }

  let sharedMeshId: string | null = null;
  /** One imported mesh (the demo box-wing) for the mesh and table routes, made on first use. */
  async function sharedMesh(): Promise<string> {
    if (sharedMeshId) return sharedMeshId;
    const res = await agents.engineer
      .post(`/api/missions/${corvina}/meshes`)
      .field('units', 'm')
      .field('name', `Permissions mesh ${randomUUID().slice(0, 8)}`)
      .attach('file', fixture('meshes/corvina-2-box-wing.obj'), 'box-wing.obj');
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    sharedMeshId = res.body.id as string;
    return sharedMeshId;
  }

  /** A table request whose optics no earlier call used (so an allowed call creates a table: 201). */
  function tableBody(): object {
    const absorbed = Math.round(Math.random() * 1e6) / 1e7;
    return { optics: { default: { front: { absorbed, specular: 0.3, diffuse: 0.7 - absorbed } } }, table: { stepDeg: 15, samplesPerFacet: 1 } };
  }

  /** A new queued table of the shared mesh (no worker runs here). */
  async function newTable(): Promise<string> {
    const res = await agents.engineer.post(`/api/missions/${corvina}/meshes/${await sharedMesh()}/tables`).send(tableBody());
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    return res.body.id as string;
  }

  let doneTableId: string | null = null;
  /** A table marked succeeded with zero values written straight into its row (no worker runs here). */
  async function doneTable(): Promise<string> {
    if (doneTableId) return doneTableId;
    const id = await newTable();
    await api.sequelize.query(
      `UPDATE coefficient_tables SET status = 'succeeded', progress = 1, finished_at = now(),
              data = decode(repeat('00', 48 * polar_count * azimuth_count), 'hex') WHERE id = :id`,
      { replacements: { id } },
    );
    doneTableId = id;
    return id;
  }

  /** A queued run (no worker runs in this test, so it stays queued). */
  async function queuedRun(): Promise<string> {
    const res = await agents.engineer.post(`/api/missions/${corvina}/runs`).send({ scenarioId });
    expect(res.status).toBe(201);
    return res.body.id as string;
  }

  /** A fresh succeeded run of corvina-2; submitted for review by the engineer when `inReview`. */
  async function reviewableRun(inReview: boolean): Promise<string> {
    const { runId } = await storeRun(api.sequelize, { missionId: corvina, spanDays: 0.05, outputStepS: 900 });
    if (inReview) expect((await agents.engineer.post(`/api/missions/${corvina}/reviews/budget/${runId}/submit`).send({})).status).toBe(200);
    return runId;
  }

  /** A comment on the done run's budget written by `role`. */
  async function commentBy(role: 'engineer' | 'lead' | 'reviewer'): Promise<string> {
    const res = await agents[role].post(`/api/missions/${corvina}/comments`).send({ subjectType: 'budget', subjectId: doneRunId, body: `by ${role}` });
    expect(res.status).toBe(201);
    return res.body.id as string;
  }

  const requests: Record<string, (who: Who) => Promise<Prepared>> = {
    'get /health': async () => ({ url: '/health' }),
    'get /public-config': async () => ({ url: '/public-config' }),
    'post /auth/login': async (who) => ({ url: '/auth/login', body: demoUser(who === 'non-member' ? 'reviewer' : who) }),
    'post /auth/logout': async () => ({ url: '/auth/logout', freshAgent: true }),
    'get /me': async () => ({ url: '/me' }),
    'get /users': async () => ({ url: '/users' }),
    'get /missions': async () => ({ url: '/missions' }),
    'post /missions': async () => {
      const slug = `perm-${randomUUID().slice(0, 8)}`;
      return { url: '/missions', body: { slug, name: `Permissions ${slug}`, regime: 'earth-orbit', summary: '' } };
    },
    'get /missions/:missionId': async (who) => ({ url: `/missions/${mission(who)}` }),
    'post /missions/:missionId/members': async (who) => ({ url: `/missions/${mission(who)}/members`, body: { userId: removableUserId } }),
    'delete /missions/:missionId/members/:userId': async (who) => {
      // Put the member back first so every allowed call removes a real membership.
      await agents.admin.post(`/api/missions/${mission(who)}/members`).send({ userId: removableUserId });
      return { url: `/missions/${mission(who)}/members/${removableUserId}` };
    },
    'get /missions/:missionId/vehicles': async (who) => ({ url: `/missions/${mission(who)}/vehicles` }),
    'post /missions/:missionId/vehicles': async (who) => ({
      url: `/missions/${mission(who)}/vehicles`,
      body: { name: `Permissions vehicle ${randomUUID().slice(0, 8)}`, spec: vehicleFile() },
    }),
    'get /missions/:missionId/vehicles/:vehicleId': async (who) => ({ url: `/missions/${mission(who)}/vehicles/${vehicleId}` }),
    'post /missions/:missionId/vehicles/:vehicleId/revisions': async (who) => {
      const latest = (await agents.engineer.get(`/api/missions/${corvina}/vehicles/${vehicleId}`)).body.revision as number;
      return { url: `/missions/${mission(who)}/vehicles/${vehicleId}/revisions`, body: { spec: vehicleFile(), note: 'permissions test', basedOnRevision: latest } };
    },
    'get /missions/:missionId/vehicles/:vehicleId/revisions/:revision': async (who) => ({ url: `/missions/${mission(who)}/vehicles/${vehicleId}/revisions/1` }),
    'get /missions/:missionId/vehicles/:vehicleId/compare': async (who) => ({ url: `/missions/${mission(who)}/vehicles/${vehicleId}/compare?from=1&to=1` }),
    'post /missions/:missionId/uploads/plate-set': async (who) => ({
      url: `/missions/${mission(who)}/uploads/plate-set`,
      file: { name: 'plates.csv', bytes: fixture('uploads/corvina-2.plates.csv'), fields: { name: `Plate upload ${randomUUID().slice(0, 8)}`, massKg: '4200' } },
    }),
    'post /missions/:missionId/uploads/attitude-profile': async (who) => ({
      url: `/missions/${mission(who)}/uploads/attitude-profile`,
      file: { name: 'yaw.csv', bytes: fixture('uploads/corvina-2-yaw-follow.attitude.csv') },
    }),
    'get /missions/:missionId/uploads': async (who) => ({ url: `/missions/${mission(who)}/uploads` }),
    'get /missions/:missionId/uploads/:uploadId/content': async (who) => ({ url: `/missions/${mission(who)}/uploads/${uploadId}/content` }),
    'get /missions/:missionId/scenarios': async (who) => ({ url: `/missions/${mission(who)}/scenarios` }),
    'post /missions/:missionId/scenarios': async (who) => {
      const name = `Permissions scenario ${randomUUID().slice(0, 8)}`;
      return { url: `/missions/${mission(who)}/scenarios`, body: { name, spec: { ...editableScenario.spec, name, vehicle: { ref: revisionId } } } };
    },
    'get /missions/:missionId/scenarios/:scenarioId': async (who) => ({ url: `/missions/${mission(who)}/scenarios/${scenarioId}` }),
    'put /missions/:missionId/scenarios/:scenarioId': async (who) => ({
      url: `/missions/${mission(who)}/scenarios/${scenarioId}`,
      body: { name: editableScenario.name, spec: { ...editableScenario.spec, description: `edited by ${who}` } },
    }),
    'delete /missions/:missionId/scenarios/:scenarioId': async (who) => ({ url: `/missions/${mission(who)}/scenarios/${await scenarioWithoutRuns()}` }),
    'get /missions/:missionId/audit': async (who) => ({ url: `/missions/${mission(who)}/audit` }),
    'post /missions/:missionId/runs': async (who) => ({ url: `/missions/${mission(who)}/runs`, body: { scenarioId } }),
    'get /missions/:missionId/runs': async (who) => ({ url: `/missions/${mission(who)}/runs` }),
    'get /missions/:missionId/runs/:runId': async (who) => ({ url: `/missions/${mission(who)}/runs/${doneRunId}` }),
    'post /missions/:missionId/runs/:runId/cancel': async (who) => ({ url: `/missions/${mission(who)}/runs/${await queuedRun()}/cancel` }),
    'post /missions/:missionId/runs/:runId/rerun': async (who) => ({ url: `/missions/${mission(who)}/runs/${doneRunId}/rerun` }),
    'get /missions/:missionId/runs/:runId/summary': async (who) => ({ url: `/missions/${mission(who)}/runs/${doneRunId}/summary` }),
    'get /missions/:missionId/runs/:runId/events': async (who) => ({ url: `/missions/${mission(who)}/runs/${doneRunId}/events` }),
    'get /missions/:missionId/runs/:runId/samples': async (who) => ({ url: `/missions/${mission(who)}/runs/${doneRunId}/samples?limit=10` }),
    'get /missions/:missionId/runs/:runId/series': async (who) => ({ url: `/missions/${mission(who)}/runs/${doneRunId}/series?columns=srp_a_mag_m_s2&maxPoints=50` }),
    'get /missions/:missionId/runs/:runId/budget': async (who) => ({ url: `/missions/${mission(who)}/runs/${doneRunId}/budget` }),
    'get /missions/:missionId/requirements': async (who) => ({ url: `/missions/${mission(who)}/requirements` }),
    'put /missions/:missionId/requirements/:line': async (who) => {
      // It exists already, so an allowed call replaces it (200; a new one answers 201).
      const first = await agents.lead.put(`/api/missions/${corvina}/requirements/srp.accel.max`).send({ comparator: '<=', value: 2e-6 });
      expect([200, 201]).toContain(first.status);
      return { url: `/missions/${mission(who)}/requirements/srp.accel.max`, body: { comparator: '<=', value: 1e-6, minMarginPercent: 10 } };
    },
    'delete /missions/:missionId/requirements/:line': async (who) => {
      const put = await agents.lead.put(`/api/missions/${corvina}/requirements/torque.max`).send({ comparator: '<=', value: 1e-4 });
      expect([200, 201]).toContain(put.status);
      return { url: `/missions/${mission(who)}/requirements/torque.max` };
    },
    'get /missions/:missionId/runs/:runId/export/ephemeris.csv': async (who) => ({ url: `/missions/${mission(who)}/runs/${doneRunId}/export/ephemeris.csv` }),
    'get /missions/:missionId/runs/:runId/export/ephemeris.oem': async (who) => ({ url: `/missions/${mission(who)}/runs/${doneRunId}/export/ephemeris.oem` }),
    'get /missions/:missionId/runs/:runId/export/budget.csv': async (who) => ({ url: `/missions/${mission(who)}/runs/${doneRunId}/export/budget.csv` }),
    // Reviews: each call gets a fresh run in the state its transition starts from.
    'get /missions/:missionId/reviews': async (who) => ({ url: `/missions/${mission(who)}/reviews` }),
    'get /missions/:missionId/reviews/:subjectType/:subjectId': async (who) => ({ url: `/missions/${mission(who)}/reviews/budget/${doneRunId}` }),
    'post /missions/:missionId/reviews/:subjectType/:subjectId/submit': async (who) => ({ url: `/missions/${mission(who)}/reviews/budget/${await reviewableRun(false)}/submit`, body: {} }),
    'post /missions/:missionId/reviews/:subjectType/:subjectId/approve': async (who) => ({ url: `/missions/${mission(who)}/reviews/budget/${await reviewableRun(true)}/approve`, body: {} }),
    'post /missions/:missionId/reviews/:subjectType/:subjectId/send-back': async (who) => ({
      url: `/missions/${mission(who)}/reviews/budget/${await reviewableRun(true)}/send-back`,
      body: { reason: 'permissions test' },
    }),
    'get /missions/:missionId/comments': async (who) => ({ url: `/missions/${mission(who)}/comments?subjectType=budget&subjectId=${doneRunId}` }),
    'post /missions/:missionId/comments': async (who) => ({ url: `/missions/${mission(who)}/comments`, body: { subjectType: 'budget', subjectId: doneRunId, body: `remark by ${who}` } }),
    // Only the author edits: those who may comment edit their own comment.
    'put /missions/:missionId/comments/:commentId': async (who) => ({
      url: `/missions/${mission(who)}/comments/${await commentBy(who === 'lead' || who === 'reviewer' ? who : 'engineer')}`,
      body: { body: 'edited' },
    }),
    'post /missions/:missionId/comments/:commentId/resolve': async (who) => ({ url: `/missions/${mission(who)}/comments/${await commentBy('engineer')}/resolve`, body: { resolved: true } }),
    'get /admin/mail': async () => ({ url: '/admin/mail' }),
    // Trade studies: a one-case grid over the permissions scenario (no worker runs here, so cases stay queued).
    'post /missions/:missionId/studies': async (who) => ({ url: `/missions/${mission(who)}/studies`, body: studyBody() }),
    'get /missions/:missionId/studies': async (who) => ({ url: `/missions/${mission(who)}/studies` }),
    'get /missions/:missionId/studies/:studyId': async (who) => ({ url: `/missions/${mission(who)}/studies/${await sharedStudy()}` }),
    'post /missions/:missionId/studies/:studyId/cancel': async (who) => ({ url: `/missions/${mission(who)}/studies/${await newStudy()}/cancel` }),
    'get /missions/:missionId/studies/:studyId/cases': async (who) => ({ url: `/missions/${mission(who)}/studies/${await sharedStudy()}/cases?sort=line:srp.accel.max&dir=desc` }),
    'get /missions/:missionId/studies/:studyId/statistics': async (who) => ({ url: `/missions/${mission(who)}/studies/${await sharedStudy()}/statistics` }),
    'get /missions/:missionId/studies/:studyId/pareto': async (who) => ({ url: `/missions/${mission(who)}/studies/${await sharedStudy()}/pareto?x=srp.accel.max&y=torque.max` }),
    'get /missions/:missionId/studies/:studyId/best': async (who) => ({ url: `/missions/${mission(who)}/studies/${await sharedStudy()}/best?line=srp.accel.max` }),
    'get /missions/:missionId/studies/:studyId/export/cases.csv': async (who) => ({ url: `/missions/${mission(who)}/studies/${await sharedStudy()}/export/cases.csv` }),
    // Meshes and coefficient tables (no worker runs here: new tables stay queued).
    'post /missions/:missionId/meshes': async (who) => ({
      url: `/missions/${mission(who)}/meshes`,
      file: { name: 'box-wing.obj', bytes: fixture('meshes/corvina-2-box-wing.obj'), fields: { units: 'm', name: `Mesh upload ${randomUUID().slice(0, 8)}` } },
    }),
    'get /missions/:missionId/meshes': async (who) => ({ url: `/missions/${mission(who)}/meshes` }),
    'get /missions/:missionId/meshes/:meshId': async (who) => ({ url: `/missions/${mission(who)}/meshes/${await sharedMesh()}` }),
    'get /missions/:missionId/meshes/:meshId/geometry': async (who) => ({ url: `/missions/${mission(who)}/meshes/${await sharedMesh()}/geometry` }),
    'post /missions/:missionId/meshes/:meshId/tables': async (who) => ({ url: `/missions/${mission(who)}/meshes/${await sharedMesh()}/tables`, body: tableBody() }),
    'get /missions/:missionId/coefficient-tables/:tableId': async (who) => ({ url: `/missions/${mission(who)}/coefficient-tables/${await doneTable()}` }),
    'get /missions/:missionId/coefficient-tables/:tableId/data': async (who) => ({ url: `/missions/${mission(who)}/coefficient-tables/${await doneTable()}/data` }),
    'post /missions/:missionId/coefficient-tables/:tableId/cancel': async (who) => ({ url: `/missions/${mission(who)}/coefficient-tables/${await newTable()}/cancel` }),
  };

  it('has a valid request for every catalogued route', () => {
    const missing = routeCatalogue.map((r) => `${r.method} ${r.path}`).filter((k) => !(k in requests));
    expect(missing).toEqual([]);
  });

  async function call(route: RouteDoc, who: Who): Promise<number> {
    const prepared = await requests[`${route.method} ${route.path}`]!(who);
    const role: Role = who === 'non-member' ? 'reviewer' : who;
    const agent = prepared.freshAgent ? await api.signedIn(role) : agents[role];
    let req = agent[route.method](`/api${prepared.url}`);
    if (prepared.file) {
      for (const [k, v] of Object.entries(prepared.file.fields ?? {})) req = req.field(k, v);
      req = req.attach('file', prepared.file.bytes, prepared.file.name);
    } else if (prepared.body) {
      req = req.send(prepared.body);
    }
    const res = await req;
    return res.status;
  }

  it('answers each role with the documented status', async () => {
    const table: string[] = [];
    const wrong: string[] = [];
    for (const route of routeCatalogue) {
      const cells: string[] = [];
      for (const who of everyone) {
        const expected = allowed(route.access, who) ? route.response.status : who === 'non-member' && missionScoped(route.access) ? 404 : 403;
        const got = await call(route, who);
        cells.push(`${who}=${got}`);
        if (got !== expected) wrong.push(`${route.method.toUpperCase()} ${route.path} as ${who}: expected ${expected}, got ${got}`);
      }
      table.push(`${route.method.toUpperCase().padEnd(6)} ${route.path.padEnd(62)} ${cells.join(' ')}`);
    }
    console.log(`permission table (${routeCatalogue.length} routes × ${everyone.length} callers):\n${table.join('\n')}`);
    expect(wrong).toEqual([]);
  }, 180_000);
});
