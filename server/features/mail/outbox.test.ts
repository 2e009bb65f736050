import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  addOtherWorkshop,
  DEMO,
  FakeClock,
  signedInAgent,
} from '../../../tests/helpers/test-server.js';
import { createLogger } from '../../lib/logger.js';
import { createSmtpMailer, type Mailer } from '../../lib/mailer.js';
import { AuditEntry } from '../audit/audit-entry.entity.js';
import { MailCatcher } from './mail-catcher.js';
import { startMailTestServer, type MailTestServer } from './mail-test-server.js';
import { MAX_ATTEMPTS, Outbox, retryPauseMs } from './outbox.js';
import { OutgoingMail } from './outgoing-mail.entity.js';

/* The mail outbox over real SMTP: e-mail the server could not send waits and goes later. */

const clock = new FakeClock(new Date('2026-12-01T09:00:00Z'));
let server: MailTestServer;
let workshopId: string;
const mailers: Mailer[] = [];
beforeAll(async () => {
  // This server's own requests find no mail server: as if it stopped before sending.
  server = await startMailTestServer({ clock, mailer: null });
  workshopId = (await (await signedInAgent(server.app, DEMO.manager)).get('/api/auth/me')).body.user
    .workshopId;
});
afterAll(async () => {
  for (const mailer of mailers) mailer.close();
  await server.close();
});

const mailerTo = (port: number) => {
  const mailer = createSmtpMailer({ host: '127.0.0.1', port, secure: false, from: 'x@y.example' });
  mailers.push(mailer);
  return mailer;
};
const outboxVia = (mailer: Mailer | null) =>
  new Outbox(server.dataSource, mailer, createLogger('silent'), clock);
async function deadPort(): Promise<number> {
  const closed = await MailCatcher.start();
  await closed.close();
  return closed.port;
}
const row = (subject: string) =>
  server.dataSource.getRepository(OutgoingMail).findOneByOrFail({ subject });

describe('the outbox', () => {
  it('keeps an e-mail the mail server refused and sends it after its pause, once the server is back', async () => {
    const down = outboxVia(mailerTo(await deadPort()));
    const message = { to: ['crew@skipper.example'], subject: 'Outage 1', text: 'Hello' };
    const first = await down.send(workshopId, message);
    expect(first).toMatchObject({ sent: false, to: ['crew@skipper.example'] });
    expect(first.sent === false && first.problem).toContain('tried again automatically');
    expect(await row('Outage 1')).toMatchObject({ state: 'waiting', attempts: 1 });

    const back = outboxVia(mailerTo(server.catcher.port));
    expect(await back.deliverDue()).toBe(0);
    clock.advance(retryPauseMs(1));
    expect(await back.deliverDue()).toBe(1);
    expect((await server.catcher.waitFor((m) => m.subject === 'Outage 1')).to).toEqual([
      'crew@skipper.example',
    ]);
    expect(await row('Outage 1')).toMatchObject({ state: 'sent', lastError: null });
    expect(await back.deliverDue()).toBe(0);
  });

  it(`gives up after ${MAX_ATTEMPTS} tries and says so`, async () => {
    const down = outboxVia(mailerTo(await deadPort()));
    await down.send(workshopId, { to: ['a@b.example'], subject: 'Outage 2', text: 't' });
    for (let tries = 1; tries < MAX_ATTEMPTS; tries++) {
      clock.advance(retryPauseMs(tries));
      await down.deliverDue();
    }
    const gaveUp = await row('Outage 2');
    expect(gaveUp).toMatchObject({ state: 'failed', attempts: MAX_ATTEMPTS });
    expect(gaveUp.lastError).toContain(`gave up after ${MAX_ATTEMPTS} tries`);
  });

  it('keeps a certificate e-mail that was never tried, and sends it with its PDF after a restart', async () => {
    const board = await (
      await signedInAgent(server.app, DEMO.technician)
    ).get('/api/board?show=all');
    const skua = board.body.runs.find(
      (r: { vessel: { name: string } }) => r.vessel.name === 'Skua',
    );
    const res = await (
      await signedInAgent(server.app, DEMO.technician)
    )
      .post(`/api/runs/${skua.id}/sign-off`)
      .send({ decision: 'confirm', comments: 'One long burst clearing ferry wash; acceptable.' });
    expect(res.status).toBe(200);
    expect(res.body.mail).toMatchObject({
      sent: false,
      problem: expect.stringContaining('SMTP_HOST'),
    });
    const number = res.body.certificate.number as string;
    const waiting = await server.dataSource
      .getRepository(OutgoingMail)
      .findOneByOrFail({ recordId: skua.id });
    expect(waiting).toMatchObject({ state: 'waiting', attempts: 0 });

    const restarted = outboxVia(mailerTo(server.catcher.port));
    expect(await restarted.deliverDue()).toBe(1);
    const mail = await server.catcher.waitFor((m) => m.subject.includes(number));
    expect(mail.attachments.map((a) => a.contentType)).toContain('application/pdf');
    const trail = await server.dataSource
      .getRepository(AuditEntry)
      .findBy({ recordType: 'run', recordId: skua.id });
    expect(trail.map((a) => a.action)).toEqual(
      expect.arrayContaining(['run-signed-off', 'mail-failed', 'mail-sent']),
    );
  });
});

describe('the outbox list', () => {
  it('is for the workshop\'s managers, and "try again now" gives a given-up e-mail new tries', async () => {
    const manager = await signedInAgent(server.app, DEMO.manager);
    const list = (await manager.get('/api/mail/outgoing')).body.mail as Array<{
      id: string;
      subject: string;
      state: string;
    }>;
    expect(list.map((m) => [m.subject, m.state])).toEqual(
      expect.arrayContaining([
        ['Outage 1', 'sent'],
        ['Outage 2', 'failed'],
      ]),
    );
    const tech = await signedInAgent(server.app, DEMO.technician);
    expect((await tech.get('/api/mail/outgoing')).status).toBe(403);
    const other = await addOtherWorkshop(server.dataSource, 'manager');
    const stranger = await signedInAgent(server.app, other.technicianEmail);
    expect((await stranger.get('/api/mail/outgoing')).body.mail).toEqual([]);
    const failed = list.find((m) => m.subject === 'Outage 2')!;
    expect((await stranger.post(`/api/mail/outgoing/${failed.id}/retry`)).status).toBe(404);

    const retried = await manager.post(`/api/mail/outgoing/${failed.id}/retry`);
    expect(retried.body.mail).toMatchObject({
      state: 'waiting',
      attempts: 0,
      lastError: expect.stringContaining('SMTP_HOST'),
    });
  });
});
