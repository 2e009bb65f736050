import fs from 'node:fs';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createSmtpMailer, loadMailSettings, WORKSHOP_HEADER } from '../../lib/mailer.js';
import {
  browserAgent,
  DEMO,
  signedInAgent,
  startTestServer,
} from '../../../tests/helpers/test-server.js';
import { MailCatcher } from './mail-catcher.js';
import { startMailTestServer, type MailTestServer } from './mail-test-server.js';

let server: MailTestServer;
beforeAll(async () => {
  server = await startMailTestServer();
});
afterAll(() => server.close());

describe('invite e-mails', () => {
  it('e-mails the invite link over SMTP and still answers with the link', async () => {
    const manager = await signedInAgent(server.app, DEMO.manager);
    const res = await manager
      .post('/api/invites')
      .send({ email: 'new.crew@skipper.example', role: 'skipper', vesselIds: [] });
    expect(res.status).toBe(201);
    expect(res.body.mail).toEqual({ sent: true, to: ['new.crew@skipper.example'] });
    const mail = await server.catcher.waitFor((m) => m.to.includes('new.crew@skipper.example'));
    expect(mail.subject).toBe('Tidewright Marine Works invites you to Ringseat');
    expect(mail.from).toContain('no-reply@ringseat.invalid');
    expect(mail.text).toContain(res.body.link);
    expect(mail.text).toContain('Maren Holt of Tidewright Marine Works invites you');
  });

  it('keeps the invite when no mail server is set up, and says so', async () => {
    const bare = await startTestServer();
    try {
      const manager = await signedInAgent(bare.app, DEMO.manager);
      const res = await manager
        .post('/api/invites')
        .send({ email: 'offline@skipper.example', role: 'technician' });
      expect(res.status).toBe(201);
      expect(res.body.link).toContain('/invite/');
      expect(res.body.mail).toEqual({
        sent: false,
        to: ['offline@skipper.example'],
        problem: 'No mail server is set up (SMTP_HOST), so e-mail waits in the outbox.',
      });
    } finally {
      await bare.close();
    }
  });
});

describe('the local mailbox page', () => {
  it('lists what was sent for a manager, with attachments to download', async () => {
    const mailer = createSmtpMailer({
      host: '127.0.0.1',
      port: server.catcher.port,
      secure: false,
      from: 'Ringseat <no-reply@ringseat.invalid>',
    });
    const sheet = Buffer.from('%PDF-1.4 demo sheet');
    const manager = await signedInAgent(server.app, DEMO.manager);
    const { workshopId } = (await manager.get('/api/auth/me')).body.user;
    await mailer.send({
      headers: { [WORKSHOP_HEADER]: workshopId },
      to: ['desk@tidewright.example'],
      subject: 'Sheet <with> markup',
      text: 'See attached.',
      attachments: [{ filename: 'sheet.pdf', content: sheet, contentType: 'application/pdf' }],
    });
    mailer.close();
    const caught = await server.catcher.waitFor((m) => m.subject === 'Sheet <with> markup');

    const page = await manager.get('/dev/mail');
    expect(page.status).toBe(200);
    expect(page.headers['content-type']).toContain('text/html');
    expect(page.text).toContain('Sheet &lt;with&gt; markup');
    expect(page.text).not.toContain('Sheet <with> markup');
    expect(page.text).toContain(`/dev/mail/${caught.id}/attachments/0`);
    const file = await manager
      .get(`/dev/mail/${caught.id}/attachments/0`)
      .buffer(true)
      .parse((res, done) => {
        const chunks: Buffer[] = [];
        res.on('data', (c: Buffer) => chunks.push(c));
        res.on('end', () => done(null, Buffer.concat(chunks)));
      });
    expect(file.headers['content-disposition']).toContain('sheet.pdf');
    expect(Buffer.compare(file.body as Buffer, sheet)).toBe(0);
    expect((await manager.get('/dev/mail/messages.json')).body.messages[0].subject).toBe(
      'Sheet <with> markup',
    );
    expect((await manager.get(`/dev/mail/${caught.id}/attachments/9`)).status).toBe(404);
  });

  it('sends a visitor to sign in and refuses staff who are not managers', async () => {
    const visitor = await browserAgent(server.app).get('/dev/mail');
    expect(visitor.status).toBe(303);
    expect(visitor.headers.location).toBe('/sign-in?next=%2Fdev%2Fmail');
    const technician = await signedInAgent(server.app, DEMO.technician);
    expect((await technician.get('/dev/mail')).status).toBe(403);
    expect((await technician.get('/dev/mail/messages.json')).status).toBe(403);
  });

  it('is not there at all without a catcher (production)', async () => {
    const bare = await startTestServer();
    try {
      const manager = await signedInAgent(bare.app, DEMO.manager);
      expect((await manager.get('/dev/mail/messages.json')).status).toBe(404);
    } finally {
      await bare.close();
    }
  });
});

describe('the catcher and the mail settings', () => {
  it('keeps what it caught across a restart', async () => {
    const dir = path.join(server.dataDir, 'restart-box');
    const first = await MailCatcher.start({ dir });
    const mailer = createSmtpMailer({
      host: '127.0.0.1',
      port: first.port,
      secure: false,
      from: 'Ringseat <no-reply@ringseat.invalid>',
    });
    await mailer.send({ to: ['a@b.example'], subject: 'Kept', text: 'Body' });
    mailer.close();
    await first.close();
    expect(fs.readdirSync(dir).filter((f) => f.endsWith('.eml'))).toHaveLength(1);
    const second = await MailCatcher.start({ dir });
    expect(second.list().map((m) => m.subject)).toEqual(['Kept']);
    await second.close();
  });

  it('reads real SMTP settings from the environment, naming a bad one', () => {
    expect(loadMailSettings({}).smtp).toBeNull();
    // 587 is mail submission with STARTTLS, 465 SMTP over TLS (RFC 8314).
    expect(loadMailSettings({ SMTP_HOST: 'smtp.example.org' }).smtp).toMatchObject({
      host: 'smtp.example.org',
      port: 587,
      secure: false,
    });
    expect(
      loadMailSettings({
        SMTP_HOST: 'smtp.example.org',
        SMTP_SECURE: 'true',
        SMTP_USER: 'u',
        SMTP_PASS: 'p',
        MAIL_FROM: 'Yard <desk@yard.example>',
      }).smtp,
    ).toEqual({
      host: 'smtp.example.org',
      port: 465,
      secure: true,
      user: 'u',
      pass: 'p',
      from: 'Yard <desk@yard.example>',
    });
    expect(() => loadMailSettings({ SMTP_HOST: 'h', SMTP_SECURE: 'yes' })).toThrow(
      'SMTP_SECURE must be true or false.',
    );
  });
});
