import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  addOtherWorkshop,
  DEMO,
  FakeClock,
  signedInAgent,
} from '../../../tests/helpers/test-server.js';
import { startMailTestServer, type MailTestServer } from '../mail/mail-test-server.js';
import { runOnBoard } from '../review/review-test-client.js';
import { Engine } from '../vessels/engine.entity.js';

let server: MailTestServer;
const clock = new FakeClock(new Date('2026-12-01T09:00:00Z'));
beforeAll(async () => {
  server = await startMailTestServer({ clock });
});
afterAll(() => server.close());

const engineIdOf = async (serialNumber: string) =>
  (await server.dataSource.getRepository(Engine).findOneByOrFail({ serialNumber })).id;

type Agent = Awaited<ReturnType<typeof signedInAgent>>;
const bytes = (agent: Agent, url: string) =>
  agent
    .get(url)
    .buffer(true)
    .parse((res, done) => {
      const chunks: Buffer[] = [];
      res.on('data', (c: Buffer) => chunks.push(c));
      res.on('end', () => done(null, Buffer.concat(chunks)));
    });

/** The calendar's lines with RFC 5545 folding undone (a CRLF and one space continue a line). */
const unfolded = (ics: Buffer) =>
  ics
    .toString('utf8')
    .replace(/\r\n[ \t]/g, '')
    .split('\r\n');

describe('the first-service calendar file', () => {
  it('is one all-day event on the due day, naming vessel and engine with the hours', async () => {
    const tech = await signedInAgent(server.app, DEMO.technician);
    const res = await bytes(
      tech,
      `/api/engines/${await engineIdOf('B321-D-77841')}/first-service.ics`,
    );
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('text/calendar; charset=utf-8; method=PUBLISH');
    expect(res.headers['content-disposition']).toBe(
      'attachment; filename="first-service-halcyon-drift-b321-d-77841.ics"',
    );
    const lines = unfolded(res.body as Buffer);
    expect(lines.filter((l) => l === 'BEGIN:VEVENT')).toHaveLength(1);
    // Halcyon: 20 h or 1 month after 2.0 h on 2026-11-27 (common practice; BoatUS "Long Life – Outboard Maintenance").
    expect(lines).toContain('DTSTART;VALUE=DATE:20261227');
    expect(lines).toContain('DTEND;VALUE=DATE:20261228');
    expect(lines).toContain(
      'SUMMARY:First service: Halcyon Drift\\, inboard engine (Brennholt B3-21 Marine)',
    );
    const description = lines.find((l) => l.startsWith('DESCRIPTION:'))!;
    expect(description).toContain(
      'Due at 22.0 h on the hour meter or on 27 Dec 2026\\, whichever comes first.',
    );
    expect(description).toMatch(/Engine hours when this file was made: \d+\.\d h/);
    expect(description).toContain('serial B321-D-77841');
  });

  it('is there for the skipper of the vessel, and for nobody else', async () => {
    const halcyon = await engineIdOf('B321-D-77841');
    const tomas = await signedInAgent(server.app, DEMO.skipperB);
    expect((await bytes(tomas, `/api/engines/${halcyon}/first-service.ics`)).status).toBe(200);
    const sunniva = await signedInAgent(server.app, DEMO.skipperA);
    expect((await sunniva.get(`/api/engines/${halcyon}/first-service.ics`)).status).toBe(404);
    const other = await addOtherWorkshop(server.dataSource);
    const stranger = await signedInAgent(server.app, other.technicianEmail);
    expect((await stranger.get(`/api/engines/${halcyon}/first-service.ics`)).status).toBe(404);
  });

  it('rides along with the sign-off e-mail, which links to the run', async () => {
    const skua = await runOnBoard(server.app, 'Skua');
    const tech = await signedInAgent(server.app, DEMO.technician);
    const res = await tech
      .post(`/api/runs/${skua.id}/sign-off`)
      .send({ decision: 'confirm', comments: 'One long burst clearing ferry wash; acceptable.' });
    expect(res.status).toBe(200);
    const mail = await server.catcher.waitFor((m) =>
      m.subject.startsWith('Break-in signed off: Skua'),
    );
    expect(mail.subject).toBe(
      `Break-in signed off: Skua, single engine (Norrvik NV-40 4S) (certificate ${res.body.certificate.number})`,
    );
    expect(mail.text).toContain(
      'Vessel: Skua\nEngine: single, Norrvik NV-40 4S, serial NV40-26-00233',
    );
    expect(mail.text).toMatch(new RegExp(`See the run in Ringseat: http\\S+/runs/${skua.id}\\n`));
    expect(mail.attachments.map((a) => [a.filename, a.contentType])).toEqual([
      [`break-in-certificate-${res.body.certificate.number}.pdf`, 'application/pdf'],
      ['first-service-skua-nv40-26-00233.ics', 'text/calendar'],
    ]);
    const manager = await signedInAgent(server.app, DEMO.manager);
    const file = await bytes(manager, `/dev/mail/${mail.id}/attachments/1`);
    // Skua: 20 h or 1 month after 0.3 h on 2026-11-23 (common practice, as above).
    expect(unfolded(file.body as Buffer)).toContain('DTSTART;VALUE=DATE:20261223');
  });

  it('is refused once the first service is recorded, saying why', async () => {
    const halcyon = await engineIdOf('B321-D-77841');
    const tech = await signedInAgent(server.app, DEMO.technician);
    await tech
      .post(`/api/engines/${halcyon}/services`)
      .send({ date: '2026-12-01', hourMeter: 24, doneBy: 'Ivo Brandt' })
      .expect(201);
    const res = await tech.get(`/api/engines/${halcyon}/first-service.ics`);
    expect(res.status).toBe(409);
    expect(res.body.detail).toBe(
      'The first service of this engine is recorded as done on 1 Dec 2026: there is nothing left to put in a calendar.',
    );
  });
});
