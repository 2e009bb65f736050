import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { NotFoundError } from '../../lib/errors.js';
import { currentUser, requireRole } from '../../middleware/require-role.js';
import { Workshop } from './workshop.entity.js';

export function workshopsRouter(dataSource: DataSource): Router {
  const router = Router();
  // Staff only: a skipper sees the workshop's name through their session, not its settings.
  router.get('/workshop', requireRole('technician', 'manager'), async (_req, res) => {
    const workshop = await dataSource
      .getRepository(Workshop)
      .findOne({ where: { id: currentUser(res).workshopId } });
    if (!workshop) throw new NotFoundError('workshop');
    res.json({ workshop: { ...workshop, createdAt: workshop.createdAt.toISOString() } });
  });
  return router;
}
