import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createLogger } from '../../lib/logger.js';
import { createSmtpMailer } from '../../lib/mailer.js';
import {
  addOtherWorkshop,
  DEMO,
  FakeClock,
  signedInAgent,
} from '../../../tests/helpers/test-server.js';
import { startMailTestServer, type MailTestServer } from '../mail/mail-test-server.js';
import { Outbox } from '../mail/outbox.js';
import { runOnBoard } from '../review/review-test-client.js';
import { RunSummaries } from '../review/run-summaries.js';
import { Engine } from '../vessels/engine.entity.js';
import { ReminderJob } from './reminder-job.js';
import { ServiceDueService } from './service-due.service.js';
import { ServiceReminder } from './service-reminder.entity.js';

let server: MailTestServer;
const clock = new FakeClock(new Date('2026-12-01T09:00:00Z'));
beforeAll(async () => {
  server = await startMailTestServer({ clock });
});
afterAll(() => server.close());

const halcyonId = async () =>
  (await server.dataSource.getRepository(Engine).findOneByOrFail({ serialNumber: 'B321-D-77841' }))
    .id;

function job() {
  const mailer = createSmtpMailer({
    host: '127.0.0.1',
    port: server.catcher.port,
    secure: false,
    from: 'Ringseat <no-reply@ringseat.invalid>',
  });
  return new ReminderJob({
    dataSource: server.dataSource,
    serviceDue: new ServiceDueService(
      server.dataSource,
      new RunSummaries(server.dataSource),
      clock,
    ),
    outbox: new Outbox(server.dataSource, mailer, createLogger('silent'), clock),
    clock,
    logger: createLogger('silent'),
  });
}

describe('the first service due, for the skipper of the vessel', () => {
  it('answers by the run, with its working, and only for the own vessel', async () => {
    const run = await runOnBoard(server.app, 'Halcyon Drift');
    const tomas = await signedInAgent(server.app, DEMO.skipperB);
    const res = await tomas.get(`/api/runs/${run.id}/service-due`);
    expect(res.status).toBe(200);
    // 20 h or 1 month after commissioning at 2.0 h on 2026-11-27 (common practice; BoatUS "Long Life – Outboard Maintenance").
    expect(res.body.firstService).toMatchObject({ dueAtHours: 22, dueOn: '2026-12-27' });
    expect(res.body.workings.slice(0, 3)).toEqual([
      'Commissioned on 27 Nov 2026 with 2.0 h on the hour meter.',
      expect.stringMatching(
        /^The break-in program ".+" sets the first service at 20 h or 1 month after commissioning, whichever comes first\.$/,
      ),
      'So the first service is due at 22.0 h on the hour meter or on 27 Dec 2026, whichever comes first.',
    ]);
    expect(res.body.workings[3]).toMatch(
      /^Engine hours now: \d+\.\d h, the newest hour meter reading logged on a break-in outing\.$/,
    );
    expect(res.body.workings[4]).toBe('Overdue: the engine hours have reached the limit.');
    const sunniva = await signedInAgent(server.app, DEMO.skipperA);
    expect((await sunniva.get(`/api/runs/${run.id}/service-due`)).status).toBe(404);
    const other = await addOtherWorkshop(server.dataSource);
    const stranger = await signedInAgent(server.app, other.technicianEmail);
    expect((await stranger.get(`/api/runs/${run.id}/service-due`)).status).toBe(404);
  });
});

describe('once the first service is recorded', () => {
  it('clears the board flag and the reminder job sends nothing for the engine', async () => {
    const before = await runOnBoard(server.app, 'Halcyon Drift');
    expect(before.flags).toContain('service-overdue');
    const tech = await signedInAgent(server.app, DEMO.technician);
    const recorded = await tech
      .post(`/api/engines/${await halcyonId()}/services`)
      .send({ date: '2026-11-30', hourMeter: 23.1, doneBy: 'Ivo Brandt' });
    expect(recorded.status).toBe(201);

    const after = await runOnBoard(server.app, 'Halcyon Drift');
    expect(after.flags).not.toContain('service-overdue');
    expect(after.flags).not.toContain('service-due-soon');
    expect(after.firstService).toMatchObject({ doneOn: '2026-11-30' });

    // Counted from commissioning it is still overdue: only the record of it stops the reminder.
    const due = (await tech.get(`/api/engines/${await halcyonId()}/service-due`)).body;
    expect(due.firstService.state).toBe('overdue');
    expect(due.firstServiceDone).toMatchObject({ date: '2026-11-30', hourMeter: 23.1 });
    // Halcyon was the only engine near its first service on 1 Dec 2026 (see reminders.test.ts).
    expect(await job().runOnce()).toEqual([]);
    expect(await server.dataSource.getRepository(ServiceReminder).count()).toBe(0);
    expect(server.catcher.list().filter((m) => m.subject.startsWith('First service'))).toEqual([]);
  });
});
