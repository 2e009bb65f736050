import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../app.js';
import { createLogger } from '../../lib/logger.js';
import {
  browserAgent,
  DEMO,
  FakeClock,
  startTestServer,
  type TestServer,
} from '../../../tests/helpers/test-server.js';
import type { SignInLimit } from './sign-in-throttle.js';

/* Small limits so the tests stay short; the defaults are in sign-in-throttle.ts. */
const LIMIT: SignInLimit = { windowMs: 15 * 60_000, perAccount: 3, perAddress: 8 };
const clock = new FakeClock();
let server: TestServer;
beforeAll(async () => {
  server = await startTestServer({ clock, signInLimit: LIMIT });
});
afterAll(() => server.close());

const signIn = (app: TestServer['app'], email: string, password: string, forwardedFor?: string) => {
  const request = browserAgent(app).post('/api/auth/sign-in');
  if (forwardedFor) request.set('X-Forwarded-For', forwardedFor);
  return request.send({ email, password });
};
const clearCounts = () => server.dataSource.query('DELETE FROM "sign_in_failure"');

describe('the sign-in limit', () => {
  it("stops guesses at one account, even the right password, but not a colleague's sign-in", async () => {
    await clearCounts();
    for (let i = 0; i < LIMIT.perAccount; i++)
      expect((await signIn(server.app, DEMO.manager, `guess-${i}-guess`)).status).toBe(401);
    const locked = await signIn(server.app, DEMO.manager, 'ringseat-demo');
    expect(locked.status).toBe(429);
    expect(locked.body).toMatchObject({
      type: '/problems/too-many-sign-ins',
      detail: expect.stringContaining('Too many wrong attempts for this account. Wait 15 minutes'),
    });
    expect((await signIn(server.app, DEMO.technician, 'ringseat-demo')).status).toBe(200);
  });

  it('keeps the counts in the database, so another server on the same file refuses too', async () => {
    const restarted = createApp({
      dataSource: server.dataSource,
      logger: createLogger('silent'),
      dataDir: server.dir,
      clock,
      signInLimit: LIMIT,
    });
    expect((await signIn(restarted, DEMO.manager, 'ringseat-demo')).status).toBe(429);
    clock.advance(LIMIT.windowMs + 1000);
    expect((await signIn(restarted, DEMO.manager, 'ringseat-demo')).status).toBe(200);
  });

  it('stops a flood from one address across accounts, and a forged X-Forwarded-For does not help', async () => {
    await clearCounts();
    for (let i = 0; i < LIMIT.perAddress; i++) {
      const res = await signIn(
        server.app,
        `nobody-${i}@example.org`,
        'guess-guess',
        `203.0.113.${i}`,
      );
      expect(res.status).toBe(401);
    }
    const flood = await signIn(server.app, 'nobody-x@example.org', 'guess-guess', '198.51.100.7');
    expect(flood.status).toBe(429);
    expect(flood.body.detail).toContain('from this network');
  });

  it('believes X-Forwarded-For only from a proxy the operator names', async () => {
    await clearCounts();
    const behindProxy = createApp({
      dataSource: server.dataSource,
      logger: createLogger('silent'),
      dataDir: server.dir,
      clock,
      signInLimit: LIMIT,
      trustProxy: 'loopback',
    });
    for (let i = 0; i < LIMIT.perAddress; i++)
      await signIn(behindProxy, `nobody-${i}@example.org`, 'guess-guess', '203.0.113.9');
    expect((await signIn(behindProxy, 'x@example.org', 'guess-guess', '203.0.113.9')).status).toBe(
      429,
    );
    expect(
      (await signIn(behindProxy, DEMO.skipperA, 'ringseat-demo', '198.51.100.20')).status,
    ).toBe(200);
  });
});
