import { Router } from 'express';
import { z } from 'zod';
import { currentUser, requireRole } from '../../middleware/require-role.js';
import { validate } from '../../middleware/validate.js';
import type { ServiceDueService } from './service-due.service.js';

const EngineParamsSchema = z.object({
  id: z.uuid({ error: 'The engine id in the address is not valid.' }),
});

export function serviceDueRouter(service: ServiceDueService): Router {
  const router = Router();
  router.get(
    '/engines/:id/service-due',
    requireRole(),
    validate({ params: EngineParamsSchema }),
    async (req, res) => {
      res.json(await service.forEngine(currentUser(res), String(req.params.id)));
    },
  );
  return router;
}
