import Database from 'better-sqlite3';
import { parentPort } from 'node:worker_threads';
import type { ResolvedPhase } from '../../../shared/programs/resolve-band.js';
import { computeRunFigures } from './run-figures.js';

/*
 * A worker thread that works out a run's review figures on a read-only connection of its own,
 * so accounting tens of thousands of readings never holds up the server's event loop (health,
 * pushes, other pages). WAL lets it read while the server writes; it sees committed rows only.
 */

export type FiguresRequest = {
  id: number;
  databasePath: string;
  run: { id: string; engineId: string };
  phases: ResolvedPhase[];
};

const connections = new Map<string, Database.Database>();

/** A few files at most (one in a server; tests make many), the least recently used closed first. */
const MAX_CONNECTIONS = 4;

function connectionTo(databasePath: string): Database.Database {
  let db = connections.get(databasePath);
  connections.delete(databasePath);
  if (!db) {
    db = new Database(databasePath, { fileMustExist: true });
    db.pragma('busy_timeout = 5000');
    db.pragma('query_only = ON');
  }
  connections.set(databasePath, db);
  if (connections.size > MAX_CONNECTIONS) {
    const [oldest, stale] = connections.entries().next().value!;
    connections.delete(oldest);
    stale.close();
  }
  return db;
}

parentPort!.on('message', async (request: FiguresRequest) => {
  try {
    const figures = await computeRunFigures(
      connectionTo(request.databasePath),
      request.run,
      request.phases,
    );
    parentPort!.postMessage({ id: request.id, figures });
  } catch (error) {
    parentPort!.postMessage({ id: request.id, error: (error as Error).message });
  }
});
