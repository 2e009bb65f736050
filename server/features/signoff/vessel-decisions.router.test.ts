import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { certificatePdf, pdfText } from '../../../tests/helpers/pdf.js';
import {
  assignRun,
  readingFor,
  sessionEventFor,
  type RunDetail,
} from '../../../tests/helpers/runs.js';
import {
  addOtherWorkshop,
  DEMO,
  FakeClock,
  signedInAgent,
} from '../../../tests/helpers/test-server.js';
import { startMailTestServer, type MailTestServer } from '../mail/mail-test-server.js';

let server: MailTestServer;
const clock = new FakeClock(new Date('2026-12-01T09:00:00Z'));
beforeAll(async () => {
  server = await startMailTestServer({ clock });
});
afterAll(() => server.close());

/** Both engines of the demo's twin, each with four minutes of dock running, submitted with a note. */
async function submittedTwin(): Promise<[RunDetail, RunDetail]> {
  const port = await assignRun(server.app, 'Blue Tern', 'port');
  const starboard = await assignRun(server.app, 'Blue Tern', 'starboard');
  clock.advance(Math.max(0, Date.now() - clock.now().getTime()) + 60_000);
  const t0 = clock.now().getTime() - 3_600_000;
  const items = [port, starboard].flatMap((run) => [
    sessionEventFor(run, 'session-start', t0),
    readingFor(run, t0, 850, 'idle', 0),
    sessionEventFor(run, 'session-stop', t0 + 4 * 60_000),
    {
      type: 'run-patch',
      id: randomUUID(),
      runId: run.id,
      at: t0 + 300_000,
      submit: true,
      submitNote: 'Fog came in; back to the dock after four minutes.',
    },
  ]);
  const skipper = await signedInAgent(server.app, DEMO.skipperA);
  const push = await skipper
    .post('/api/sync/push')
    .send({ deviceId: randomUUID(), sentAt: clock.now().getTime(), items });
  expect(push.status).toBe(200);
  return [port, starboard];
}

/** The skipper runs the returned engine again, voids a mistyped reading and submits again. */
async function rerunWithAVoid(run: RunDetail) {
  clock.advance(60_000);
  const t1 = clock.now().getTime();
  const typo = readingFor(run, t1 + 1000, 8500, 'idle', 0);
  const items = [
    sessionEventFor(run, 'session-start', t1),
    typo,
    {
      type: 'event',
      runId: run.id,
      event: {
        kind: 'void',
        id: randomUUID(),
        at: t1 + 2000,
        engineId: run.engine.id,
        targetId: typo.event.id,
        reason: 'Typed 8500 for 850.',
      },
    },
    readingFor(run, t1 + 3000, 850, 'idle', 0),
    sessionEventFor(run, 'session-stop', t1 + 3 * 60_000),
    {
      type: 'run-patch',
      id: randomUUID(),
      runId: run.id,
      at: t1 + 4 * 60_000,
      submit: true,
      submitNote: 'Only three more minutes before the fog closed in again.',
    },
  ];
  clock.advance(5 * 60_000);
  const skipper = await signedInAgent(server.app, DEMO.skipperA);
  const push = await skipper
    .post('/api/sync/push')
    .send({ deviceId: randomUUID(), sentAt: clock.now().getTime(), items });
  expect(push.body.results.every((r: { status: string }) => r.status === 'stored')).toBe(true);
}

const stateOf = async (runId: string) => {
  const tech = await signedInAgent(server.app, DEMO.technician);
  return (await tech.get(`/api/runs/${runId}/review`)).body.run.state;
};

