import { z } from 'zod';

/**
 * The first service as the workshop records it on the engine page. The same schema checks the
 * form and the request body; the rules that need the engine (not before commissioning, not below
 * its hour meter, not in the future) are the server's, answered on the same fields.
 */
export const FirstServiceInputSchema = z.object({
  date: z.iso.date({ error: 'Enter the date of the service (date) as YYYY-MM-DD.' }),
  hourMeter: z
    .number({ error: 'Enter the hour meter reading at the service (hourMeter) in hours.' })
    .nonnegative({ error: 'The hour meter reading (hourMeter) cannot be negative.' })
    .max(100_000, { error: 'The hour meter reading (hourMeter) must be at most 100,000 h.' }),
  doneBy: z
    .string({ error: 'Enter who did the service (doneBy).' })
    .trim()
    .min(1, { error: 'Enter who did the service (doneBy).' })
    .max(120, { error: 'Who did the service (doneBy) can have at most 120 characters.' }),
  notes: z
    .string({ error: 'The notes (notes) must be text.' })
    .trim()
    .max(2000, { error: 'The notes (notes) can have at most 2,000 characters.' })
    .default(''),
});
export type FirstServiceInput = z.infer<typeof FirstServiceInputSchema>;
/** What the form holds before the defaults are filled in. */
export type FirstServiceFormInput = z.input<typeof FirstServiceInputSchema>;

export const FIRST_SERVICE_FIELDS = ['date', 'hourMeter', 'doneBy', 'notes'] as const;
