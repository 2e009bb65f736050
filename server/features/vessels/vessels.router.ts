import { Router } from 'express';
import { currentUser, requireRole } from '../../middleware/require-role.js';
import type { VesselsService } from './vessels.service.js';

export function vesselsRouter(service: VesselsService): Router {
  const router = Router();
  router.get('/vessels', requireRole(), async (_req, res) => {
    res.json({ vessels: await service.listFor(currentUser(res)) });
  });
  return router;
}
