import 'reflect-metadata';
import { loadConfig } from '../lib/config.js';
import { openDatabase } from '../lib/database.js';
import { prepareData } from '../prepare-data.js';

const config = loadConfig();
const dataSource = await openDatabase(config.databasePath);
const { demoAdded: added } = await prepareData(dataSource, { demo: 'demo' });
console.log(
  added
    ? `${config.databasePath}: demo workshop added.`
    : `${config.databasePath}: already holds data; nothing added (demo data goes only into a new database).`,
);
await dataSource.destroy();
