import { z } from 'zod';

/** `:id` of every /api/runs/:id/… route. */
export const RunIdParamsSchema = z.object({
  id: z.uuid({ error: 'The run id in the address is not valid.' }),
});
