import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createLogger } from '../../lib/logger.js';
import { createSmtpMailer } from '../../lib/mailer.js';
import {
  addOtherWorkshop,
  DEMO,
  FakeClock,
  signedInAgent,
} from '../../../tests/helpers/test-server.js';
import { AuditEntry } from '../audit/audit-entry.entity.js';
import { startMailTestServer, type MailTestServer } from '../mail/mail-test-server.js';
import { Outbox } from '../mail/outbox.js';
import { RunSummaries } from '../review/run-summaries.js';
import { ReminderJob } from './reminder-job.js';
import { ServiceDueService } from './service-due.service.js';
import { ServiceReminder } from './service-reminder.entity.js';

let server: MailTestServer;
const clock = new FakeClock(new Date('2026-12-01T09:00:00Z'));
beforeAll(async () => {
  server = await startMailTestServer({ clock });
});
afterAll(() => server.close());

const engineIdOf = async (vessel: string) => {
  const vessels = (await (await signedInAgent(server.app, DEMO.technician)).get('/api/vessels'))
    .body.vessels;
  return vessels.find((v: { name: string }) => v.name === vessel).engines[0].id as string;
};

function job(
  outbox = new Outbox(
    server.dataSource,
    createSmtpMailer({
      host: '127.0.0.1',
      port: server.catcher.port,
      secure: false,
      from: 'Ringseat <no-reply@ringseat.invalid>',
    }),
    createLogger('silent'),
    clock,
  ),
  intervalMs?: number,
) {
  const serviceDue = new ServiceDueService(
    server.dataSource,
    new RunSummaries(server.dataSource),
    clock,
  );
  return new ReminderJob({
    dataSource: server.dataSource,
    serviceDue,
    outbox,
    clock,
    logger: createLogger('silent'),
    intervalMs,
  });
}

describe('first service due per engine', () => {
  it('works it out from commissioning, the program and the logged hour meter', async () => {
    const res = await (
      await signedInAgent(server.app, DEMO.technician)
    ).get(`/api/engines/${await engineIdOf('Halcyon Drift')}/service-due`);
    expect(res.status).toBe(200);
    // 20 h or 1 month after commissioning at 2.0 h on 2026-11-27 (common practice; BoatUS "Long Life – Outboard Maintenance").
    expect(res.body.interval).toEqual({ hours: 20, months: 1 });
    expect(res.body.firstService).toMatchObject({
      dueAtHours: 22,
      dueOn: '2026-12-27',
      state: 'overdue',
      trigger: 'hours',
      hoursSource: 'logged',
    });
    expect(res.body.firstService.hoursNow).toBeGreaterThan(22);
  });

  it('estimates from logged running time where no hour meter was read', async () => {
    const res = await (
      await signedInAgent(server.app, DEMO.technician)
    ).get(`/api/engines/${await engineIdOf('Gannet')}/service-due`);
    // Gannet has no run: the default 20 h or 1 month from 0.4 h on 2026-11-20 (common practice, as above).
    expect(res.body.firstService).toMatchObject({
      dueAtHours: 20.4,
      dueOn: '2026-12-20',
      state: 'not-due',
      hoursNow: 0.4,
      hoursSource: 'estimated',
    });
    expect(res.body.reminder).toBeNull();
  });

  it('shows a skipper only their own engines and another workshop none', async () => {
    const halcyon = await engineIdOf('Halcyon Drift');
    expect(
      (
        await (
          await signedInAgent(server.app, DEMO.skipperB)
        ).get(`/api/engines/${halcyon}/service-due`)
      ).status,
    ).toBe(200);
    expect(
      (
        await (
          await signedInAgent(server.app, DEMO.skipperA)
        ).get(`/api/engines/${halcyon}/service-due`)
      ).status,
    ).toBe(404);
    const other = await addOtherWorkshop(server.dataSource);
    expect(
      (
        await (
          await signedInAgent(server.app, other.technicianEmail)
        ).get(`/api/engines/${halcyon}/service-due`)
      ).status,
    ).toBe(404);
  });
});

describe('service reminders', () => {
  it('e-mails the skipper and the workshop once when the first service is near', async () => {
    const halcyon = await engineIdOf('Halcyon Drift');
    const sent = await job().runOnce();
    expect(sent).toEqual([{ engineId: halcyon, state: 'overdue' }]);
    const mail = await server.catcher.waitFor(
      (m) =>
        m.subject ===
        'First service is overdue: Halcyon Drift, inboard engine (Brennholt B3-21 Marine)',
    );
    expect(mail.to.sort()).toEqual(['desk@tidewright.example', 'tomas@skipper.example']);
    expect(mail.text).toContain(
      'Due: at 22.0 h on the hour meter or on 27 Dec 2026, whichever comes first.',
    );
    expect(mail.text).toContain(
      'Vessel: Halcyon Drift\nEngine: inboard, Brennholt B3-21 Marine, serial B321-D-77841',
    );
    expect(mail.text).toMatch(new RegExp(`The engine in Ringseat: http\\S+/engines/${halcyon}\\n`));
    expect(await job().runOnce()).toEqual([]);
    const audit = await server.dataSource
      .getRepository(AuditEntry)
      .findBy({ recordType: 'engine', recordId: halcyon });
    expect(audit.map((a) => a.action)).toEqual(['service-reminder-sent']);
    const view = (
      await (
        await signedInAgent(server.app, DEMO.technician)
      ).get(`/api/engines/${halcyon}/service-due`)
    ).body;
    expect(view.reminder).toMatchObject({
      state: 'overdue',
      recipients: ['tomas@skipper.example', 'desk@tidewright.example'],
    });
  });

  it('runs by itself on its interval inside the process', async () => {
    // A month and a week on, Gannet's calendar limit (20 Dec 2026) has passed as well.
    clock.advance(26 * 86_400_000);
    const timed = job(undefined, 50);
    timed.start();
    try {
      const mail = await server.catcher.waitFor(
        (m) => m.subject.startsWith('First service is overdue: Gannet'),
        5000,
      );
      expect(mail.to.sort()).toEqual(['desk@tidewright.example', 'sunniva@skipper.example']);
    } finally {
      await timed.stop();
    }
    const gannet = await engineIdOf('Gannet');
    expect(
      await server.dataSource.getRepository(ServiceReminder).countBy({ engineId: gannet }),
    ).toBe(1);
  });
});
