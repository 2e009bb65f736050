import { Router } from 'express';
import { z } from 'zod';
import { currentUser, requireRole } from '../../middleware/require-role.js';
import { validate } from '../../middleware/validate.js';
import type { ServiceDueService } from './service-due.service.js';

const EngineParamsSchema = z.object({
  id: z.uuid({ error: 'The engine id in the address is not valid.' }),
});
const RunParamsSchema = z.object({
  id: z.uuid({ error: 'The run id in the address is not valid.' }),
});

/** RFC 6266: an ASCII file name (the calendar file's name is made ASCII already). */
const attachmentHeader = (name: string) => `attachment; filename="${name}"`;

/**
 * The first service due, for anyone who may see the engine: staff of the workshop, and the
 * skipper of the vessel (by the engine, or by a run of it for the skipper's run page).
 */
export function serviceDueRouter(service: ServiceDueService): Router {
  const router = Router();
  const engineParams = validate({ params: EngineParamsSchema });

  router.get('/engines/:id/service-due', requireRole(), engineParams, async (req, res) => {
    res.json(await service.forEngine(currentUser(res), String(req.params.id)));
  });

  router.get(
    '/runs/:id/service-due',
    requireRole(),
    validate({ params: RunParamsSchema }),
    async (req, res) => {
      res.json(await service.forRun(currentUser(res), String(req.params.id)));
    },
  );

  router.get('/engines/:id/first-service.ics', requireRole(), engineParams, async (req, res) => {
    const file = await service.calendarFile(currentUser(res), String(req.params.id));
    res.setHeader('Content-Type', file.contentType);
    res.setHeader('Content-Disposition', attachmentHeader(file.filename));
    res.setHeader('Cache-Control', 'private, no-cache');
    res.send(file.content);
  });

  return router;
}
