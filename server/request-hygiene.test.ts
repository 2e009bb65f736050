import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  browserAgent,
  DEMO,
  signedInAgent,
  startTestServer,
  type TestServer,
} from '../tests/helpers/test-server.js';
import { Engine } from './features/vessels/engine.entity.js';

let server: TestServer;
beforeAll(async () => {
  server = await startTestServer();
});
afterAll(() => server.close());

const problemOf = (res: { status: number; headers: Record<string, string>; body: unknown }) => ({
  status: res.status,
  type: res.headers['content-type']?.split(';')[0],
  body: res.body,
});

describe('requests that are not well formed get a clear 4xx, never a 500', () => {
  it("reads past another app's cookie with a malformed escape, keeping the session", async () => {
    const health = await browserAgent(server.app).get('/api/health').set('Cookie', 'theme=%zz');
    expect(health.status).toBe(200);
    const tech = await signedInAgent(server.app, DEMO.technician);
    const me = await tech.get('/api/auth/me').set('Cookie', 'theme=%zz');
    // The agent's own session cookie is sent beside the stranger's.
    expect(me.status).toBe(200);
    const forged = await browserAgent(server.app)
      .get('/api/auth/me')
      .set('Cookie', 'ringseat_session=%zz');
    expect(forged.status).toBe(401);
  });

  it('answers a malformed percent-escape in the address with 400', async () => {
    const tech = await signedInAgent(server.app, DEMO.technician);
    const res = problemOf(await tech.get('/api/runs/%zz'));
    expect(res).toMatchObject({
      status: 400,
      type: 'application/problem+json',
      body: { type: '/problems/malformed-address' },
    });
  });

  it('answers a body that does not decompress as its Content-Encoding says with 400', async () => {
    const res = await browserAgent(server.app)
      .post('/api/auth/sign-in')
      .set('Content-Type', 'application/json')
      .set('Content-Encoding', 'br')
      .send('{"email":"ivo@tidewright.example","password":"x"}');
    expect(problemOf(res)).toMatchObject({ status: 400, type: 'application/problem+json' });
  });

  it('refuses a body that is not JSON with 415 and leaves the checklist as it was', async () => {
    const tech = await signedInAgent(server.app, DEMO.technician);
    const { id } = await server.dataSource
      .getRepository(Engine)
      .findOneByOrFail({ serialNumber: 'NV60-26-00418' });
    const draft = { checks: { steering: { result: 'pass' } } };
    expect((await tech.put(`/api/engines/${id}/checklist`).send(draft)).status).toBe(200);
    const before = (await tech.get(`/api/engines/${id}/checklist`)).body;
    const plain = await tech
      .put(`/api/engines/${id}/checklist`)
      .set('Content-Type', 'text/plain')
      .send('checks=none');
    expect(problemOf(plain)).toMatchObject({
      status: 415,
      body: { type: '/problems/unsupported-media-type' },
    });
    expect((await tech.get(`/api/engines/${id}/checklist`)).body).toEqual(before);
  });

  it('rejects sync items whose ids are not text, item by item, without a 500', async () => {
    const skipper = await signedInAgent(server.app, DEMO.skipperA);
    const res = await skipper.post('/api/sync/push').send({
      deviceId: randomUUID(),
      sentAt: Date.now(),
      items: [
        { type: 'event', runId: {}, event: { kind: 'reading', id: {} } },
        { type: 'run-patch', id: {}, runId: randomUUID(), at: Date.now() },
      ],
    });
    expect(res.status).toBe(200);
    expect(res.body.results.map((r: { status: string }) => r.status)).toEqual([
      'rejected',
      'rejected',
    ]);
  });
});
