import { z } from 'zod';

export const VESSEL_TYPES = [
  'workboat',
  'sport-fishing',
  'sailing-yacht',
  'motor-yacht',
  'rib',
  'runabout',
  'other',
] as const;
export const VesselTypeSchema = z.enum(VESSEL_TYPES, {
  error: 'Choose the vessel type from the list.',
});
export type VesselType = z.infer<typeof VesselTypeSchema>;

export const VesselInputSchema = z.object({
  name: z
    .string({ error: 'Enter the vessel name.' })
    .trim()
    .min(1, { error: 'Enter the vessel name.' })
    .max(80),
  /** Hull identification number: 12 to 14 letters and digits (ISO 10087 format, from memory); optional. */
  hin: z
    .string()
    .trim()
    .toUpperCase()
    .max(20)
    .refine((v) => v === '' || /^[A-Z0-9-]{12,17}$/.test(v), {
      error: 'A HIN has 12 to 14 letters and digits.',
    })
    .default(''),
  type: VesselTypeSchema,
  lengthM: z
    .number({ error: 'Length must be a number of metres.' })
    .positive({ error: 'Length must be above 0 m.' })
    .max(100, { error: 'Length must be at most 100 m.' })
    .nullable()
    .default(null),
  homePort: z.string().trim().max(80).default(''),
});
export type VesselInput = z.infer<typeof VesselInputSchema>;

/** Which records a list shows: the ones in use, the archived ones, or both. */
export const ListStatusSchema = z.enum(['active', 'archived', 'all'], {
  error: 'The status filter (status) must be active, archived or all.',
});
export type ListStatus = z.infer<typeof ListStatusSchema>;

export const VesselListQuerySchema = z.object({
  /** Matches name, HIN, home port, skipper, engine maker/model/serial. */
  q: z
    .string({ error: 'The search text (q) must be text.' })
    .trim()
    .max(80, { error: 'The search text (q) can have at most 80 characters.' })
    .default(''),
  status: ListStatusSchema.default('active'),
});
export type VesselListQuery = z.infer<typeof VesselListQuerySchema>;

export const SkipperLinkParamsSchema = z.object({
  id: z.uuid({ error: 'The vessel id in the address is not valid.' }),
  userId: z.uuid({ error: 'The skipper id in the address is not valid.' }),
});
