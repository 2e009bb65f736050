import type { DataSource, EntityManager } from 'typeorm';
import { ChangeCounter } from './change-counter.entity.js';

/**
 * Reserves `count` change numbers inside the caller's transaction and returns the first.
 * SQLite runs one write transaction at a time, so numbers are unique and increase in commit order.
 */
export async function reserveChangeSeq(manager: EntityManager, count = 1): Promise<number> {
  const repo = manager.getRepository(ChangeCounter);
  await repo.increment({ name: 'changes' }, 'value', count);
  const { value } = await repo.findOneOrFail({ where: { name: 'changes' } });
  return value - count + 1;
}

/** The last change number handed out (committed or in the caller's transaction). */
export async function latestChangeSeq(db: DataSource | EntityManager): Promise<number> {
  const { value } = await db.getRepository(ChangeCounter).findOneByOrFail({ name: 'changes' });
  return value;
}
