import { Router } from 'express';
import { z } from 'zod';
import {
  VesselInputSchema,
  VesselListQuerySchema,
  type VesselListQuery,
} from '../../../shared/vessels/vessel.schema.js';
import { currentUser, requireRole } from '../../middleware/require-role.js';
import { validate } from '../../middleware/validate.js';
import type { VesselsService } from './vessels.service.js';

const IdParamsSchema = z.object({
  id: z.uuid({ error: 'The vessel id in the address is not valid.' }),
});
const staff = requireRole('technician', 'manager');

export function vesselsRouter(service: VesselsService): Router {
  const router = Router();

  // Skippers and the on-deck screen read this list too: its shape only ever grows.
  router.get(
    '/vessels',
    requireRole(),
    validate({ query: VesselListQuerySchema }),
    async (_req, res) => {
      res.json({
        vessels: await service.listFor(currentUser(res), res.locals.query as VesselListQuery),
      });
    },
  );

  router.post('/vessels', staff, validate({ body: VesselInputSchema }), async (req, res) => {
    res.status(201).json({ vessel: await service.create(currentUser(res), req.body) });
  });

  router.get(
    '/vessels/:id',
    requireRole(),
    validate({ params: IdParamsSchema }),
    async (req, res) => {
      res.json({ vessel: await service.get(currentUser(res), String(req.params.id)) });
    },
  );

  router.put(
    '/vessels/:id',
    staff,
    validate({ params: IdParamsSchema, body: VesselInputSchema }),
    async (req, res) => {
      res.json({ vessel: await service.update(currentUser(res), String(req.params.id), req.body) });
    },
  );

  router.post(
    '/vessels/:id/archive',
    staff,
    validate({ params: IdParamsSchema }),
    async (req, res) => {
      res.json({
        vessel: await service.setArchived(currentUser(res), String(req.params.id), true),
      });
    },
  );

  router.post(
    '/vessels/:id/restore',
    staff,
    validate({ params: IdParamsSchema }),
    async (req, res) => {
      res.json({
        vessel: await service.setArchived(currentUser(res), String(req.params.id), false),
      });
    },
  );

  return router;
}
