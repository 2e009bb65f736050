import 'reflect-metadata';
import { loadConfig } from '../lib/config.js';
import { openDatabase, migrationLevel } from '../lib/database.js';

const config = loadConfig();
const dataSource = await openDatabase(config.databasePath);
const level = await migrationLevel(dataSource);
console.log(
  `${config.databasePath}: ${level.applied} migrations applied, latest ${level.latest ?? 'none'}`,
);
await dataSource.destroy();
