import { Router } from 'express';
import { AssignProgramInputSchema } from '../../../shared/runs/run.schema.js';
import { currentUser, requireRole } from '../../middleware/require-role.js';
import { validate } from '../../middleware/validate.js';
import { RunIdParamsSchema } from './run-params.js';
import type { RunsService } from './runs.service.js';

export function runsRouter(service: RunsService): Router {
  const router = Router();

  router.get('/runs', requireRole(), async (_req, res) => {
    res.json({ runs: await service.list(currentUser(res)) });
  });

  router.get(
    '/runs/:id',
    requireRole(),
    validate({ params: RunIdParamsSchema }),
    async (req, res) => {
      res.json({ run: await service.get(currentUser(res), String(req.params.id)) });
    },
  );

  router.post(
    '/runs',
    requireRole('technician', 'manager'),
    validate({ body: AssignProgramInputSchema }),
    async (req, res) => {
      const run = await service.assign(currentUser(res), req.body);
      res.status(201).json({ run: await service.get(currentUser(res), run.id) });
    },
  );

  return router;
}
