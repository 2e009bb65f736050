import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { z } from 'zod';
import { FirstServiceInputSchema } from '../../../shared/service/service-record.schema.js';
import type { Clock } from '../../lib/clock.js';
import { currentUser, requireRole } from '../../middleware/require-role.js';
import { validate } from '../../middleware/validate.js';
import type { RunSummaries } from '../review/run-summaries.js';
import { EngineRecordService } from './engine-record.service.js';
import { ServiceRecordsService } from './service-records.service.js';

const EngineParamsSchema = z.object({
  id: z.uuid({ error: 'The engine id in the address is not valid.' }),
});

/** The workshop's side of the engine's record: its runs, and the first service done. */
export function engineRecordRouter(
  dataSource: DataSource,
  summaries: RunSummaries,
  clock: Clock,
): Router {
  const router = Router();
  const staff = requireRole('technician', 'manager');
  const params = validate({ params: EngineParamsSchema });
  const records = new EngineRecordService(dataSource, summaries);
  const services = new ServiceRecordsService(dataSource, clock);

  router.get('/engines/:id/record', staff, params, async (req, res) => {
    res.json({ runs: await records.runs(currentUser(res), String(req.params.id)) });
  });

  router.post(
    '/engines/:id/services',
    staff,
    params,
    validate({ body: FirstServiceInputSchema }),
    async (req, res) => {
      const service = await services.recordFirst(currentUser(res), String(req.params.id), req.body);
      res.status(201).json({ service });
    },
  );

  return router;
}
