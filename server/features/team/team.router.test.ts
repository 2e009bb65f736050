import supertest from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  browserAgent,
  DEMO,
  FakeClock,
  signedInAgent,
  startTestServer,
  type TestServer,
} from '../../../tests/helpers/test-server.js';
import { Vessel } from '../vessels/vessel.entity.js';
import { VesselSkipper } from '../vessels/vessel-skipper.entity.js';
import { Invite } from './invite.entity.js';
import { User } from '../users/user.entity.js';

let server: TestServer;
const clock = new FakeClock();
beforeAll(async () => {
  server = await startTestServer({ clock });
});
afterAll(() => server.close());

const tokenOf = (link: string) => link.split('/invite/')[1];

async function invite(body: object) {
  const manager = await signedInAgent(server.app, DEMO.manager);
  return manager.post('/api/invites').send(body);
}

describe('invites', () => {
  it('lets a manager invite a skipper who then sets a password, is signed in and sees the linked vessel', async () => {
    const gannet = await server.dataSource
      .getRepository(Vessel)
      .findOneByOrFail({ name: 'Gannet' });
    const created = await invite({
      email: 'new.skipper@skipper.example',
      role: 'skipper',
      vesselIds: [gannet.id],
    });
    expect(created.status).toBe(201);
    expect(created.body.link).toMatch(/^http:\/\/ringseat\.test\/invite\/[\w-]{40,}$/);
    const token = tokenOf(created.body.link);

    const preview = await supertest(server.app).get(`/api/invites/${token}`);
    expect(preview.body).toMatchObject({
      email: 'new.skipper@skipper.example',
      role: 'skipper',
      workshopName: 'Tidewright Marine Works',
    });

    const guest = browserAgent(server.app);
    const accepted = await guest
      .post('/api/auth/accept-invite')
      .send({ token, name: 'Noor Lindqvist', password: 'a-long-passphrase' });
    expect(accepted.status).toBe(201);
    expect(accepted.body.user).toMatchObject({
      email: 'new.skipper@skipper.example',
      role: 'skipper',
      name: 'Noor Lindqvist',
    });
    const vessels = await guest.get('/api/vessels');
    expect(vessels.body.vessels.map((v: { name: string }) => v.name)).toEqual(['Gannet']);

    const again = await browserAgent(server.app)
      .post('/api/auth/accept-invite')
      .send({ token, name: 'Someone', password: 'another-passphrase' });
    expect(again.status).toBe(410);
    expect(again.body.detail).toContain('already been used');
  });

  it('stores only a hash of the token', async () => {
    const created = await invite({ email: 'hash.check@skipper.example', role: 'technician' });
    const row = await server.dataSource
      .getRepository(Invite)
      .findOneByOrFail({ email: 'hash.check@skipper.example' });
    expect(row.tokenHash).not.toContain(tokenOf(created.body.link));
    expect(row.tokenHash).toMatch(/^[0-9a-f]{64}$/);
  });

  it('refuses an expired invite and creates no account', async () => {
    const created = await invite({ email: 'late@skipper.example', role: 'technician' });
    clock.advance(8 * 86_400_000);
    try {
      const res = await browserAgent(server.app)
        .post('/api/auth/accept-invite')
        .send({ token: tokenOf(created.body.link), name: 'Late', password: 'a-long-passphrase' });
      expect(res.status).toBe(410);
      expect(res.body.detail).toContain('expired');
      expect(
        await server.dataSource.getRepository(User).existsBy({ email: 'late@skipper.example' }),
      ).toBe(false);
    } finally {
      clock.advance(-8 * 86_400_000);
    }
  });

  it('answers 404 for an unknown token and names the short password', async () => {
    const unknown = await supertest(server.app).get(`/api/invites/${'x'.repeat(43)}`);
    expect(unknown.status).toBe(404);
    const created = await invite({ email: 'short.pw@skipper.example', role: 'skipper' });
    const weak = await browserAgent(server.app)
      .post('/api/auth/accept-invite')
      .send({ token: tokenOf(created.body.link), name: 'Short', password: 'short' });
    expect(weak.status).toBe(400);
    expect(weak.body.errors).toEqual([
      { field: 'password', message: 'Use at least 10 characters for the password.' },
    ]);
    expect(
      await server.dataSource.getRepository(User).existsBy({ email: 'short.pw@skipper.example' }),
    ).toBe(false);
  });

  it('refuses to invite an address that already has an account, naming the field', async () => {
    const res = await invite({ email: DEMO.technician, role: 'technician' });
    expect(res.status).toBe(409);
    expect(res.body.errors).toEqual([
      { field: 'email', message: 'This e-mail address already has an account.' },
    ]);
  });

  it('refuses vessels of another workshop and stores no invite', async () => {
    const res = await invite({
      email: 'stray@skipper.example',
      role: 'skipper',
      vesselIds: ['00000000-0000-4000-8000-000000000000'],
    });
    expect(res.status).toBe(400);
    expect(res.body.errors[0].field).toBe('vesselIds');
    expect(
      await server.dataSource.getRepository(Invite).existsBy({ email: 'stray@skipper.example' }),
    ).toBe(false);
  });

  it('names the bad fields of an invite', async () => {
    const res = await invite({ email: 'not-an-address', role: 'captain' });
    expect(res.status).toBe(400);
    expect(res.body.errors.map((e: { field: string }) => e.field).sort()).toEqual([
      'email',
      'role',
    ]);
  });
});

