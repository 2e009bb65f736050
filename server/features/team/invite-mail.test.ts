import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO, signedInAgent } from '../../../tests/helpers/test-server.js';
import { startMailTestServer, type MailTestServer } from '../mail/mail-test-server.js';
import { Vessel } from '../vessels/vessel.entity.js';

let server: MailTestServer;
beforeAll(async () => {
  server = await startMailTestServer();
});
afterAll(() => server.close());

describe('the invite e-mail', () => {
  it("names the skipper's vessels and their engines, and links to the accept page", async () => {
    const vessel = await server.dataSource
      .getRepository(Vessel)
      .findOneByOrFail({ name: 'Halcyon Drift' });
    const manager = await signedInAgent(server.app, DEMO.manager);
    const res = await manager
      .post('/api/invites')
      .send({ email: 'second.crew@skipper.example', role: 'skipper', vesselIds: [vessel.id] });
    expect(res.status).toBe(201);
    const mail = await server.catcher.waitFor((m) => m.to.includes('second.crew@skipper.example'));
    expect(mail.text).toContain(
      'You will see these vessels and engines:\n- Halcyon Drift: inboard engine, Brennholt B3-21 Marine, serial B321-D-77841',
    );
    expect(res.body.link).toMatch(/\/invite\/\S+$/);
    expect(mail.text).toContain(res.body.link);
  });

  it('names no vessel for a member of staff', async () => {
    const manager = await signedInAgent(server.app, DEMO.manager);
    await manager
      .post('/api/invites')
      .send({ email: 'new.mechanic@tidewright.example', role: 'technician' })
      .expect(201);
    const mail = await server.catcher.waitFor((m) =>
      m.to.includes('new.mechanic@tidewright.example'),
    );
    expect(mail.text).not.toContain('You will see these vessels');
  });
});