describe('deciding both engines of a vessel at once', () => {
  it('saves every decision or none, naming the engine whose decision is refused', async () => {
    const [port, starboard] = await submittedTwin();
    const vesselId = port.vessel.id;
    const url = `/api/vessels/${vesselId}/decisions`;
    const confirmPort = {
      runId: port.id,
      decision: 'confirm',
      comments: 'Dock run checked in person at the pontoon.',
    };

    const skipper = await signedInAgent(server.app, DEMO.skipperA);
    expect((await skipper.post(url).send({ decisions: [confirmPort] })).status).toBe(403);
    const { technicianEmail } = await addOtherWorkshop(server.dataSource);
    const stranger = await signedInAgent(server.app, technicianEmail);
    expect((await stranger.post(url).send({ decisions: [confirmPort] })).status).toBe(404);

    const tech = await signedInAgent(server.app, DEMO.technician);
    const refused = await tech.post(url).send({
      decisions: [confirmPort, { runId: starboard.id, decision: 'return', comments: 'Again.' }],
    });
    expect(refused.status).toBe(400);
    expect(refused.body.errors).toEqual([
      {
        field: 'decisions.1.rerunPhaseIds',
        message: 'Choose at least one phase to run again (rerunPhaseIds) when you return a run.',
      },
    ]);
    expect(await stateOf(port.id)).toBe('submitted');

    const unknownPhase = await tech.post(url).send({
      decisions: [
        confirmPort,
        { ...confirmPort, runId: starboard.id, decision: 'return', rerunPhaseIds: ['no-such'] },
      ],
    });
    expect(unknownPhase.status).toBe(400);
    expect(unknownPhase.body.errors[0].field).toBe('decisions.1.rerunPhaseIds');
    expect(unknownPhase.body.errors[0].message).toMatch(/^Starboard engine: /);
    expect(await stateOf(port.id)).toBe('submitted');

    const twice = await tech.post(url).send({ decisions: [confirmPort, confirmPort] });
    expect(twice.status).toBe(400);

    const saved = await tech.post(url).send({
      decisions: [
        confirmPort,
        {
          runId: starboard.id,
          decision: 'return',
          comments: 'Run the dock phase again for the full time.',
          rerunPhaseIds: [starboard.program.phases[0].id],
        },
      ],
    });
    expect(saved.status).toBe(200);
    expect(saved.body.decisions).toEqual([
      expect.objectContaining({
        runId: port.id,
        state: 'signed-off',
        certificate: expect.objectContaining({ downloadUrl: `/api/runs/${port.id}/certificate` }),
      }),
      expect.objectContaining({ runId: starboard.id, state: 'returned', certificate: null }),
    ]);
    expect(await stateOf(port.id)).toBe('signed-off');
    expect(await stateOf(starboard.id)).toBe('returned');
    await server.catcher.waitFor((m) => m.subject.startsWith('Break-in returned: Blue Tern'));
    const certificate = await tech.get(`/api/runs/${port.id}/certificate`);
    expect(certificate.headers['content-type']).toBe('application/pdf');

    await rerunWithAVoid(starboard);
    const last = await tech.post(url).send({
      decisions: [{ ...confirmPort, runId: starboard.id }],
    });
    expect(last.status).toBe(200);
    const text = await pdfText((await certificatePdf(tech, starboard.id)).body as Buffer);
    expect(text).toContain(
      'run again after a return; 4 min logged before the return kept in the record but not counted.',
    );
    expect(text).toContain('1 entry voided before sign-off, each with its reason');
    // Three minutes after the return count, the four before it do not (the re-run rule).
    expect(text).toContain(
      'First run at the dock (by the workshop) 0–3000 rpm, idle only 10 min 2 min 57 s',
    );
  });

  it('refuses a run of another vessel, and a signed-off run, in the same words as one run', async () => {
    const gannet = await assignRun(server.app, 'Gannet', 'single');
    const tern = (
      await (await signedInAgent(server.app, DEMO.technician)).get('/api/vessels')
    ).body.vessels.find((v: { name: string }) => v.name === 'Blue Tern');
    const tech = await signedInAgent(server.app, DEMO.technician);
    const other = await tech
      .post(`/api/vessels/${tern.id}/decisions`)
      .send({ decisions: [{ runId: gannet.id, decision: 'confirm', comments: 'x' }] });
    expect(other.status).toBe(400);
    expect(other.body.errors).toEqual([
      {
        field: 'decisions.0.runId',
        message: "Single engine: This run is not one of this vessel's runs.",
      },
    ]);
    const onGannet = await tech
      .post(`/api/vessels/${gannet.vessel.id}/decisions`)
      .send({ decisions: [{ runId: gannet.id, decision: 'confirm', comments: 'x' }] });
    expect(onGannet.status).toBe(409);
    expect(onGannet.body.errors[0]).toEqual({
      field: 'decisions.0.decision',
      message: 'Single engine: This run has not been submitted for review.',
    });
  });
});
