import { Writable } from 'node:stream';
import { pino } from 'pino';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createSmtpMailer, WORKSHOP_HEADER } from '../../lib/mailer.js';
import {
  addOtherWorkshop,
  browserAgent,
  DEMO,
  signedInAgent,
} from '../../../tests/helpers/test-server.js';
import { startMailTestServer, type MailTestServer } from './mail-test-server.js';

/** Everything the server logged, as one string, at the most talkative level. */
let logged = '';
const sink = new Writable({
  write(chunk: Buffer, _encoding, done) {
    logged += chunk.toString();
    done();
  },
});

let server: MailTestServer;
beforeAll(async () => {
  server = await startMailTestServer({ logger: pino({ level: 'trace' }, sink) });
});
afterAll(() => server.close());

const tokenOf = (link: string) => link.slice(link.lastIndexOf('/') + 1);

async function otherManager() {
  const other = await addOtherWorkshop(server.dataSource, 'manager');
  return signedInAgent(server.app, other.technicianEmail);
}

describe('the local mailbox of two workshops on one server', () => {
  it("never shows one workshop's mail, invite links included, to another workshop's manager", async () => {
    const maren = await signedInAgent(server.app, DEMO.manager);
    const invited = await maren
      .post('/api/invites')
      .send({ email: 'second.manager@tidewright.example', role: 'manager' });
    expect(invited.status).toBe(201);
    const token = tokenOf(invited.body.link);
    await server.catcher.waitFor((m) => m.to.includes('second.manager@tidewright.example'));

    const stranger = await otherManager();
    const theirs = (await stranger.get('/dev/mail/messages.json')).body.messages;
    expect(theirs).toEqual([]);
    const page = await stranger.get('/dev/mail');
    expect(page.status).toBe(200);
    expect(page.text).not.toContain(token);
    expect(page.text).toContain('No e-mail has been sent yet.');

    const ours = (await maren.get('/dev/mail/messages.json')).body.messages;
    expect(ours.map((m: { subject: string }) => m.subject)).toContain(
      'Tidewright Marine Works invites you to Ringseat',
    );
    expect((await maren.get('/dev/mail')).text).toContain(token);
  });

  it("keeps another workshop's attachments from a manager who knows their address", async () => {
    const maren = await signedInAgent(server.app, DEMO.manager);
    const { workshopId } = (await maren.get('/api/auth/me')).body.user;
    const mailer = createSmtpMailer({
      host: '127.0.0.1',
      port: server.catcher.port,
      secure: false,
      from: 'Ringseat <no-reply@ringseat.invalid>',
    });
    await mailer.send({
      headers: { [WORKSHOP_HEADER]: workshopId },
      to: ['desk@tidewright.example'],
      subject: 'Certificate for the desk',
      text: 'Attached.',
      attachments: [
        { filename: 'c.pdf', content: Buffer.from('%PDF-1.4 c'), contentType: 'application/pdf' },
      ],
    });
    mailer.close();
    const caught = await server.catcher.waitFor((m) => m.subject === 'Certificate for the desk');
    const address = `/dev/mail/${caught.id}/attachments/0`;
    expect((await maren.get(address)).status).toBe(200);
    expect((await (await otherManager()).get(address)).status).toBe(404);
  });

  it('keeps invite tokens out of the logs, when the link is opened too', async () => {
    const maren = await signedInAgent(server.app, DEMO.manager);
    const invited = await maren
      .post('/api/invites')
      .send({ email: 'log.check@skipper.example', role: 'technician' });
    const token = tokenOf(invited.body.link);
    const opened = await browserAgent(server.app).get(`/api/invites/${token}`);
    expect(opened.status).toBe(200);
    await browserAgent(server.app).get(`/api/invites/${token}x`);
    expect(logged).toContain('/api/invites/[token]');
    expect(logged).not.toContain(token);
  });
});
