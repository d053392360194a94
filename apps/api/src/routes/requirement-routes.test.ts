import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  apiErrorSchema,
  missionListSchema,
  missionRequirementListSchema,
  missionRequirementSchema,
  runBudgetReportSchema,
  type Role,
} from '@photon-ledger/shared';
import { AuditEntryModel, RequirementModel } from '../models';
import { startApi, type ApiHarness } from '../../test/api-harness';
import { storeRun, type StoredRun } from '../../test/stored-run';

describe('mission requirements and the budget they are held against', () => {
  let api: ApiHarness;
  let ids: Record<string, string>;
  let run: StoredRun;
  const requirementsPath = (line = '', missionId = ids['corvina-2']!) => `/api/missions/${missionId}/requirements${line ? `/${line}` : ''}`;
  const budgetOf = async (role: Role = 'reviewer') => {
    const res = await (await api.signedIn(role)).get(`/api/missions/${ids['corvina-2']}/runs/${run.runId}/budget`);
    expect(res.status).toBe(200);
    return runBudgetReportSchema.parse(res.body);
  };

  beforeAll(async () => {
    api = await startApi();
    const admin = await api.signedIn('admin');
    ids = Object.fromEntries(missionListSchema.parse((await admin.get('/api/missions')).body).missions.map((m) => [m.slug, m.id]));
    await RequirementModel.destroy({ where: { missionId: ids['corvina-2']! } });
    run = await storeRun(api.sequelize, { missionId: ids['corvina-2']!, spanDays: 0.25, outputStepS: 600 });
  });
  afterAll(async () => {
    await RequirementModel.destroy({ where: { missionId: ids['corvina-2']! } });
    await api.close();
  });

  it('a lead sets a requirement the run meets (pass), then tightens it below the run’s value (fail)', async () => {
    const lead = await api.signedIn('lead');
    const maxAccel = run.outcome!.budget.srpAcceleration.max;
    const loose = await lead.put(requirementsPath('srp.accel.max')).send({ comparator: '<=', value: 2 * maxAccel, unit: 'm/s^2', minMarginPercent: 10, note: 'ICD-7 §3' });
    expect(loose.status).toBe(201);
    expect(missionRequirementSchema.parse(loose.body)).toMatchObject({ line: 'srp.accel.max', comparator: '<=', minMarginPercent: 10, note: 'ICD-7 §3', unit: 'm/s^2' });
    let budget = await budgetOf();
    let line = budget.lines.find((l) => l.key === 'srp.accel.max')!;
    expect(line.status).toBe('pass');
    // '<=' margin = (req − value)/|req|·100 = 50 % for a limit twice the value.
    expect(line.marginPercent).toBeCloseTo(50, 9);
    expect(budget.counts.pass).toBe(1);

    const tight = await lead.put(requirementsPath('srp.accel.max')).send({ comparator: '<=', value: 0.9 * maxAccel });
    expect(tight.status).toBe(200);
    budget = await budgetOf();
    line = budget.lines.find((l) => l.key === 'srp.accel.max')!;
    expect(line.status).toBe('fail');
    expect(line.requirement).toEqual({ comparator: '<=', value: 0.9 * maxAccel, minMarginPercent: 0 });
    expect(budget.counts).toMatchObject({ pass: 0, fail: 1 });

    const audits = await AuditEntryModel.findAll({ where: { missionId: ids['corvina-2']!, action: 'requirement-set' }, order: [['id', 'ASC']] });
    expect(audits.map((a) => (a.detail as { after: { value: number } }).after.value).slice(-2)).toEqual([2 * maxAccel, 0.9 * maxAccel]);
    expect((audits.at(-1)!.detail as { before: { value: number } }).before.value).toBe(2 * maxAccel);
  });

  it('a requirement on a line the run did not compute shows that line with no value', async () => {
    const lead = await api.signedIn('lead');
    expect((await lead.put(requirementsPath('sail.lightnessNumber')).send({ comparator: '>=', value: 0.01 })).status).toBe(201);
    const line = (await budgetOf()).lines.find((l) => l.key === 'sail.lightnessNumber');
    expect(line).toMatchObject({ value: null, status: 'no-value', pass: false });
    expect((await lead.delete(requirementsPath('sail.lightnessNumber'))).status).toBe(204);
    expect((await budgetOf()).lines.find((l) => l.key === 'sail.lightnessNumber')).toBeUndefined();
  });

  it.each<Role>(['engineer', 'reviewer', 'admin'])('a %s cannot set or remove a requirement (403)', async (role) => {
    const agent = await api.signedIn(role);
    const put = await agent.put(requirementsPath('srp.deltaV.total')).send({ comparator: '<=', value: 1 });
    expect(put.status).toBe(403);
    expect(apiErrorSchema.parse(put.body).error.code).toBe('forbidden');
    expect((await agent.delete(requirementsPath('srp.accel.max'))).status).toBe(403);
    expect(await RequirementModel.count({ where: { missionId: ids['corvina-2']!, line: 'srp.deltaV.total' } })).toBe(0);
  });

  it('a non-member gets 404 for the mission’s requirements', async () => {
    const reviewer = await api.signedIn('reviewer');
    expect((await reviewer.get(requirementsPath('', ids['halyard-1']!))).status).toBe(404);
    const lead = await api.signedIn('lead');
    expect((await lead.get(requirementsPath('', '00000000-0000-4000-8000-000000000000'))).status).toBe(404);
  });

  it.each([
    ['value', { comparator: '<=', value: 0 }],
    ['value', { comparator: '<=', value: 'small' }],
    ['comparator', { comparator: '<', value: 1 }],
    ['unit', { comparator: '<=', value: 1, unit: 'km/s' }],
    ['minMarginPercent', { comparator: '<=', value: 1, minMarginPercent: -5 }],
    ['note', { comparator: '<=', value: 1, note: 42 }],
  ])('a body with a bad %s answers 400 naming it, and nothing is stored', async (field, body) => {
    const res = await (await api.signedIn('lead')).put(requirementsPath('srp.deltaV.total')).send(body);
    expect(res.status).toBe(400);
    expect(apiErrorSchema.parse(res.body).error.fields).toHaveProperty(field);
    expect(await RequirementModel.count({ where: { missionId: ids['corvina-2']!, line: 'srp.deltaV.total' } })).toBe(0);
  });

  it('an unknown line in the path answers 400 naming line', async () => {
    const res = await (await api.signedIn('lead')).put(requirementsPath('srp.accel.median')).send({ comparator: '<=', value: 1 });
    expect(res.status).toBe(400);
    expect(apiErrorSchema.parse(res.body).error.fields?.line).toMatch(/srp\.accel\.max/);
  });

  it('members list the requirements in budget order; a lead removes one (audited), and removing it again is 404', async () => {
    const lead = await api.signedIn('lead');
    expect((await lead.put(requirementsPath('srp.deltaV.total')).send({ comparator: '<=', value: 0.5, minMarginPercent: 20 })).status).toBe(201);
    const list = missionRequirementListSchema.parse((await (await api.signedIn('reviewer')).get(requirementsPath())).body);
    expect(list.requirements.map((r) => r.line)).toEqual(['srp.accel.max', 'srp.deltaV.total']);
    expect(list.requirements[1]).toMatchObject({ unit: 'm/s', label: expect.stringMatching(/Delta-v/) });

    expect((await lead.delete(requirementsPath('srp.deltaV.total'))).status).toBe(204);
    const audit = await AuditEntryModel.findOne({ where: { missionId: ids['corvina-2']!, action: 'requirement-deleted' }, order: [['id', 'DESC']] });
    expect(audit?.detail).toMatchObject({ line: 'srp.deltaV.total', before: { value: 0.5, minMarginPercent: 20 } });
    const again = await lead.delete(requirementsPath('srp.deltaV.total'));
    expect(again.status).toBe(404);
    expect(apiErrorSchema.parse(again.body).error.message).toMatch(/srp\.deltaV\.total/);
  });
});