describe('roles are enforced on the server', () => {
  const cases = [
    { who: 'manager', email: DEMO.manager, managerRoute: 200, staffRoute: 200 },
    { who: 'technician', email: DEMO.technician, managerRoute: 403, staffRoute: 200 },
    { who: 'skipper', email: DEMO.skipperB, managerRoute: 403, staffRoute: 403 },
  ] as const;

  for (const c of cases) {
    it(`${c.who}: manager-only route ${c.managerRoute}, technician route ${c.staffRoute}`, async () => {
      const agent = await signedInAgent(server.app, c.email);
      expect((await agent.get('/api/users')).status).toBe(c.managerRoute);
      expect((await agent.get('/api/workshop')).status).toBe(c.staffRoute);
      const inviteRes = await agent
        .post('/api/invites')
        .send({ email: `by-${c.who}@skipper.example`, role: 'skipper' });
      expect(inviteRes.status).toBe(c.managerRoute === 200 ? 201 : 403);
    });
  }

  it('answers 401 to a visitor who is not signed in', async () => {
    expect((await supertest(server.app).get('/api/users')).status).toBe(401);
    expect((await supertest(server.app).get('/api/workshop')).status).toBe(401);
    expect((await supertest(server.app).get('/api/vessels')).status).toBe(401);
  });

  it('shows a skipper only their own vessels and staff all of the workshop', async () => {
    const names = async (email: string) =>
      (await (await signedInAgent(server.app, email)).get('/api/vessels')).body.vessels.map(
        (v: { name: string }) => v.name,
      );
    const sunniva = await names(DEMO.skipperA);
    const tomas = await names(DEMO.skipperB);
    const staff = await names(DEMO.technician);
    expect(sunniva).toEqual(expect.arrayContaining(['Blue Tern', 'Gannet']));
    expect(sunniva).not.toContain('Halcyon Drift');
    expect(tomas).toEqual(['Halcyon Drift']);
    expect(staff).toEqual(expect.arrayContaining([...sunniva, ...tomas]));
    expect(staff.length).toBeGreaterThan(sunniva.length + tomas.length - 1);
    const links = await server.dataSource.getRepository(VesselSkipper).count();
    expect(links).toBeGreaterThanOrEqual(3);
  });

  it('lists the team for a manager', async () => {
    const res = await (await signedInAgent(server.app, DEMO.manager)).get('/api/users');
    expect(res.body.users.map((u: { email: string }) => u.email)).toEqual(
      expect.arrayContaining(Object.values(DEMO)),
    );
    expect(JSON.stringify(res.body)).not.toContain('passwordHash');
  });
});
