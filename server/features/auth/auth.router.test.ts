import { randomUUID } from 'node:crypto';
import supertest from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  browserAgent,
  DEMO,
  signedInAgent,
  startTestServer,
  type TestServer,
} from '../../../tests/helpers/test-server.js';
import { User } from '../users/user.entity.js';
import { Session } from './session.entity.js';

let server: TestServer;
beforeAll(async () => {
  server = await startTestServer();
});
afterAll(() => server.close());

const sessionCount = () => server.dataSource.getRepository(Session).count();
const cookieOf = (res: supertest.Response) =>
  ([] as string[]).concat(res.headers['set-cookie'] ?? []).join('; ');

describe('sign-in', () => {
  it('signs in with the right password and sets an HttpOnly, SameSite=Lax session cookie', async () => {
    const res = await browserAgent(server.app)
      .post('/api/auth/sign-in')
      .send({ email: DEMO.technician, password: 'ringseat-demo' });
    expect(res.status).toBe(200);
    expect(res.body.user).toMatchObject({
      email: DEMO.technician,
      role: 'technician',
      workshopName: 'Tidewright Marine Works',
    });
    const cookie = cookieOf(res);
    expect(cookie).toMatch(/^ringseat_session=\w+/);
    expect(cookie).toContain('HttpOnly');
    expect(cookie).toContain('SameSite=Lax');
    expect(cookie).not.toContain('Secure'); // served over plain http here
  });

  it('accepts the e-mail address in any case and with spaces around it', async () => {
    const res = await browserAgent(server.app)
      .post('/api/auth/sign-in')
      .send({ email: '  IVO@Tidewright.example ', password: 'ringseat-demo' });
    expect(res.status).toBe(200);
  });

  it('refuses a wrong password and an unknown e-mail with the same 401 problem, and creates no session', async () => {
    const before = await sessionCount();
    const wrong = await browserAgent(server.app)
      .post('/api/auth/sign-in')
      .send({ email: DEMO.manager, password: 'not-the-password' });
    const unknown = await browserAgent(server.app)
      .post('/api/auth/sign-in')
      .send({ email: 'nobody@tidewright.example', password: 'whatever-it-is' });
    for (const res of [wrong, unknown]) {
      expect(res.status).toBe(401);
      expect(res.headers['content-type']).toContain('application/problem+json');
      expect(res.body).toMatchObject({
        status: 401,
        title: 'Sign-in failed',
        detail: 'The e-mail address or the password is not right.',
      });
      expect(res.headers['set-cookie']).toBeUndefined();
    }
    expect(await sessionCount()).toBe(before);
  });

  it('names each wrong field when the body has the wrong types', async () => {
    const res = await browserAgent(server.app)
      .post('/api/auth/sign-in')
      .send({ email: 42, password: ['x'] });
    expect(res.status).toBe(400);
    expect(res.body.type).toBe('/problems/validation-failed');
    const fields = res.body.errors.map((e: { field: string }) => e.field);
    expect(fields).toEqual(expect.arrayContaining(['email', 'password']));
  });

  it('rejects malformed JSON with 400 and no stack trace', async () => {
    const res = await browserAgent(server.app)
      .post('/api/auth/sign-in')
      .set('Content-Type', 'application/json')
      .send('{"email": "a@b.c", ');
    expect(res.status).toBe(400);
    expect(res.body).toMatchObject({
      type: '/problems/malformed-json',
      detail: 'The request body is not valid JSON.',
    });
    expect(JSON.stringify(res.body)).not.toMatch(/at .*\.(js|ts):\d+/);
  });

  it('rejects an oversize JSON body with 413', async () => {
    const res = await browserAgent(server.app)
      .post('/api/auth/sign-in')
      .send({ email: DEMO.manager, password: 'x'.repeat(200_000) });
    expect(res.status).toBe(413);
    expect(res.body.type).toBe('/problems/body-too-large');
  });
});

describe('origin check on state-changing requests', () => {
  it('refuses a sign-in without an Origin header and creates no session', async () => {
    const before = await sessionCount();
    const res = await supertest(server.app)
      .post('/api/auth/sign-in')
      .send({ email: DEMO.manager, password: 'ringseat-demo' });
    expect(res.status).toBe(403);
    expect(res.body.type).toBe('/problems/origin-missing');
    expect(await sessionCount()).toBe(before);
  });

  it('refuses a request from another site', async () => {
    const res = await browserAgent(server.app)
      .set('Origin', 'https://evil.example')
      .post('/api/auth/sign-in')
      .send({ email: DEMO.manager, password: 'ringseat-demo' });
    expect(res.status).toBe(403);
    expect(res.body.type).toBe('/problems/origin-mismatch');
  });

  it('lets reads through without an Origin header', async () => {
    const res = await supertest(server.app).get('/api/health');
    expect(res.status).toBe(200);
  });
});

describe('sessions', () => {
  it('knows who is signed in, and forgets after sign-out', async () => {
    const agent = await signedInAgent(server.app, DEMO.skipperA);
    expect((await agent.get('/api/auth/me')).body.user).toMatchObject({
      email: DEMO.skipperA,
      role: 'skipper',
    });
    const out = await agent.post('/api/auth/sign-out');
    expect(out.status).toBe(204);
    expect(cookieOf(out)).toMatch(/ringseat_session=;.*Max-Age=0/);
    expect((await agent.get('/api/auth/me')).status).toBe(401);
  });

  it('treats a forged session cookie as signed out and clears it', async () => {
    const res = await supertest(server.app)
      .get('/api/auth/me')
      .set('Cookie', 'ringseat_session=forgedforgedforgedforged');
    expect(res.status).toBe(401);
    expect(res.body.type).toBe('/problems/unauthenticated');
    expect(cookieOf(res)).toMatch(/ringseat_session=;/);
  });

  it('treats an expired session as signed out and removes it', async () => {
    const user = await server.dataSource
      .getRepository(User)
      .findOneByOrFail({ email: DEMO.manager });
    const id = randomUUID().replace(/-/g, '');
    await server.dataSource
      .getRepository(Session)
      .insert({ id, userId: user.id, expiresAt: Date.now() - 1000 });
    const res = await supertest(server.app)
      .get('/api/auth/me')
      .set('Cookie', `ringseat_session=${id}`);
    expect(res.status).toBe(401);
    expect(await server.dataSource.getRepository(Session).existsBy({ id })).toBe(false);
  });

  it('refuses sign-out without a session', async () => {
    const res = await browserAgent(server.app).post('/api/auth/sign-out');
    expect(res.status).toBe(401);
  });
});

describe('secure cookies', () => {
  it('marks the cookie Secure when served over https', async () => {
    const secure = await startTestServer({ publicOrigin: 'https://ringseat.test' });
    try {
      const res = await browserAgent(secure.app)
        .set('Origin', 'https://ringseat.test')
        .post('/api/auth/sign-in')
        .send({ email: DEMO.manager, password: 'ringseat-demo' });
      expect(res.status).toBe(200);
      expect(cookieOf(res)).toContain('Secure');
    } finally {
      await secure.close();
    }
  });
});
