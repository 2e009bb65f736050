import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  browserAgent,
  DEMO,
  DEMO_PASSWORD,
  FakeClock,
  signedInAgent,
} from '../../../tests/helpers/test-server.js';
import { startMailTestServer, type MailTestServer } from '../mail/mail-test-server.js';
import { OutgoingMail } from '../mail/outgoing-mail.entity.js';
import { PasswordReset } from './password-reset.entity.js';
import { RESET_VALID_MINUTES, RESETS_PER_HOUR } from './password-resets.service.js';

let server: MailTestServer;
const clock = new FakeClock();
beforeAll(async () => {
  server = await startMailTestServer({ clock });
});
afterAll(() => server.close());

const NEW_PASSWORD = 'kelp beds under the quay';

async function requestLink(email: string): Promise<string> {
  const seen = new Set(server.catcher.list().map((m) => m.id));
  await browserAgent(server.app).post('/api/auth/password-reset').send({ email }).expect(202);
  const mail = await server.catcher.waitFor(
    (m) =>
      !seen.has(m.id) && m.to.includes(email) && m.subject === 'Choose a new Ringseat password',
  );
  return mail.text.match(/\/reset-password\/(\S+)/)![1];
}

describe('a forgotten password', () => {
  it('is reset through a single-use link: every old session ends and the new password signs in', async () => {
    const oldSession = await signedInAgent(server.app, DEMO.skipperA);
    const token = await requestLink(DEMO.skipperA);
    const preview = await browserAgent(server.app).get(`/api/password-resets/${token}`).expect(200);
    expect(preview.body.email).toBe(DEMO.skipperA);

    const weak = await browserAgent(server.app)
      .post('/api/auth/reset-password')
      .send({ token, password: 'sunniva12345' });
    expect(weak.status).toBe(400);
    expect(weak.body.errors[0].field).toBe('password');

    const browser = browserAgent(server.app);
    const done = await browser
      .post('/api/auth/reset-password')
      .send({ token, password: NEW_PASSWORD });
    expect(done.status).toBe(200);
    expect(done.body.user.email).toBe(DEMO.skipperA);
    await browser.get('/api/auth/me').expect(200);
    await oldSession.get('/api/auth/me').expect(401);

    const again = await browserAgent(server.app)
      .post('/api/auth/reset-password')
      .send({ token, password: 'another fine harbour day' });
    expect(again.status).toBe(410);
    await signedInAgent(server.app, DEMO.skipperA, NEW_PASSWORD);
  });

  it('expires after its minutes, and a newer password makes an open link useless', async () => {
    const late = await requestLink(DEMO.technician);
    clock.advance((RESET_VALID_MINUTES + 1) * 60_000);
    const expired = await browserAgent(server.app).get(`/api/password-resets/${late}`);
    expect(expired.status).toBe(410);
    expect(expired.body.detail).toMatch(/expired/);

    const open = await requestLink(DEMO.technician);
    const agent = await signedInAgent(server.app, DEMO.technician);
    await agent
      .post('/api/account/password')
      .send({ currentPassword: DEMO_PASSWORD, newPassword: NEW_PASSWORD })
      .expect(200);
    const used = await browserAgent(server.app)
      .post('/api/auth/reset-password')
      .send({ token: open, password: 'another fine harbour day' });
    expect(used.status).toBe(410);
  });

  it('answers the same for an unknown address and sends nothing, and limits the e-mails per hour', async () => {
    const mailBefore = await server.dataSource.getRepository(OutgoingMail).count();
    const unknown = await browserAgent(server.app)
      .post('/api/auth/password-reset')
      .send({ email: 'nobody.here@skipper.example' });
    const known = await browserAgent(server.app)
      .post('/api/auth/password-reset')
      .send({ email: DEMO.skipperB });
    expect(unknown.status).toBe(202);
    expect(unknown.body).toEqual(known.body);
    expect(await server.dataSource.getRepository(OutgoingMail).count()).toBe(mailBefore + 1);

    for (let i = 0; i < RESETS_PER_HOUR + 2; i++)
      await browserAgent(server.app)
        .post('/api/auth/password-reset')
        .send({ email: DEMO.skipperB })
        .expect(202);
    const user = await server.dataSource.query(`SELECT id FROM "user" WHERE email = ?`, [
      DEMO.skipperB,
    ]);
    expect(
      await server.dataSource.getRepository(PasswordReset).countBy({ userId: user[0].id }),
    ).toBe(RESETS_PER_HOUR);
  });

  it('refuses a made-up link and a malformed address by name', async () => {
    const made = await browserAgent(server.app)
      .post('/api/auth/reset-password')
      .send({ token: 'x'.repeat(43), password: NEW_PASSWORD });
    expect(made.status).toBe(404);
    const bad = await browserAgent(server.app)
      .post('/api/auth/password-reset')
      .send({ email: 'not an address' });
    expect(bad.status).toBe(400);
    expect(bad.body.errors[0].field).toBe('email');
  });
});
