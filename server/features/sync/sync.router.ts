import express, { Router } from 'express';
import { PullQuerySchema, PushBatchSchema } from '../../../shared/sync/sync.schema.js';
import { currentUser, requireRole } from '../../middleware/require-role.js';
import { validate } from '../../middleware/validate.js';
import { VoidInputSchema } from '../../../shared/review/review.schema.js';
import { RunIdParamsSchema } from '../runs/run-params.js';
import type { SyncService } from './sync.service.js';

/** A batch of 2,000 readings is about 600 KB of JSON; 4 MB leaves room and still bounds memory. */
const PUSH_BODY_LIMIT = '4mb';

export function syncRouter(service: SyncService): Router {
  const router = Router();

  router.post(
    '/sync/push',
    express.json({ limit: PUSH_BODY_LIMIT }),
    requireRole(),
    validate({ body: PushBatchSchema }),
    async (req, res) => {
      res.json(await service.push(currentUser(res), req.body));
    },
  );

  router.get(
    '/sync/pull',
    requireRole(),
    validate({ query: PullQuerySchema }),
    async (_req, res) => {
      const { cursor, limit } = res.locals.query as { cursor: number; limit: number };
      res.json(await service.pull(currentUser(res), cursor, limit));
    },
  );

  router.post(
    '/runs/:id/voids',
    requireRole('technician', 'manager'),
    validate({ params: RunIdParamsSchema, body: VoidInputSchema }),
    async (req, res) => {
      res
        .status(201)
        .json(await service.voidEntry(currentUser(res), String(req.params.id), req.body));
    },
  );

  return router;
}
