import 'reflect-metadata';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { createApp } from './app.js';
import { loadConfig } from './lib/config.js';
import { openDatabase } from './lib/database.js';
import { createLogger } from './lib/logger.js';
import { prepareData } from './lib/bootstrap.js';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');

async function main() {
  const config = loadConfig();
  const logger = createLogger(config.logLevel);
  const dataSource = await openDatabase(config.databasePath);
  if ((await prepareData(dataSource, { seed: config.seed })).seeded) {
    logger.info('new database: demo workshop added (accounts are listed in README.md)');
  }
  const app = createApp({ dataSource, logger, clientDir: path.join(root, 'dist', 'client'), publicOrigin: config.publicOrigin });
  const server = app.listen(config.port, config.host, () => {
    logger.info(`Ringseat is serving on http://localhost:${config.port} (database ${config.databasePath})`);
  });

  const shutdown = (signal: string) => {
    logger.info(`${signal}: closing`);
    server.close(async () => {
      await dataSource.destroy();
      process.exit(0);
    });
    setTimeout(() => process.exit(0), 5000).unref();
  };
  process.on('SIGINT', () => shutdown('SIGINT'));
  process.on('SIGTERM', () => shutdown('SIGTERM'));
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
