import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
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
  startTestServer,
  type TestServer,
} from '../../../tests/helpers/test-server.js';
import { Run } from '../runs/run.entity.js';

/*
 * Voids, submitting and returning with phases to run again, through the routes a device and the
 * review page use. Blue Tern's skipper is Sunniva (demo data); readings are logged an hour
 * before the server's clock, so a return "now" sets them aside.
 */
let server: TestServer;
let run: RunDetail;
let otherTech: string;
const clock = new FakeClock(new Date('2026-12-01T09:00:00Z'));
const T0 = Date.parse('2026-12-01T08:00:00Z');

beforeAll(async () => {
  server = await startTestServer({ clock });
  otherTech = (await addOtherWorkshop(server.dataSource)).technicianEmail;
  run = await assignRun(server.app, 'Blue Tern', 'port');
});
afterAll(() => server.close());

const skipper = () => signedInAgent(server.app, DEMO.skipperA);
const tech = () => signedInAgent(server.app, DEMO.technician);
const push = async (items: unknown[], who = skipper) =>
  (await who())
    .post('/api/sync/push')
    .send({ deviceId: randomUUID(), sentAt: clock.now().getTime(), items });
const voidOf = (targetId: string, reason = 'Typed 3800 for 2800.') => ({
  type: 'event',
  runId: run.id,
  event: {
    kind: 'void',
    id: randomUUID(),
    at: T0 + 50_000,
    engineId: run.engine.id,
    targetId,
    reason,
  },
});
const stateOf = async () =>
  (await server.dataSource.getRepository(Run).findOneByOrFail({ id: run.id })).state;

describe('voids from a device', () => {
  it("take back the skipper's own reading, struck through on the review with reason and name", async () => {
    const start = sessionEventFor(run, 'session-start', T0);
    const typo = readingFor(run, T0 + 10_000, 3800);
    const res = await push([start, readingFor(run, T0 + 1000, 2800), typo, voidOf(typo.event.id)]);
    expect(res.body.results.map((r: { status: string }) => r.status)).toEqual([
      'stored',
      'stored',
      'stored',
      'stored',
    ]);
    const page = (await (await tech()).get(`/api/runs/${run.id}/readings`)).body;
    const voided = page.readings.find((r: { id: string }) => r.id === typo.event.id);
    expect(voided.voided).toMatchObject({
      reason: 'Typed 3800 for 2800.',
      byName: 'Sunniva Okafor',
    });
    const review = (await (await tech()).get(`/api/runs/${run.id}/review`)).body;
    expect(review.voidedCount).toBe(1);
    expect(review.trail.map((t: { action: string }) => t.action)).toContain('entry-voided');
  });

  it('refuse a second void, a void of a session start and one naming an entry of another run', async () => {
    const reading = readingFor(run, T0 + 20_000, 2900);
    const start = sessionEventFor(run, 'session-start', T0 + 15_000);
    await push([start, reading]);
    expect((await push([voidOf(reading.event.id)])).body.results[0].status).toBe('stored');
    const again = (await push([voidOf(reading.event.id)])).body.results[0];
    expect(again).toMatchObject({ status: 'rejected', field: 'event.targetId' });
    expect(again.reason).toBe('This entry is already voided (targetId).');
    const ofStart = (await push([voidOf(start.event.id)])).body.results[0];
    expect(ofStart.reason).toContain('Only a reading or a note can be voided');
    const gannet = await assignRun(server.app, 'Gannet', 'single');
    const elsewhere = readingFor(gannet, T0 + 1000, 2800);
    await push([elsewhere]);
    const foreign = (await push([voidOf(elsewhere.event.id)])).body.results[0];
    expect(foreign).toMatchObject({ status: 'rejected', field: 'event.targetId' });
    expect(foreign.reason).toBe('The entry to void (targetId) is not an entry of this run.');
  });

  it("refuse a skipper's void of an entry the workshop made", async () => {
    const staffReading = readingFor(run, T0 + 30_000, 2850);
    expect((await push([staffReading], tech)).body.results[0].status).toBe('stored');
    const refused = (await push([voidOf(staffReading.event.id)])).body.results[0];
    expect(refused).toMatchObject({ status: 'rejected', field: 'event.targetId' });
    expect(refused.reason).toBe('A skipper can void only their own entries (targetId).');
  });
});

