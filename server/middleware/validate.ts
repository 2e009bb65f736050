import type { RequestHandler } from 'express';
import { z } from 'zod';
import type { FieldError } from '../../shared/problem/problem.schema.js';
import { ValidationError } from '../lib/errors.js';

/** Classic and zod/mini schemas alike (the deck-path schemas in shared/ are on zod/mini). */
type Schemas = { body?: z.core.$ZodType; query?: z.core.$ZodType; params?: z.core.$ZodType };

export function fieldErrors(error: z.core.$ZodError, prefix?: string): FieldError[] {
  return error.issues.map((issue) => ({
    field: [prefix, ...issue.path.map(String)].filter(Boolean).join('.') || '(request)',
    message: issue.message,
  }));
}

/**
 * Checks body, query and params against the shared zod schemas at the edge. The parsed values
 * replace the raw ones (`req.body`, `res.locals.query`, `req.params`), so handlers only see checked data.
 */
export function validate(schemas: Schemas): RequestHandler {
  return (req, res, next) => {
    const errors: FieldError[] = [];
    for (const part of ['params', 'query', 'body'] as const) {
      const schema = schemas[part];
      if (!schema) continue;
      const raw = part === 'body' && req.body === undefined ? {} : req[part];
      const result = z.safeParse(schema, raw);
      if (!result.success) {
        errors.push(...fieldErrors(result.error, part === 'body' ? undefined : part));
        continue;
      }
      if (part === 'query') res.locals.query = result.data;
      else if (part === 'params') req.params = result.data as typeof req.params;
      else req.body = result.data;
    }
    if (errors.length > 0) throw new ValidationError(errors);
    next();
  };
}
