import { Router } from 'express';
import { z } from 'zod';
import { EngineInputSchema } from '../../../shared/engines/engine.schema.js';
import { ListStatusSchema } from '../../../shared/vessels/vessel.schema.js';
import { currentUser, requireRole } from '../../middleware/require-role.js';
import { validate } from '../../middleware/validate.js';
import type { EngineListQuery, EnginesService } from './engines.service.js';

const IdParamsSchema = z.object({
  id: z.uuid({ error: 'The engine id in the address is not valid.' }),
});
const EngineListQuerySchema = z.object({
  q: z
    .string({ error: 'The search text (q) must be text.' })
    .trim()
    .max(80, { error: 'The search text (q) can have at most 80 characters.' })
    .default(''),
  status: ListStatusSchema.default('active'),
  vesselId: z.uuid({ error: 'The vessel filter (vesselId) must be a vessel id.' }).optional(),
});
const staff = requireRole('technician', 'manager');

export function enginesRouter(service: EnginesService): Router {
  const router = Router();

  router.get(
    '/engines',
    requireRole(),
    validate({ query: EngineListQuerySchema }),
    async (_req, res) => {
      res.json({
        engines: await service.list(currentUser(res), res.locals.query as EngineListQuery),
      });
    },
  );

  router.post('/engines', staff, validate({ body: EngineInputSchema }), async (req, res) => {
    res.status(201).json({ engine: await service.create(currentUser(res), req.body) });
  });

  router.get(
    '/engines/:id',
    requireRole(),
    validate({ params: IdParamsSchema }),
    async (req, res) => {
      res.json({ engine: await service.get(currentUser(res), String(req.params.id)) });
    },
  );

  router.put(
    '/engines/:id',
    staff,
    validate({ params: IdParamsSchema, body: EngineInputSchema }),
    async (req, res) => {
      res.json({ engine: await service.update(currentUser(res), String(req.params.id), req.body) });
    },
  );

  router.post(
    '/engines/:id/archive',
    staff,
    validate({ params: IdParamsSchema }),
    async (req, res) => {
      res.json({
        engine: await service.setArchived(currentUser(res), String(req.params.id), true),
      });
    },
  );

  router.post(
    '/engines/:id/restore',
    staff,
    validate({ params: IdParamsSchema }),
    async (req, res) => {
      res.json({
        engine: await service.setArchived(currentUser(res), String(req.params.id), false),
      });
    },
  );

  return router;
}
