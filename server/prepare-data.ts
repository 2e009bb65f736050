import type { DataSource } from 'typeorm';
import { syncBuiltInPrograms } from './features/programs/programs.service.js';
import { addDemoWorkshop } from './demo/demo-workshop.js';

/**
 * What every start does after the migrations: demo data into a new database (when asked),
 * then the built-in programs brought up to date for every workshop.
 */
export async function prepareData(
  dataSource: DataSource,
  options: { demo: 'demo' | 'none' },
): Promise<{ demoAdded: boolean }> {
  const demoAdded = options.demo === 'demo' ? await addDemoWorkshop(dataSource) : false;
  await syncBuiltInPrograms(dataSource);
  return { demoAdded };
}
