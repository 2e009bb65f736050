import type { Logger } from '../../lib/logger.js';
import type { Outbox } from './outbox.js';

/** How often the worker looks for e-mail whose next try is due. */
export const MAIL_WORKER_INTERVAL_MS = 30_000;

/**
 * Sends what waits in the outbox: at start (e-mail left by a crash or a stop), then every 30 s.
 * One pass at a time; a pass that fails is logged and the next one tries again.
 */
export class MailWorker {
  private timer: ReturnType<typeof setInterval> | undefined;
  private running: Promise<unknown> | null = null;

  constructor(
    private readonly outbox: Outbox,
    private readonly logger: Logger,
    private readonly intervalMs = MAIL_WORKER_INTERVAL_MS,
  ) {}

  start(): void {
    void this.pass();
    this.timer = setInterval(() => void this.pass(), this.intervalMs);
    this.timer.unref();
  }

  async stop(): Promise<void> {
    clearInterval(this.timer);
    await this.running;
  }

  private async pass(): Promise<void> {
    if (this.running) return;
    this.running = this.outbox
      .deliverDue()
      .then((sent) => sent > 0 && this.logger.info({ sent }, 'e-mail sent from the outbox'))
      .catch((error: unknown) => this.logger.warn({ err: error }, 'outbox pass failed'))
      .finally(() => (this.running = null));
    await this.running;
  }
}
