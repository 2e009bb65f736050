import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startRealServer, type RealServer } from '../tests/helpers/real-server.js';

// The real process, as `npm start` runs it: vitest's transformer would hide decorator mistakes.
let server: RealServer;
beforeAll(async () => {
  server = await startRealServer();
}, 90_000);
afterAll(() => server?.stop());

describe('the server process', () => {
  it('creates and migrates a new database, adds the demo workshop and reports its migration level', async () => {
    const res = await fetch(`${server.baseURL}/api/health`);
    expect(res.status).toBe(200);
    const body = await res.json();
    expect(body).toMatchObject({
      status: 'ok',
      database: 'reachable',
      migrations: { pending: false },
    });
    expect(body.migrations.applied).toBeGreaterThanOrEqual(1);
  });

  it("signs in a demo user and lists that user's vessels with their engines", async () => {
    const signIn = await fetch(`${server.baseURL}/api/auth/sign-in`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', origin: server.baseURL },
      body: JSON.stringify({ email: 'tomas@skipper.example', password: 'ringseat-demo' }),
    });
    expect(signIn.status).toBe(200);
    const cookie = signIn.headers.get('set-cookie')!.split(';')[0];
    const vessels = await (
      await fetch(`${server.baseURL}/api/vessels`, { headers: { cookie } })
    ).json();
    expect(vessels.vessels).toHaveLength(1);
    expect(vessels.vessels[0].engines[0]).toMatchObject({
      serialNumber: 'B321-D-77841',
      poles: 12,
      pulleyRatio: 2.5,
    });
  });

  it('answers unknown API routes with a JSON 404', async () => {
    const res = await fetch(`${server.baseURL}/api/no-such-thing`);
    expect(res.status).toBe(404);
    expect(res.headers.get('content-type')).toContain('application/problem+json');
  });
});
