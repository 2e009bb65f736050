import { Router } from 'express';
import { z } from 'zod';
import {
  ChecklistInputSchema,
  ReopenChecklistInputSchema,
} from '../../../shared/checklists/checklist.schema.js';
import { currentUser, requireRole } from '../../middleware/require-role.js';
import { validate } from '../../middleware/validate.js';
import type { ChecklistsService } from './checklists.service.js';

const EngineParamsSchema = z.object({
  id: z.uuid({ error: 'The engine id in the address is not valid.' }),
});
const staff = requireRole('technician', 'manager');

/** The commissioning checklist hangs off its engine: /api/engines/:id/checklist. */
export function checklistsRouter(service: ChecklistsService): Router {
  const router = Router();

  router.get(
    '/engines/:id/checklist',
    requireRole(),
    validate({ params: EngineParamsSchema }),
    async (req, res) => {
      res.json({ checklist: await service.get(currentUser(res), String(req.params.id)) });
    },
  );

  router.put(
    '/engines/:id/checklist',
    staff,
    validate({ params: EngineParamsSchema, body: ChecklistInputSchema }),
    async (req, res) => {
      res.json({
        checklist: await service.save(currentUser(res), String(req.params.id), req.body),
      });
    },
  );

  router.post(
    '/engines/:id/checklist/complete',
    staff,
    validate({ params: EngineParamsSchema, body: ChecklistInputSchema }),
    async (req, res) => {
      res.json({
        checklist: await service.complete(currentUser(res), String(req.params.id), req.body),
      });
    },
  );

  router.post(
    '/engines/:id/checklist/reopen',
    staff,
    validate({ params: EngineParamsSchema, body: ReopenChecklistInputSchema }),
    async (req, res) => {
      res.json({
        checklist: await service.reopen(currentUser(res), String(req.params.id), req.body),
      });
    },
  );

  return router;
}
