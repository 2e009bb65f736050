import { Router } from 'express';
import { ReadingsQuerySchema, type ReadingsQuery } from '../../../shared/review/review.schema.js';
import { currentUser, requireRole } from '../../middleware/require-role.js';
import { validate } from '../../middleware/validate.js';
import { RunIdParamsSchema } from '../runs/run-params.js';
import type { ReadingsService } from './readings.service.js';
import type { ReviewService } from './review.service.js';

/** One run under review: the worked-out figures, its readings page by page, and all of them as CSV. */
export function reviewRouter(review: ReviewService, readings: ReadingsService): Router {
  const router = Router();

  router.get(
    '/runs/:id/review',
    requireRole(),
    validate({ params: RunIdParamsSchema }),
    async (req, res) => {
      res.json(await review.review(currentUser(res), String(req.params.id)));
    },
  );

  router.get(
    '/runs/:id/readings',
    requireRole(),
    validate({ params: RunIdParamsSchema, query: ReadingsQuerySchema }),
    async (req, res) => {
      const { offset, limit } = res.locals.query as ReadingsQuery;
      res.json(await readings.page(currentUser(res), String(req.params.id), offset, limit));
    },
  );

  router.get(
    '/runs/:id/readings.csv',
    requireRole(),
    validate({ params: RunIdParamsSchema }),
    async (req, res) => {
      const user = currentUser(res);
      const id = String(req.params.id);
      const fileName = await readings.csvFileName(user, id);
      res.setHeader('Content-Type', 'text/csv; charset=utf-8');
      res.setHeader('Cache-Control', 'no-store');
      res.attachment(fileName);
      await readings.exportCsv(user, id, (chunk) => res.write(chunk));
      res.end();
    },
  );

  return router;
}
