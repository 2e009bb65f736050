import { Router } from 'express';
import { BoardQuerySchema, type BoardQuery } from '../../../shared/review/review.schema.js';
import { currentUser, requireRole } from '../../middleware/require-role.js';
import { validate } from '../../middleware/validate.js';
import type { BoardService } from './board.service.js';

/** The workshop's runs board: every run, the ones needing action first. */
export function boardRouter(board: BoardService): Router {
  const router = Router();

  router.get(
    '/board',
    requireRole('technician', 'manager'),
    validate({ query: BoardQuerySchema }),
    async (_req, res) => {
      res.json(await board.board(currentUser(res), res.locals.query as BoardQuery));
    },
  );

  return router;
}
