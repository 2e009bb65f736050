import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { MAX_REASON_LENGTH } from '../../../shared/runs/run.schema.js';
import {
  addOtherWorkshop,
  DEMO,
  FakeClock,
  signedInAgent,
  startTestServer,
  type TestServer,
} from '../../../tests/helpers/test-server.js';
import { AuditEntry } from '../audit/audit-entry.entity.js';
import { Run } from './run.entity.js';

let server: TestServer;
const clock = new FakeClock(new Date('2026-12-02T10:15:00Z'));
beforeAll(async () => {
  server = await startTestServer({ clock });
});
afterAll(() => server.close());

type RunRow = { id: string; state: string; vessel: { name: string }; engine: { id: string } };
const staff = () => signedInAgent(server.app, DEMO.technician);
/** The demo run on this boat (Kittiwake's is planned, Cormorant's port engine under way). */
async function demoRun(vessel: string): Promise<RunRow> {
  const runs: RunRow[] = (await (await staff()).get('/api/runs')).body.runs;
  return runs.find((r) => r.vessel.name === vessel)!;
}

describe('cancelling a planned run', () => {
  it('is for staff only: a skipper is refused, another workshop is told there is no such run', async () => {
    const run = await demoRun('Kittiwake');
    const skipper = await signedInAgent(server.app, DEMO.skipperA);
    const refused = await skipper.post(`/api/runs/${run.id}/cancel`).send({ reason: 'Mine now' });
    expect(refused.status).toBe(403);
    const other = await addOtherWorkshop(server.dataSource);
    const stranger = await signedInAgent(server.app, other.technicianEmail);
    const hidden = await stranger.post(`/api/runs/${run.id}/cancel`).send({ reason: 'Not ours' });
    expect(hidden.status).toBe(404);
    expect((await server.dataSource.getRepository(Run).findOneByOrFail({ id: run.id })).state).toBe(
      'planned',
    );
  });

  it('needs a reason, named by its field, and keeps it short', async () => {
    const tech = await staff();
    const run = await demoRun('Kittiwake');
    const missing = await tech.post(`/api/runs/${run.id}/cancel`).send({});
    expect(missing.status).toBe(400);
    expect(missing.body.errors).toEqual([
      { field: 'reason', message: 'Give the reason (reason) for cancelling this run.' },
    ]);
    const blank = await tech.post(`/api/runs/${run.id}/cancel`).send({ reason: '   ' });
    expect(blank.body.errors[0].field).toBe('reason');
    const long = await tech
      .post(`/api/runs/${run.id}/cancel`)
      .send({ reason: 'x'.repeat(MAX_REASON_LENGTH + 1) });
    expect(long.status).toBe(400);
    expect(long.body.errors).toEqual([
      {
        field: 'reason',
        message: `The reason (reason) can have at most ${MAX_REASON_LENGTH} characters.`,
      },
    ]);
    expect((await server.dataSource.getRepository(Run).findOneByOrFail({ id: run.id })).state).toBe(
      'planned',
    );
  });

  it('cancels with the reason in the trail, then lets a new program be assigned', async () => {
    const tech = await staff();
    const run = await demoRun('Kittiwake');
    const reason = 'Assigned to the wrong boat: this program was meant for Gannet.';
    const res = await tech.post(`/api/runs/${run.id}/cancel`).send({ reason });
    expect(res.status).toBe(200);
    expect(res.body.run).toMatchObject({ id: run.id, state: 'cancelled' });

    const trail = await server.dataSource
      .getRepository(AuditEntry)
      .findBy({ recordId: run.id, action: 'run-cancelled' });
    expect(trail).toMatchObject([
      { actorName: 'Ivo Brandt', detail: reason, at: new Date('2026-12-02T10:15:00Z') },
    ]);

    const again = await tech.post(`/api/runs/${run.id}/cancel`).send({ reason });
    expect(again.status).toBe(409);
    expect(again.body.detail).toBe('Only a planned run can be cancelled; this one is "Cancelled".');

    const programs = (await tech.get('/api/programs')).body.programs as Array<{
      id: string;
      builtInKey: string | null;
    }>;
    // Kittiwake's outboard is a two-stroke (demo data).
    const twoStroke = programs.find((p) => p.builtInKey === 'two-stroke-outboard')!;
    const assigned = await tech
      .post('/api/runs')
      .send({ engineId: run.engine.id, programId: twoStroke.id });
    expect(assigned.status).toBe(201);
    expect(assigned.body.run.state).toBe('planned');
    const listed = (await tech.get(`/api/runs?engineId=${run.engine.id}`)).body.runs as RunRow[];
    expect(listed.map((r) => r.state).sort()).toEqual(['cancelled', 'planned']);
  });

  it('refuses a run that is under way, naming its state', async () => {
    const run = await demoRun('Cormorant');
    const res = await (
      await staff()
    )
      .post(`/api/runs/${run.id}/cancel`)
      .send({ reason: 'Wrong program' });
    expect(res.status).toBe(409);
    expect(res.body.detail).toBe('Only a planned run can be cancelled; this one is "Under way".');
    expect(res.body.errors).toEqual([
      {
        field: 'state',
        message: 'This run is "Under way", not "Planned"; it cannot be cancelled.',
      },
    ]);
  });

  it('leaves a cancelled run off what needs action on the board', async () => {
    const tech = await staff();
    const board = (await tech.get('/api/board?show=all')).body;
    expect(board.counts.cancelled).toBe(1);
    const cancelled = board.runs.filter((r: RunRow) => r.state === 'cancelled');
    expect(cancelled).toHaveLength(1);
    expect(cancelled[0]).toMatchObject({ group: 'done', flags: [] });
    const action = (await tech.get('/api/board')).body;
    expect(action.runs.some((r: RunRow) => r.state === 'cancelled')).toBe(false);
    const shown = (await tech.get('/api/board?show=cancelled')).body;
    expect(shown.runs.map((r: RunRow) => r.vessel.name)).toEqual(['Kittiwake']);
  });
});
