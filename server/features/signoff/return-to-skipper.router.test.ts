import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { assignRun } from '../../../tests/helpers/runs.js';
import { DEMO, FakeClock, signedInAgent } from '../../../tests/helpers/test-server.js';
import { startMailTestServer, type MailTestServer } from '../mail/mail-test-server.js';

let server: MailTestServer;
const clock = new FakeClock(new Date('2026-12-01T09:00:00Z'));
beforeAll(async () => {
  server = await startMailTestServer({ clock });
});
afterAll(() => server.close());

const staff = () => signedInAgent(server.app, DEMO.technician);

describe('returning a run', () => {
  it('sends it back to the skipper with the comments and reasons, and logging opens again', async () => {
    const run = await assignRun(server.app, 'Blue Tern', 'port');
    // The assignment is stamped by the database clock; keep the fake clock after it.
    clock.advance(Math.max(0, Date.now() - clock.now().getTime()) + 60_000);
    const engineId = run.engine.id;
    const t0 = Date.parse('2026-12-01T07:00:00Z');
    const events = [
      { kind: 'session-start', id: randomUUID(), at: t0, engineId },
      {
        kind: 'reading',
        id: randomUUID(),
        at: t0,
        engineId,
        phaseId: 'dock-run',
        rpm: 850,
        throttle: 'idle',
      },
      { kind: 'session-stop', id: randomUUID(), at: t0 + 4 * 60_000, engineId },
    ];
    const sunniva = await signedInAgent(server.app, DEMO.skipperA);
    const items = [
      ...events.map((event) => ({ type: 'event', runId: run.id, event })),
      {
        type: 'run-patch',
        id: randomUUID(),
        runId: run.id,
        at: t0 + 300_000,
        submit: true,
        submitNote: 'Ran out of daylight after four minutes.',
      },
    ];
    expect(
      (
        await sunniva
          .post('/api/sync/push')
          .send({ deviceId: randomUUID(), sentAt: clock.now().getTime(), items })
      ).status,
    ).toBe(200);

    clock.advance(3_600_000);
    const tech = await staff();
    const missing = await tech.post(`/api/runs/${run.id}/sign-off`).send({ decision: 'return' });
    expect(missing.body.errors).toEqual([
      {
        field: 'comments',
        message: 'Write what the skipper should do (comments) when you return a run.',
      },
      {
        field: 'rerunPhaseIds',
        message: 'Choose at least one phase to run again (rerunPhaseIds) when you return a run.',
      },
    ]);
    const res = await tech.post(`/api/runs/${run.id}/sign-off`).send({
      decision: 'return',
      comments: 'Only four minutes logged. Finish the dock run and the phases after it.',
      rerunPhaseIds: ['dock-run'],
    });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ state: 'returned', certificate: null, mail: { sent: true } });
    const mail = await server.catcher.waitFor((m) =>
      m.subject.startsWith('Break-in returned: Blue Tern'),
    );
    expect(mail.text).toContain('Only four minutes logged.');
    const rerunList = mail.text.slice(mail.text.indexOf('Phases to run again:'));
    expect(rerunList.split('\n')[1]).toContain(run.program.phases[0].name);
    expect(mail.text).toContain('In band for 4 min of the 10 min required; 6 min to go.');
    expect(mail.text).toContain('kill-switch lanyard');

    const confirmNow = await tech
      .post(`/api/runs/${run.id}/sign-off`)
      .send({ decision: 'confirm', comments: 'x' });
    expect(confirmNow.status).toBe(409);
    const review = (await tech.get(`/api/runs/${run.id}/review`)).body;
    expect(review.reviews).toEqual([
      expect.objectContaining({
        decision: 'returned',
        reviewerName: 'Ivo Brandt',
        verdict: 'incomplete',
      }),
    ]);
    expect(review.trail.map((t: { action: string }) => t.action)).toEqual([
      'run-assigned',
      'run-submitted',
      'run-returned',
      'mail-sent',
    ]);
  });
});
