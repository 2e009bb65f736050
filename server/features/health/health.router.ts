import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { migrationLevel } from '../../lib/database.js';
import { writeStatus } from '../../lib/write-status.js';

export function healthRouter(dataSource: DataSource): Router {
  const router = Router();
  router.get('/health', async (_req, res) => {
    try {
      await dataSource.query('SELECT 1');
      const writes = writeStatus(dataSource);
      if (writes.failing) {
        res
          .status(503)
          .type('application/problem+json')
          .json({
            type: '/problems/writes-failing',
            title: 'Writes are failing',
            status: 503,
            detail: `The database has refused writes since ${writes.since} (${writes.code}).`,
          });
        return;
      }
      res.json({
        status: 'ok',
        database: 'reachable',
        migrations: await migrationLevel(dataSource),
      });
    } catch {
      res.status(503).type('application/problem+json').json({
        type: '/problems/database-unreachable',
        title: 'Database unreachable',
        status: 503,
      });
    }
  });
  return router;
}
