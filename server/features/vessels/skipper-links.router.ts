import { Router } from 'express';
import { SkipperLinkParamsSchema } from '../../../shared/vessels/vessel.schema.js';
import { currentUser, requireRole } from '../../middleware/require-role.js';
import { validate } from '../../middleware/validate.js';
import type { SkipperLinksService } from './skipper-links.service.js';

const staff = requireRole('technician', 'manager');

/** Which skippers a vessel's records are shared with: the staff's list of skippers, linking one and unlinking one. */
export function skipperLinksRouter(links: SkipperLinksService): Router {
  const router = Router();

  router.get('/skippers', staff, async (_req, res) => {
    res.json({ skippers: await links.listSkippers(currentUser(res)) });
  });

  router.put(
    '/vessels/:id/skippers/:userId',
    staff,
    validate({ params: SkipperLinkParamsSchema }),
    async (req, res) => {
      res.json({
        vessel: await links.link(
          currentUser(res),
          String(req.params.id),
          String(req.params.userId),
        ),
      });
    },
  );

  router.delete(
    '/vessels/:id/skippers/:userId',
    staff,
    validate({ params: SkipperLinkParamsSchema }),
    async (req, res) => {
      res.json({
        vessel: await links.unlink(
          currentUser(res),
          String(req.params.id),
          String(req.params.userId),
        ),
      });
    },
  );

  return router;
}
