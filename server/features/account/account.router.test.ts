import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  browserAgent,
  DEMO,
  DEMO_PASSWORD,
  signedInAgent,
} from '../../../tests/helpers/test-server.js';
import { AuditEntry } from '../audit/audit-entry.entity.js';
import { startMailTestServer, type MailTestServer } from '../mail/mail-test-server.js';
import { User } from '../users/user.entity.js';

let server: MailTestServer;
beforeAll(async () => {
  server = await startMailTestServer();
});
afterAll(() => server.close());

const NEW_PASSWORD = 'spindrift over the breakwater';

describe('changing one’s own password', () => {
  it('needs the current password, ends the other sessions, keeps this one and says so by e-mail', async () => {
    const phone = await signedInAgent(server.app, DEMO.skipperB);
    const laptop = await signedInAgent(server.app, DEMO.skipperB);
    expect((await laptop.get('/api/account').expect(200)).body.sessions).toBeGreaterThanOrEqual(2);

    const wrong = await laptop
      .post('/api/account/password')
      .send({ currentPassword: 'not it at all', newPassword: NEW_PASSWORD });
    expect(wrong.status).toBe(400);
    expect(wrong.body.errors).toEqual([
      { field: 'currentPassword', message: 'This is not your current password.' },
    ]);

    const changed = await laptop
      .post('/api/account/password')
      .send({ currentPassword: DEMO_PASSWORD, newPassword: NEW_PASSWORD });
    expect(changed.status).toBe(200);
    expect(changed.body.sessions).toBe(1);
    expect(changed.body.passwordChangedAt).not.toBeNull();
    await laptop.get('/api/auth/me').expect(200);
    await phone.get('/api/auth/me').expect(401);

    await browserAgent(server.app)
      .post('/api/auth/sign-in')
      .send({ email: DEMO.skipperB, password: DEMO_PASSWORD })
      .expect(401);
    await signedInAgent(server.app, DEMO.skipperB, NEW_PASSWORD);
    const mail = await server.catcher.waitFor(
      (m) => m.to.includes(DEMO.skipperB) && m.subject.includes('password was changed'),
    );
    expect(mail.text).toContain('Every other device signed in to it has been signed out.');
    const trail = await server.dataSource
      .getRepository(AuditEntry)
      .findBy({ action: 'password-changed' });
    expect(trail).toHaveLength(1);
  });

  it('refuses a common or personal password, naming the field, and changes nothing', async () => {
    const agent = await signedInAgent(server.app, DEMO.technician);
    const before = await server.dataSource
      .getRepository(User)
      .findOneByOrFail({ email: DEMO.technician });
    for (const newPassword of ['password1234', 'qwertyuiop123', 'ivo@tidewright.example']) {
      const res = await agent
        .post('/api/account/password')
        .send({ currentPassword: DEMO_PASSWORD, newPassword });
      expect(res.status, newPassword).toBe(400);
      expect(res.body.errors[0].field).toBe('newPassword');
      expect(res.body.errors[0].message).toMatch(/too easy to guess/);
    }
    const short = await agent
      .post('/api/account/password')
      .send({ currentPassword: DEMO_PASSWORD, newPassword: 'short' });
    expect(short.body.errors[0]).toEqual({
      field: 'newPassword',
      message: 'Use at least 10 characters for the password.',
    });
    const after = await server.dataSource
      .getRepository(User)
      .findOneByOrFail({ email: DEMO.technician });
    expect(after.passwordHash).toBe(before.passwordHash);
  });
});

describe('sign out everywhere', () => {
  it('ends every session of the person, this one included, and leaves others alone', async () => {
    const here = await signedInAgent(server.app, DEMO.skipperA);
    const there = await signedInAgent(server.app, DEMO.skipperA);
    const colleague = await signedInAgent(server.app, DEMO.manager);
    const res = await here.post('/api/account/sign-out-everywhere').expect(204);
    expect(String(res.headers['set-cookie'])).toMatch(/ringseat_session=;/);
    await here.get('/api/auth/me').expect(401);
    await there.get('/api/auth/me').expect(401);
    await colleague.get('/api/auth/me').expect(200);
    const [entry] = await server.dataSource
      .getRepository(AuditEntry)
      .findBy({ action: 'signed-out-everywhere' });
    expect(entry.detail).toMatch(/sessions ended/);
  });
});
