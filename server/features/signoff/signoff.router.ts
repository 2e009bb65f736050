import { Router } from 'express';
import { z } from 'zod';
import {
  SignOffInputSchema,
  VesselDecisionsInputSchema,
  type VesselDecisionsInput,
} from '../../../shared/review/review.schema.js';
import { currentUser, requireRole } from '../../middleware/require-role.js';
import { validate } from '../../middleware/validate.js';
import { RunIdParamsSchema } from '../runs/run-params.js';
import type { SignOffService } from './signoff.service.js';

const VesselIdParamsSchema = z.object({
  id: z.uuid({ error: 'The vessel id in the address is not valid.' }),
});

export function signOffRouter(service: SignOffService): Router {
  const router = Router();

  // Staff decide; a skipper is refused (403) even for their own run.
  router.post(
    '/runs/:id/sign-off',
    requireRole('technician', 'manager'),
    validate({ params: RunIdParamsSchema, body: SignOffInputSchema }),
    async (req, res) => {
      res.json(await service.decide(currentUser(res), String(req.params.id), req.body));
    },
  );

  // Both engines of a twin from one page: every decision is saved, or none is.
  router.post(
    '/vessels/:id/decisions',
    requireRole('technician', 'manager'),
    validate({ params: VesselIdParamsSchema, body: VesselDecisionsInputSchema }),
    async (req, res) => {
      const { decisions } = req.body as VesselDecisionsInput;
      res.json({
        decisions: await service.decideVessel(currentUser(res), String(req.params.id), decisions),
      });
    },
  );

  router.get(
    '/runs/:id/certificate',
    requireRole(),
    validate({ params: RunIdParamsSchema }),
    async (req, res) => {
      const { fileName, pdf } = await service.certificate(currentUser(res), String(req.params.id));
      res.setHeader('Content-Type', 'application/pdf');
      res.setHeader('Cache-Control', 'private, no-store');
      res.attachment(fileName);
      res.send(pdf);
    },
  );

  return router;
}
