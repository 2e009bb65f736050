import type { DataSource } from 'typeorm';
import { syncBuiltInPrograms } from './features/programs/programs.service.js';
import { seedDemo } from './seed/seed.js';

/**
 * What every start does after the migrations: demo data into a new database (when asked),
 * then the built-in programs brought up to date for every workshop.
 */
export async function prepareData(
  dataSource: DataSource,
  options: { seed: 'demo' | 'none' },
): Promise<{ seeded: boolean }> {
  const seeded = options.seed === 'demo' ? await seedDemo(dataSource) : false;
  await syncBuiltInPrograms(dataSource);
  return { seeded };
}
