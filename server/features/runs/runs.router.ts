import { Router } from 'express';
import { z } from 'zod';
import { AssignProgramInputSchema, CancelRunInputSchema } from '../../../shared/runs/run.schema.js';
import { currentUser, requireRole } from '../../middleware/require-role.js';
import { validate } from '../../middleware/validate.js';
import type { RunCancellation } from './cancel-run.js';
import { RunIdParamsSchema } from './run-params.js';
import type { RunsService } from './runs.service.js';

const RunListQuerySchema = z.object({
  /** Only this engine's runs (the engine page's assign card). */
  engineId: z.uuid({ error: 'The engine id (engineId) is not valid.' }).optional(),
});

export function runsRouter(service: RunsService, cancellation: RunCancellation): Router {
  const router = Router();
  const staff = requireRole('technician', 'manager');

  router.get('/runs', requireRole(), validate({ query: RunListQuerySchema }), async (_req, res) => {
    const { engineId } = res.locals.query as z.infer<typeof RunListQuerySchema>;
    const runs = await service.list(currentUser(res));
    res.json({ runs: engineId ? runs.filter((r) => r.engine.id === engineId) : runs });
  });

  router.get(
    '/runs/:id',
    requireRole(),
    validate({ params: RunIdParamsSchema }),
    async (req, res) => {
      res.json({ run: await service.get(currentUser(res), String(req.params.id)) });
    },
  );

  router.post('/runs', staff, validate({ body: AssignProgramInputSchema }), async (req, res) => {
    const run = await service.assign(currentUser(res), req.body);
    res.status(201).json({ run: await service.get(currentUser(res), run.id) });
  });

  router.post(
    '/runs/:id/cancel',
    staff,
    validate({ params: RunIdParamsSchema, body: CancelRunInputSchema }),
    async (req, res) => {
      const user = currentUser(res);
      const run = await cancellation.cancel(user, String(req.params.id), req.body);
      res.json({ run: await service.get(user, run.id) });
    },
  );

  return router;
}
