import { z } from 'zod';

/** RFC 9457 problem details, as every non-2xx answer of the API carries them. */
export const FieldErrorSchema = z.object({
  /** Dotted path of the field, e.g. `phases.2.rpmMax`. */
  field: z.string(),
  message: z.string(),
});
export type FieldError = z.infer<typeof FieldErrorSchema>;

export const ProblemSchema = z.object({
  type: z.string(),
  title: z.string(),
  status: z.number().int(),
  detail: z.string().optional(),
  instance: z.string().optional(),
  errors: z.array(FieldErrorSchema).optional(),
});
export type Problem = z.infer<typeof ProblemSchema>;
