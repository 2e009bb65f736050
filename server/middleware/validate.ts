import type { RequestHandler } from 'express';
import type { z } from 'zod';
import type { FieldError } from '../../shared/problem/problem.schema.js';
import { ValidationError } from '../lib/errors.js';

type Schemas = { body?: z.ZodType; query?: z.ZodType; params?: z.ZodType };

export function fieldErrors(error: z.ZodError, prefix?: string): FieldError[] {
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
      const result = schema.safeParse(raw);
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
