import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  addOtherWorkshop,
  DEMO,
  FakeClock,
  signedInAgent,
} from '../../../tests/helpers/test-server.js';
import { certificatePdf, pdfText } from '../../../tests/helpers/pdf.js';
import { startMailTestServer, type MailTestServer } from '../mail/mail-test-server.js';
import { Run } from '../runs/run.entity.js';

let server: MailTestServer;
const clock = new FakeClock(new Date('2026-12-01T09:00:00Z'));
beforeAll(async () => {
  server = await startMailTestServer({ clock });
});
afterAll(() => server.close());

const staff = () => signedInAgent(server.app, DEMO.technician);
const runOf = async (vessel: string) =>
  (await (await staff()).get('/api/board?show=all')).body.runs.find(
    (r: { vessel: { name: string } }) => r.vessel.name === vessel,
  );

const pdfOf = certificatePdf;

describe('signing off a submitted run', () => {
  it('refuses a skipper (403) and another workshop (404), changing nothing', async () => {
    const skua = await runOf('Skua');
    const sunniva = await signedInAgent(server.app, DEMO.skipperA);
    const refused = await sunniva
      .post(`/api/runs/${skua.id}/sign-off`)
      .send({ decision: 'confirm', comments: 'Looks fine to me.' });
    expect(refused.status).toBe(403);
    const other = await addOtherWorkshop(server.dataSource);
    const stranger = await signedInAgent(server.app, other.technicianEmail);
    expect(
      (
        await stranger
          .post(`/api/runs/${skua.id}/sign-off`)
          .send({ decision: 'confirm', comments: 'x' })
      ).status,
    ).toBe(404);
    expect(
      (await server.dataSource.getRepository(Run).findOneByOrFail({ id: skua.id })).state,
    ).toBe('submitted');
  });

  it('asks why when confirming a run with a broken rule, naming the field', async () => {
    const skua = await runOf('Skua');
    const res = await (
      await staff()
    )
      .post(`/api/runs/${skua.id}/sign-off`)
      .send({ decision: 'confirm' });
    expect(res.status).toBe(400);
    expect(res.body.errors).toEqual([
      {
        field: 'comments',
        message:
          'This run is not judged complete by the computation: say why you confirm it anyway (comments).',
      },
    ]);
    const bad = await (
      await staff()
    )
      .post(`/api/runs/${skua.id}/sign-off`)
      .send({ decision: 'approve' });
    expect(bad.body.errors[0]).toEqual({
      field: 'decision',
      message: 'Choose whether to confirm the run or return it to the skipper (decision).',
    });
  });

  // Numbers: the demo's signed-off run holds 0001; the Luhn check digits (ISO/IEC 7812-1 Annex B) of 20260001 and 20260002 are 1 and 9, worked by hand.
  it('signs off, freezes the run, issues a numbered certificate and e-mails it to the skipper', async () => {
    const skua = await runOf('Skua');
    const before = await server.dataSource.getRepository(Run).findOneByOrFail({ id: skua.id });
    const tech = await staff();
    const res = await tech
      .post(`/api/runs/${skua.id}/sign-off`)
      .send({ decision: 'confirm', comments: 'One long burst clearing ferry wash; acceptable.' });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({
      state: 'signed-off',
      certificate: { number: 'TMW-2026-0002-9', downloadUrl: `/api/runs/${skua.id}/certificate` },
      mail: { sent: true, to: ['sunniva@skipper.example'] },
    });
    const after = await server.dataSource.getRepository(Run).findOneByOrFail({ id: skua.id });
    expect(after.signedOffAt?.toISOString()).toBe('2026-12-01T09:00:00.000Z');
    expect(after.seq).toBeGreaterThan(before.seq);

    const mail = await server.catcher.waitFor((m) => m.subject.includes('TMW-2026-0002-9'));
    expect(mail.to).toEqual(['sunniva@skipper.example']);
    expect(mail.text).toContain('Ivo Brandt of Tidewright Marine Works has reviewed the break-in');
    expect(mail.attachments).toEqual([
      expect.objectContaining({
        filename: 'break-in-certificate-TMW-2026-0002-9.pdf',
        contentType: 'application/pdf',
      }),
      // The first service as a calendar event (checked in reminders/first-service-calendar.test.ts).
      expect.objectContaining({
        filename: 'first-service-skua-nv40-26-00233.ics',
        contentType: 'text/calendar',
      }),
    ]);

    const again = await tech
      .post(`/api/runs/${skua.id}/sign-off`)
      .send({ decision: 'return', comments: 'Changed my mind.', rerunPhaseIds: ['dock-run'] });
    expect(again.status).toBe(409);
    expect(again.body.detail).toBe(
      'This run is already signed off; a signed-off run cannot be changed.',
    );
    // The skipper's phone can no longer add to it either (the sync endpoint refuses a frozen run).
    const engineId = (await tech.get(`/api/runs/${skua.id}/review`)).body.engine.id;
    const late = {
      type: 'event',
      runId: skua.id,
      event: {
        kind: 'note',
        id: randomUUID(),
        at: clock.now().getTime(),
        engineId,
        text: 'One more thing.',
      },
    };
    const push = await (
      await signedInAgent(server.app, DEMO.skipperA)
    )
      .post('/api/sync/push')
      .send({ deviceId: randomUUID(), sentAt: clock.now().getTime(), items: [late] });
    expect(push.body.results[0]).toMatchObject({ status: 'rejected' });
  });

  it("gives the certificate to the workshop and the vessel's skipper, with serial, verdict and due service in it", async () => {
    const skua = await runOf('Skua');
    const download = await pdfOf(await staff(), skua.id);
    expect(download.status).toBe(200);
    expect(download.headers['content-type']).toBe('application/pdf');
    const text = await pdfText(download.body as Buffer);
    expect(text).toContain('NV40-26-00233');
    expect(text).toContain('Computed verdict: Rule broken');
    expect(text).toContain('confirmed and signed off by Ivo Brandt');
    // First service 20 h or 1 month after commissioning at 0.3 h on 23 Nov 2026 (common practice; BoatUS "Long Life – Outboard Maintenance").
    expect(text).toContain('at 20.3 h on the hour meter or on 23 Dec 2026, whichever comes first');
    expect(text).toContain('One long burst clearing ferry wash; acceptable.');
    expect((await pdfOf(await signedInAgent(server.app, DEMO.skipperA), skua.id)).status).toBe(200);
    expect(
      (
        await (
          await signedInAgent(server.app, DEMO.skipperB)
        ).get(`/api/runs/${skua.id}/certificate`)
      ).status,
    ).toBe(404);
    const trail = (await (await staff()).get(`/api/runs/${skua.id}/review`)).body.trail.map(
      (t: { action: string }) => t.action,
    );
    expect(trail).toEqual([
      'run-assigned',
      'run-submitted',
      'run-signed-off',
      'certificate-issued',
      'mail-sent',
      'certificate-downloaded',
      'certificate-downloaded',
    ]);
  });

  it("writes the demo run's certificate from its frozen content when first asked for it", async () => {
    const halcyon = await runOf('Halcyon Drift');
    const tomas = await signedInAgent(server.app, DEMO.skipperB);
    const download = await pdfOf(tomas, halcyon.id);
    expect(download.status).toBe(200);
    const text = await pdfText(download.body as Buffer);
    expect(text).toContain('Certificate number TMW-2026-0001-1');
    expect(text).toContain('B321-D-77841');
    expect(text).toContain('Computed verdict: Complete');
    // 20 h or 1 month after commissioning at 2.0 h on 27 Nov 2026 (common practice; BoatUS "Long Life – Outboard Maintenance").
    expect(text).toContain('at 22.0 h on the hour meter or on 27 Dec 2026, whichever comes first');
  });

  it('answers 404 for a run with no certificate yet', async () => {
    const kittiwake = await runOf('Kittiwake');
    const res = await (await staff()).get(`/api/runs/${kittiwake.id}/certificate`);
    expect(res.status).toBe(404);
    expect(res.body.detail).toContain('not signed off yet');
  });
});
