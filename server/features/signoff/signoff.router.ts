import { Router } from 'express';
import { SignOffInputSchema } from '../../../shared/review/review.schema.js';
import { currentUser, requireRole } from '../../middleware/require-role.js';
import { validate } from '../../middleware/validate.js';
import { RunIdParamsSchema } from '../runs/run-params.js';
import type { SignOffService } from './signoff.service.js';

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
