import 'reflect-metadata';
import path from 'node:path';
import type { Server } from 'node:http';
import { fileURLToPath } from 'node:url';
import type { DataSource } from 'typeorm';
import { createApp } from './app.js';
import { loadConfig } from './lib/config.js';
import { openDatabase } from './lib/database.js';
import { startWalCheckpointer } from './lib/wal-checkpointer.js';
import { createLogger, type Logger } from './lib/logger.js';
import { refuseEmptyDatabase, refuseMissingDatabase, StartRefused } from './first-run.js';
import { prepareData } from './prepare-data.js';
import { systemClock } from './lib/clock.js';
import { startMail } from './features/mail/start-mail.js';
import { MailWorker } from './features/mail/mail-worker.js';
import { Outbox } from './features/mail/outbox.js';
import { DEFAULT_REMINDER_INTERVAL_MS, ReminderJob } from './features/reminders/reminder-job.js';
import { ServiceDueService } from './features/reminders/service-due.service.js';
import { RunSummaries } from './features/review/run-summaries.js';
import {
  removeUnissuedCertificateFiles,
  storeMissingCertificates,
} from './features/signoff/certificate-files.js';
import { CertificateStore } from './features/signoff/certificate-store.js';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');

async function main() {
  const config = loadConfig();
  const logger = createLogger(config.logLevel);
  refuseMissingDatabase(config);
  const dataSource = await openDatabase(config.databasePath);
  await refuseEmptyDatabase(dataSource, config).catch(async (error: unknown) => {
    await dataSource.destroy();
    throw error;
  });
  const checkpointer = await startWalCheckpointer(config.databasePath, logger);
  if ((await prepareData(dataSource, { demo: config.demo })).demoAdded) {
    logger.info('new database: demo workshop added (accounts are listed in README.md)');
  }
  await settleCertificateFiles(dataSource, config.dataDir, logger);
  const mail = await startMail({ production: config.production, dataDir: config.dataDir, logger });
  const outbox = new Outbox(dataSource, mail.mailer, logger, systemClock);
  const mailWorker = new MailWorker(outbox, logger);
  mailWorker.start();
  const app = createApp({
    dataSource,
    logger,
    clientDir: path.join(root, 'dist', 'client'),
    publicOrigin: config.publicOrigin,
    trustProxy: config.trustProxy,
    dataDir: config.dataDir,
    mailer: mail.mailer,
    outbox,
    mailbox: mail.mailbox,
  });
  const reminders = reminderJob(dataSource, logger, outbox);
  reminders.start();
  const server = app.listen(config.port, config.host, () => {
    logger.info(
      `Ringseat is serving on http://localhost:${config.port} (database ${config.databasePath})`,
    );
  });
  closeOnSignal(server, logger, [
    () => reminders.stop(),
    () => mailWorker.stop(),
    () => mail.close(),
    () => checkpointer.stop(),
    () => dataSource.destroy(),
  ]);
}

/**
 * Certificate files in step with the records before any request: the demo workshop's PDFs
 * (its certificates are added as records before the data folder is known) are written, and the
 * PDFs of sign-offs cut short by a crash, which no record names, are removed.
 */
async function settleCertificateFiles(dataSource: DataSource, dataDir: string, logger: Logger) {
  const store = new CertificateStore(dataDir);
  await storeMissingCertificates(dataSource, store, systemClock.now());
  const unissued = await removeUnissuedCertificateFiles(dataSource, store);
  if (unissued.length > 0)
    logger.warn({ files: unissued }, 'removed the certificate files of sign-offs cut short');
}

/** The first-service reminders, every RINGSEAT_REMINDER_MINUTES when set, else once an hour. */
function reminderJob(dataSource: DataSource, logger: Logger, outbox: Outbox): ReminderJob {
  const reminderMinutes = Number(process.env.RINGSEAT_REMINDER_MINUTES);
  return new ReminderJob({
    dataSource,
    logger,
    clock: systemClock,
    outbox,
    serviceDue: new ServiceDueService(dataSource, new RunSummaries(dataSource), systemClock),
    intervalMs: reminderMinutes > 0 ? reminderMinutes * 60_000 : DEFAULT_REMINDER_INTERVAL_MS,
  });
}

/** On SIGINT or SIGTERM: stop taking requests, then close each part in turn (5 s at most). */
function closeOnSignal(server: Server, logger: Logger, closers: Array<() => Promise<unknown>>) {
  const shutdown = (signal: string) => {
    logger.info(`${signal}: closing`);
    server.close(async () => {
      for (const close of closers) await close();
      process.exit(0);
    });
    setTimeout(() => process.exit(0), 5000).unref();
  };
  process.on('SIGINT', () => shutdown('SIGINT'));
  process.on('SIGTERM', () => shutdown('SIGTERM'));
}

main().catch((error: unknown) => {
  console.error(error instanceof StartRefused ? `Ringseat cannot start. ${error.message}` : error);
  process.exit(1);
});