describe('submitting', () => {
  it('asks for a note when a phase is not complete, then takes it once', async () => {
    const bare = {
      type: 'run-patch',
      id: randomUUID(),
      runId: run.id,
      at: T0 + 60_000,
      submit: true,
    };
    const refused = (await push([bare])).body.results[0];
    expect(refused).toMatchObject({ status: 'rejected', field: 'submitNote' });
    expect(refused.reason).toContain('Write a note to the workshop (submitNote)');
    expect(await stateOf()).toBe('under-way');
    const noted = { ...bare, id: randomUUID(), submitNote: 'Fog came in; we turned back.' };
    expect((await push([noted])).body.results[0].status).toBe('stored');
    expect(await stateOf()).toBe('submitted');
    const twice = (await push([{ ...noted, id: randomUUID() }])).body.results[0];
    expect(twice).toMatchObject({ status: 'rejected', field: 'submit' });
    expect(twice.reason).toContain('already submitted');
    const review = (await (await tech()).get(`/api/runs/${run.id}/review`)).body;
    expect(review.run.submitNote).toBe('Fog came in; we turned back.');
  });
});

describe('the workshop voids from the review page', () => {
  it('is for staff of the workshop only, needs a reason, and voids an entry once', async () => {
    const target = readingFor(run, T0 + 40_000, 2700);
    // Logged before the submit in the test above would refuse it now; store it as staff would.
    await server.dataSource.getRepository(Run).update({ id: run.id }, { state: 'under-way' });
    await push([target]);
    await server.dataSource.getRepository(Run).update({ id: run.id }, { state: 'submitted' });
    const url = `/api/runs/${run.id}/voids`;
    const body = { targetId: target.event.id, reason: 'Hour meter photo shows 2,700 was at idle.' };
    expect((await (await skipper()).post(url).send(body)).status).toBe(403);
    expect((await (await signedInAgent(server.app, otherTech)).post(url).send(body)).status).toBe(
      404,
    );
    const blank = await (await tech()).post(url).send({ targetId: target.event.id, reason: ' ' });
    expect(blank.status).toBe(400);
    expect(blank.body.errors[0]).toMatchObject({ field: 'reason' });
    const done = await (await tech()).post(url).send(body);
    expect(done.status).toBe(201);
    const twice = await (await tech()).post(url).send(body);
    expect(twice.status).toBe(400);
    expect(twice.body.errors[0]).toEqual({
      field: 'targetId',
      message: 'This entry is already voided (targetId).',
    });
    const page = (await (await tech()).get(`/api/runs/${run.id}/readings`)).body;
    expect(
      page.readings.find((r: { id: string }) => r.id === target.event.id).voided,
    ).toMatchObject({
      byName: 'Ivo Brandt',
    });
  });
});

describe('returning with phases to run again', () => {
  it('names the phases, refuses a phase the run lacks and a skipper, and counts the phase again from the return', async () => {
    const url = `/api/runs/${run.id}/sign-off`;
    const phaseId = run.program.phases[1].id;
    const send = {
      decision: 'return',
      comments: 'Run it again, steadier.',
      rerunPhaseIds: [phaseId],
    };
    expect((await (await skipper()).post(url).send(send)).status).toBe(403);
    const unknown = await (await tech()).post(url).send({ ...send, rerunPhaseIds: ['no-such'] });
    expect(unknown.status).toBe(400);
    expect(unknown.body.errors[0]).toMatchObject({ field: 'rerunPhaseIds' });
    expect(await stateOf()).toBe('submitted');
    const before = (await (await tech()).get(`/api/runs/${run.id}/review`)).body.phases[1];
    expect(before.timeInBandMs + before.timeOverMs + before.timeUnderMs).toBeGreaterThan(0);
    expect((await (await tech()).post(url).send(send)).status).toBe(200);
    const detail = (await (await skipper()).get(`/api/runs/${run.id}`)).body.run;
    expect(detail.rerunFrom).toEqual({ [phaseId]: clock.now().getTime() });
    expect(detail.lastDecision).toMatchObject({ decision: 'returned', rerunPhaseIds: [phaseId] });
    const after = (await (await tech()).get(`/api/runs/${run.id}/review`)).body;
    expect(after.phases[1]).toMatchObject({ timeInBandMs: 0, countsFromMs: clock.now().getTime() });
    expect(after.phases[1].setAsideMs).toBe(
      before.timeInBandMs + before.timeOverMs + before.timeUnderMs,
    );
    expect(after.reviews.at(-1).rerunPhaseNames).toEqual([run.program.phases[1].name]);
  });
});

describe('after sign-off', () => {
  it('refuses any void, from the review page or a device', async () => {
    const target = readingFor(run, T0 + 45_000, 2750);
    await push([target]);
    await server.dataSource
      .getRepository(Run)
      .update({ id: run.id }, { state: 'signed-off', signedOffAt: clock.now() });
    const staff = await (
      await tech()
    )
      .post(`/api/runs/${run.id}/voids`)
      .send({ targetId: target.event.id, reason: 'Too late.' });
    expect(staff.status).toBe(400);
    expect(staff.body.detail).toContain('signed off');
    const device = (await push([voidOf(target.event.id)])).body.results[0];
    expect(device).toMatchObject({ status: 'rejected' });
    expect(device.reason).toContain('signed off');
  });
});
