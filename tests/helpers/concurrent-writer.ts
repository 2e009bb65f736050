import 'reflect-metadata';
import { openDatabase } from '../../server/lib/database.js';

/*
 * One of two processes writing to one database file at once (server/lib/transaction-lock.test.ts):
 * each transaction reads, waits a moment, then writes, as a sign-off does.
 * Usage: tsx tests/helpers/concurrent-writer.ts <database> <name> <count>
 */

const [databasePath, name, count] = process.argv.slice(2);
const dataSource = await openDatabase(databasePath);
let failed = 0;
for (let i = 0; i < Number(count); i++) {
  try {
    await dataSource.transaction(async (manager) => {
      const [{ n }] = await manager.query('SELECT count(*) AS n FROM "scratch"');
      await new Promise((resolve) => setTimeout(resolve, 5));
      await manager.query('INSERT INTO "scratch" ("id", "seen") VALUES (?, ?)', [
        `${name}-${i}`,
        n,
      ]);
    });
  } catch (error) {
    failed++;
    console.error((error as Error).message);
  }
}
await dataSource.destroy();
console.log(JSON.stringify({ failed }));
