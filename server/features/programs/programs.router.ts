import { Router } from 'express';
import { z } from 'zod';
import { ProgramSchema } from '../../../shared/programs/program.schema.js';
import { currentUser, requireRole } from '../../middleware/require-role.js';
import { validate } from '../../middleware/validate.js';
import { toDetail, toSummary, type ProgramsService } from './programs.service.js';

const IdParamsSchema = z.object({
  id: z.uuid({ error: 'The program id in the address is not valid.' }),
});

export function programsRouter(service: ProgramsService): Router {
  const router = Router();
  const staff = requireRole('technician', 'manager');
  const manager = requireRole('manager');
  const byId = validate({ params: IdParamsSchema });
  const workshopOf = (res: Parameters<typeof currentUser>[0]) => currentUser(res).workshopId;

  router.get('/programs', staff, async (_req, res) => {
    res.json({ programs: (await service.list(workshopOf(res))).map(toSummary) });
  });

  router.get('/programs/:id', staff, byId, async (req, res) => {
    res.json({ program: toDetail(await service.get(workshopOf(res), String(req.params.id))) });
  });

  router.post('/programs/:id/copy', manager, byId, async (req, res) => {
    res
      .status(201)
      .json({ program: toDetail(await service.copy(workshopOf(res), String(req.params.id))) });
  });

  router.put(
    '/programs/:id',
    manager,
    byId,
    validate({ body: ProgramSchema }),
    async (req, res) => {
      res.json({
        program: toDetail(await service.update(workshopOf(res), String(req.params.id), req.body)),
      });
    },
  );

  router.post('/programs/:id/retire', manager, byId, async (req, res) => {
    res.json({
      program: toDetail(await service.setRetired(workshopOf(res), String(req.params.id), true)),
    });
  });

  router.post('/programs/:id/reinstate', manager, byId, async (req, res) => {
    res.json({
      program: toDetail(await service.setRetired(workshopOf(res), String(req.params.id), false)),
    });
  });

  return router;
}
