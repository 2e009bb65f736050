import { STORAGE_CODES } from '../lib/write-status.js';
import type { ErrorRequestHandler, RequestHandler } from 'express';
import type { Problem } from '../../shared/problem/problem.schema.js';
import { HttpError } from '../lib/errors.js';
import type { Logger } from '../lib/logger.js';
import { redactUrl } from '../lib/redact-url.js';

function send(res: Parameters<RequestHandler>[1], problem: Problem) {
  res.status(problem.status).type('application/problem+json').json(problem);
}

export function problemFrom(error: HttpError, instance?: string): Problem {
  return {
    type: `/problems/${error.slug}`,
    title: error.title,
    status: error.status,
    ...(error.detail ? { detail: error.detail } : {}),
    ...(instance ? { instance } : {}),
    ...(error.errors ? { errors: error.errors } : {}),
  };
}

/** Errors raised by body-parser carry `type`; map the ones a client can cause to plain 4xx answers. */
function fromBodyParser(error: {
  type?: string;
  status?: number;
  limit?: number;
}): HttpError | null {
  if (error.type === 'entity.too.large') {
    return new HttpError(
      413,
      'body-too-large',
      'Request body too large',
      `The request body is larger than the limit of ${error.limit} bytes.`,
    );
  }
  if (error.type === 'entity.parse.failed') {
    return new HttpError(
      400,
      'malformed-json',
      'Malformed JSON',
      'The request body is not valid JSON.',
    );
  }
  if (error.type && error.status && error.status >= 400 && error.status < 500) {
    return new HttpError(
      error.status,
      'bad-request',
      'Bad request',
      'The request body could not be read.',
    );
  }
  return null;
}

/**
 * Errors Express and its body reading raise with a 4xx status but no body-parser type: a
 * malformed percent-escape in the address, a body that does not decompress as its
 * Content-Encoding says.
 */
function fromRequestReading(error: { name?: string; status?: number }): HttpError | null {
  if (!error.status || error.status < 400 || error.status >= 500) return null;
  if (error.name === 'URIError')
    return new HttpError(
      400,
      'malformed-address',
      'Malformed address',
      'The address has a malformed percent-escape (a % not followed by two hexadecimal digits).',
    );
  return new HttpError(
    error.status,
    'bad-request',
    'Bad request',
    'The request could not be read: check its Content-Encoding and body.',
  );
}

export function errorHandler(logger: Logger): ErrorRequestHandler {
  return (error, req, res, _next) => {
    const known =
      error instanceof HttpError
        ? error
        : (fromBodyParser(error ?? {}) ?? fromRequestReading(error ?? {}));
    if (known) {
      send(res, problemFrom(known, req.originalUrl));
      return;
    }
    logger.error({ err: error, url: redactUrl(req.originalUrl) }, 'unhandled error');
    if (STORAGE_CODES.test(String(error?.code ?? ''))) {
      send(res, {
        type: '/problems/storage-failing',
        title: 'The server cannot write to its storage',
        status: 503,
        detail: 'Nothing from this request was saved. Your device keeps it and tries again.',
      });
      return;
    }
    // Never a stack trace or internal message to the client.
    send(res, {
      type: '/problems/internal',
      title: 'Something went wrong on the server',
      status: 500,
      detail: 'The error has been logged. Try again; if it persists, tell your workshop.',
    });
  };
}

export const apiNotFound: RequestHandler = (req, res) => {
  send(res, {
    type: '/problems/no-such-route',
    title: 'No such API route',
    status: 404,
    detail: `${req.method} ${req.originalUrl} is not part of the Ringseat API.`,
  });
};
