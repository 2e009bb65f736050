import { z } from 'zod/mini';
import '../zod-english';

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
  status: z.number().check(z.int()),
  detail: z.optional(z.string()),
  instance: z.optional(z.string()),
  errors: z.optional(z.array(FieldErrorSchema)),
});
export type Problem = z.infer<typeof ProblemSchema>;
