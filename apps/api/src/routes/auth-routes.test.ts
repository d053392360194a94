import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { apiErrorSchema, meResponseSchema } from '@photon-ledger/shared';
import { demoUser, startApi, type ApiHarness } from '../../test/api-harness';

describe('sign-in', () => {
  let api: ApiHarness;
  beforeAll(async () => {
    api = await startApi();
  });
  afterAll(() => api.close());

  it('a correct password signs in and sets an httpOnly, SameSite=Lax session cookie with an expiry', async () => {
    const res = await request(api.baseUrl).post('/api/auth/login').send(demoUser('engineer'));
    expect(res.status).toBe(200);
    expect(meResponseSchema.parse(res.body).user.role).toBe('engineer');
    const cookie = String(res.headers['set-cookie']?.[0]);
    expect(cookie).toMatch(/^pl_session=/);
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    expect(cookie).toMatch(/Max-Age=\d+/);
    expect(res.body.user).not.toHaveProperty('passwordHash');
  });

  it('a wrong password answers 401 in the shared error shape without a cookie', async () => {
    const res = await request(api.baseUrl)
      .post('/api/auth/login')
      .send({ email: demoUser('engineer').email, password: 'not-the-password' });
    expect(res.status).toBe(401);
    expect(apiErrorSchema.parse(res.body).error.code).toBe('unauthenticated');
    expect(res.headers['set-cookie']).toBeUndefined();
  });

  it('an unknown e-mail gets the same answer as a wrong password', async () => {
    const res = await request(api.baseUrl)
      .post('/api/auth/login')
      .send({ email: 'nobody@ostrander-vale.example', password: 'whatever-1' });
    expect(res.status).toBe(401);
    expect(res.body.error.message).toBe('e-mail or password is wrong');
  });

  it('a malformed body answers 400 naming each bad field', async () => {
    const res = await request(api.baseUrl).post('/api/auth/login').send({ email: 'not-an-address' });
    expect(res.status).toBe(400);
    const body = apiErrorSchema.parse(res.body);
    expect(body.error.code).toBe('validation_failed');
    expect(Object.keys(body.error.fields ?? {}).sort()).toEqual(['email', 'password']);
  });

  it('a body that is not JSON answers 400 in the shared error shape', async () => {
    const res = await request(api.baseUrl)
      .post('/api/auth/login')
      .set('Content-Type', 'application/json')
      .send('{"email": ');
    expect(res.status).toBe(400);
    expect(apiErrorSchema.parse(res.body).error.message).toMatch(/not valid JSON/);
  });

  it('GET /api/me answers the signed-in user, and 401 after sign-out', async () => {
    const agent = await api.signedIn('lead');
    const me = await agent.get('/api/me');
    expect(me.status).toBe(200);
    expect(me.body.user.email).toBe(demoUser('lead').email);
    const out = await agent.post('/api/auth/logout');
    expect(out.status).toBe(204);
    const after = await agent.get('/api/me');
    expect(after.status).toBe(401);
  });

  it('a forged session token is refused', async () => {
    const res = await request(api.baseUrl).get('/api/me').set('Cookie', 'pl_session=eyJhbGciOiJIUzI1NiJ9.e30.forged');
    expect(res.status).toBe(401);
  });
});

describe('sign-in rate limit', () => {
  it('the attempt after the limit answers 429 even with the right password', async () => {
    const api = await startApi({ PL_LOGIN_LIMIT: '3', PL_LOGIN_WINDOW_S: '600' });
    try {
      const bad = { email: demoUser('reviewer').email, password: 'wrong-password' };
      for (let i = 0; i < 3; i += 1) {
        expect((await request(api.baseUrl).post('/api/auth/login').send(bad)).status).toBe(401);
      }
      const res = await request(api.baseUrl).post('/api/auth/login').send(demoUser('reviewer'));
      expect(res.status).toBe(429);
      expect(apiErrorSchema.parse(res.body).error.code).toBe('rate_limited');
    } finally {
      await api.close();
    }
  });
});
