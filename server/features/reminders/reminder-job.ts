import { randomUUID } from 'node:crypto';
import type { DataSource } from 'typeorm';
import { firstServiceWords } from '../../../shared/review/certificate-words.js';
import type { Clock } from '../../lib/clock.js';
import type { Logger } from '../../lib/logger.js';
import { recordAudit } from '../audit/audit.service.js';
import { appLink, serviceReminderMail } from '../mail/mail-templates.js';
import type { Outbox } from '../mail/outbox.js';
import { skippersOf } from '../runs/run-context.js';
import { Workshop } from '../workshops/workshop.entity.js';
import { ServiceReminder } from './service-reminder.entity.js';
import type { EngineServiceDue, ServiceDueService } from './service-due.service.js';

/** Once an hour is plenty for a reminder counted in days and engine hours (our own choice). */
export const DEFAULT_REMINDER_INTERVAL_MS = 60 * 60_000;

export interface ReminderJobDeps {
  dataSource: DataSource;
  serviceDue: ServiceDueService;
  outbox: Outbox;
  clock: Clock;
  logger: Logger;
  intervalMs?: number;
  /** The app's public origin for the link to the engine; RINGSEAT_ORIGIN or the local address when absent. */
  origin?: string;
}

/**
 * Inside the server process: every interval, e-mails the skippers and the workshop about each
 * engine whose first service is near (due soon or overdue) and not recorded as done (a recorded
 * first service ends its reminders). A reminder is recorded only once it
 * was sent, so a mail server that is down is simply tried again next time; a recorded one is
 * never sent twice.
 */
export class ReminderJob {
  private timer: NodeJS.Timeout | null = null;
  private running: Promise<unknown> | null = null;

  constructor(private readonly deps: ReminderJobDeps) {}

  start(): void {
    if (this.timer) return;
    const tick = () =>
      void this.runOnce().catch((error) =>
        this.deps.logger.error({ err: error }, 'service reminders failed'),
      );
    this.timer = setInterval(tick, this.deps.intervalMs ?? DEFAULT_REMINDER_INTERVAL_MS);
    this.timer.unref();
    setImmediate(tick);
  }

  async stop(): Promise<void> {
    if (this.timer) clearInterval(this.timer);
    this.timer = null;
    await this.running;
  }

  /** One pass over every workshop; returns the reminders sent. Overlapping passes wait for each other. */
  async runOnce(): Promise<Array<{ engineId: string; state: string }>> {
    while (this.running) await this.running.catch(() => undefined);
    const pass = this.pass();
    this.running = pass;
    try {
      return await pass;
    } finally {
      this.running = null;
    }
  }

  private async pass() {
    const sent: Array<{ engineId: string; state: string }> = [];
    for (const workshop of await this.deps.dataSource.getRepository(Workshop).find()) {
      const reminded = new Set(
        (
          await this.deps.dataSource
            .getRepository(ServiceReminder)
            .find({ where: { workshopId: workshop.id }, select: { engineId: true } })
        ).map((r) => r.engineId),
      );
      for (const due of await this.deps.serviceDue.forWorkshop(workshop.id)) {
        const state = due.firstService?.state;
        if (reminded.has(due.engine.id) || due.firstServiceDone) continue;
        if (state !== 'due-soon' && state !== 'overdue') continue;
        if (await this.remind(workshop, due)) sent.push({ engineId: due.engine.id, state });
      }
    }
    return sent;
  }

  /**
   * Puts the reminder into the outbox and keeps it as reminded, in one transaction, so it is
   * never lost and never sent twice; the outbox sends it now or, failing that, later.
   */
  private async remind(workshop: Workshop, due: EngineServiceDue): Promise<boolean> {
    const skippers = await skippersOf(this.deps.dataSource, due.engine.vesselId);
    const to = [...new Set([...skippers.map((s) => s.email), workshop.email].filter(Boolean))];
    const link = appLink(`/engines/${due.engine.id}`, this.deps.origin);
    const status = due.firstService!;
    const now = this.deps.clock.now();
    const mailId = await this.deps.dataSource.transaction(async (manager) => {
      const id = await this.deps.outbox.enqueue(
        manager,
        workshop.id,
        reminderMail(workshop, due, to, link),
      );
      await manager.getRepository(ServiceReminder).insert({
        id: randomUUID(),
        workshopId: workshop.id,
        engineId: due.engine.id,
        kind: 'first-service',
        state: status.state,
        dueAtHours: status.dueAtHours,
        dueOn: status.dueOn,
        sentAt: now,
        recipients: to,
      });
      await recordAudit(manager, {
        workshopId: workshop.id,
        recordType: 'engine',
        recordId: due.engine.id,
        action: 'service-reminder-sent',
        actor: null,
        at: now,
        detail: `First-service reminder to ${to.join(', ')}`,
      });
      return id;
    });
    const [outcome] = await this.deps.outbox.deliver([mailId]);
    if (!outcome.sent)
      this.deps.logger.warn(
        { engineId: due.engine.id, problem: outcome.problem },
        'service reminder waits in the outbox',
      );
    return true;
  }
}

function reminderMail(workshop: Workshop, due: EngineServiceDue, to: string[], link: string) {
  const status = due.firstService!;
  return serviceReminderMail({
    to,
    replyTo: workshop.email || undefined,
    workshopName: workshop.name,
    vesselName: due.engine.vesselName,
    engine: due.engine,
    overdue: status.state === 'overdue',
    dueWords: firstServiceWords(status),
    hoursWords: `${status.hoursNow.toFixed(1)} h (${status.hoursSource === 'logged' ? 'last logged hour meter' : 'estimated from logged running time'})`,
    link,
  });
}
