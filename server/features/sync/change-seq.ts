import type { EntityManager } from 'typeorm';
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
