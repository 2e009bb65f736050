import type { FieldError } from '../../shared/problem/problem.schema.js';

/**
 * Typed errors thrown by services and middleware. The error middleware turns each into an
 * RFC 9457 problem response; anything else becomes a plain 500 with no internals.
 */
export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly slug: string,
    readonly title: string,
    readonly detail?: string,
    readonly errors?: FieldError[],
  ) {
    super(detail ?? title);
  }
}

export class ValidationError extends HttpError {
  constructor(errors: FieldError[], detail = 'Some fields need attention.') {
    super(400, 'validation-failed', 'The request has invalid fields', detail, errors);
  }
}

export class UnauthenticatedError extends HttpError {
  constructor(detail = 'Sign in to continue.') {
    super(401, 'unauthenticated', 'Not signed in', detail);
  }
}

export class ForbiddenError extends HttpError {
  constructor(detail = 'Your role does not allow this.') {
    super(403, 'forbidden', 'Not allowed', detail);
  }
}

export class NotFoundError extends HttpError {
  constructor(what: string, id?: string) {
    super(404, 'not-found', 'Not found', id ? `No ${what} with id ${id}.` : `No such ${what}.`);
  }
}

export class ConflictError extends HttpError {
  constructor(detail: string, errors?: FieldError[]) {
    super(409, 'conflict', 'Conflict', detail, errors);
  }
}

export class GoneError extends HttpError {
  constructor(detail: string) {
    super(410, 'gone', 'No longer available', detail);
  }
}
