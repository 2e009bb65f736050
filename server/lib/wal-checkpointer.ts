import { createRequire } from 'node:module';
import path from 'node:path';
import { Worker } from 'node:worker_threads';
import type { Logger } from 'pino';

/**
 * Folds the write-ahead log back into the database file from a worker thread with its own
 * connection, so that work does not land on whichever request happened to commit when the log
 * grew past SQLite's threshold (a sync batch then waited 50 ms or more for it; see DEVELOPERS.md).
 * PASSIVE never blocks the server's readers or writer; the server's own automatic checkpoint
 * (data-source.ts) stays on as a backstop should this thread fall behind or stop.
 *
 * The worker is plain JavaScript handed over as a string: it must load without the TypeScript
 * loader, which worker threads do not always inherit.
 */
const WORKER_SOURCE = `
const { parentPort, workerData } = require('node:worker_threads');
const Database = require(workerData.driver);
const db = new Database(workerData.file, { fileMustExist: true });
db.pragma('busy_timeout = 1000');
const checkpoint = () => {
  try {
    db.pragma('wal_checkpoint(PASSIVE)');
  } catch (error) {
    parentPort.postMessage({ error: String(error && error.message || error) });
  }
};
const timer = setInterval(checkpoint, workerData.intervalMs);
parentPort.on('message', (message) => {
  if (message === 'stop') {
    clearInterval(timer);
    checkpoint();
    db.close();
    parentPort.postMessage('stopped');
  }
});
parentPort.postMessage('ready');
`;

export type WalCheckpointer = {
  /** Runs a last checkpoint, closes the worker's connection and ends the thread. */
  stop: () => Promise<void>;
};

export async function startWalCheckpointer(
  databaseFile: string,
  logger: Logger,
  intervalMs = 250,
): Promise<WalCheckpointer> {
  if (databaseFile === ':memory:') return { stop: async () => {} };
  const driver = createRequire(import.meta.url).resolve('better-sqlite3');
  const worker = new Worker(WORKER_SOURCE, {
    eval: true,
    workerData: { driver, file: path.resolve(databaseFile), intervalMs },
  });
  worker.unref();
  let stopped: (() => void) | null = null;
  await new Promise<void>((resolve, reject) => {
    worker.once('error', reject);
    worker.on('message', (message: unknown) => {
      if (message === 'ready') resolve();
      else if (message === 'stopped') stopped?.();
      else if (typeof message === 'object' && message !== null && 'error' in message) {
        logger.warn(
          { error: (message as { error: string }).error },
          "background checkpoint failed; SQLite's own checkpoint still runs",
        );
      }
    });
  });
  worker.on('error', (error) =>
    logger.warn({ err: error }, "checkpoint thread stopped; SQLite's own checkpoint still runs"),
  );
  return {
    stop: async () => {
      const done = new Promise<void>((resolve) => {
        stopped = resolve;
        worker.once('exit', () => resolve());
      });
      worker.postMessage('stop');
      await done;
      await worker.terminate();
    },
  };
}
