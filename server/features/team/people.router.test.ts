import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  addOtherWorkshop,
  browserAgent,
  DEMO,
  signedInAgent,
} from '../../../tests/helpers/test-server.js';
import { startMailTestServer, type MailTestServer } from '../mail/mail-test-server.js';
import { User } from '../users/user.entity.js';

let server: MailTestServer;
beforeAll(async () => {
  server = await startMailTestServer();
});
afterAll(() => server.close());

const idOf = async (email: string) =>
  (await server.dataSource.getRepository(User).findOneByOrFail({ email })).id;

describe("a manager manages the workshop's people", () => {
  it('changes a role, which applies to the open session at once, and it is in the history', async () => {
    const manager = await signedInAgent(server.app, DEMO.manager);
    const ivo = await signedInAgent(server.app, DEMO.technician);
    await ivo.get('/api/users').expect(403);
    const res = await manager
      .patch(`/api/users/${await idOf(DEMO.technician)}`)
      .send({ role: 'manager' });
    expect(res.status).toBe(200);
    expect(res.body.role).toBe('manager');
    await ivo.get('/api/users').expect(200);

    const bad = await manager
      .patch(`/api/users/${await idOf(DEMO.technician)}`)
      .send({ role: 'admiral' });
    expect(bad.status).toBe(400);
    expect(bad.body.errors[0].field).toBe('role');

    const history = await manager.get('/api/team/history').expect(200);
    expect(history.body.changes[0]).toMatchObject({
      action: 'role-changed',
      actorName: 'Maren Holt',
    });
    expect(history.body.changes[0].detail).toContain('technician → manager');
    await manager
      .patch(`/api/users/${await idOf(DEMO.technician)}`)
      .send({ role: 'technician' })
      .expect(200);
  });

  it('deactivates a person: their sessions end at once and the password no longer signs in; reactivating lets them back', async () => {
    const manager = await signedInAgent(server.app, DEMO.manager);
    const tomas = await signedInAgent(server.app, DEMO.skipperB);
    const id = await idOf(DEMO.skipperB);
    const res = await manager.post(`/api/users/${id}/deactivate`).expect(200);
    expect(res.body.archivedAt).not.toBeNull();
    await tomas.get('/api/auth/me').expect(401);
    await browserAgent(server.app)
      .post('/api/auth/sign-in')
      .send({ email: DEMO.skipperB, password: 'ringseat-demo' })
      .expect(401);
    const invite = await manager
      .post('/api/invites')
      .send({ email: DEMO.skipperB, role: 'skipper' });
    expect(invite.status).toBe(409);
    expect(invite.body.errors[0].message).toMatch(/deactivated account/);

    await manager.post(`/api/users/${id}/reactivate`).expect(200);
    await signedInAgent(server.app, DEMO.skipperB);
    const { body } = await manager.get('/api/team/history');
    const actions = body.changes.map((c: { action: string }) => c.action);
    expect(actions.slice(0, 2)).toEqual(['account-reactivated', 'account-deactivated']);
  });

  it('never changes their own account here, nor anyone of another workshop', async () => {
    const manager = await signedInAgent(server.app, DEMO.manager);
    const self = await manager.post(`/api/users/${await idOf(DEMO.manager)}/deactivate`);
    expect(self.status).toBe(409);
    const demote = await manager
      .patch(`/api/users/${await idOf(DEMO.manager)}`)
      .send({ role: 'skipper' });
    expect(demote.status).toBe(409);
    const other = await addOtherWorkshop(server.dataSource);
    const foreign = await manager.post(
      `/api/users/${await idOf(other.technicianEmail)}/deactivate`,
    );
    expect(foreign.status).toBe(404);
    await signedInAgent(server.app, other.technicianEmail);
    const technician = await signedInAgent(server.app, DEMO.technician);
    await technician.post(`/api/users/${await idOf(DEMO.skipperA)}/deactivate`).expect(403);
  });

  it('withdraws an invite so its link stops working, and sends one again with a new link', async () => {
    const manager = await signedInAgent(server.app, DEMO.manager);
    const sent = await manager
      .post('/api/invites')
      .send({ email: 'deckhand@skipper.example', role: 'skipper' })
      .expect(201);
    const firstToken = sent.body.link.split('/invite/')[1];
    await manager.post(`/api/invites/${sent.body.invite.id}/revoke`).expect(200);
    const withdrawn = await browserAgent(server.app).get(`/api/invites/${firstToken}`);
    expect(withdrawn.status).toBe(410);
    expect(withdrawn.body.detail).toMatch(/withdrawn/);

    const again = await manager.post(`/api/invites/${sent.body.invite.id}/resend`).expect(200);
    const secondToken = again.body.link.split('/invite/')[1];
    expect(secondToken).not.toBe(firstToken);
    await browserAgent(server.app).get(`/api/invites/${firstToken}`).expect(404);
    await browserAgent(server.app).get(`/api/invites/${secondToken}`).expect(200);
    await server.catcher.waitFor((m) => m.text.includes(again.body.link));

    const { body } = await manager.get('/api/team/history');
    const actions = body.changes.map((c: { action: string }) => c.action);
    expect(actions).toEqual(
      expect.arrayContaining(['invite-sent', 'invite-revoked', 'invite-resent', 'mail-sent']),
    );
  });

  it('refuses a weak password when an invite is accepted, naming the field, and makes no account', async () => {
    const manager = await signedInAgent(server.app, DEMO.manager);
    const sent = await manager
      .post('/api/invites')
      .send({ email: 'weak.choice@skipper.example', role: 'skipper' })
      .expect(201);
    const res = await browserAgent(server.app)
      .post('/api/auth/accept-invite')
      .send({ token: sent.body.link.split('/invite/')[1], name: 'Weak', password: '1234567890' });
    expect(res.status).toBe(400);
    expect(res.body.errors[0].field).toBe('password');
    expect(
      await server.dataSource
        .getRepository(User)
        .existsBy({ email: 'weak.choice@skipper.example' }),
    ).toBe(false);
  });
});
