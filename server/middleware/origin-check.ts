import type { RequestHandler } from 'express';
import { verifyRequestOrigin } from 'lucia';
import { HttpError } from '../lib/errors.js';

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * Cross-site request forgery guard: a state-changing request must carry an Origin header naming
 * this server (or the configured public origin). Browsers always send Origin on such requests.
 */
export function originCheck(publicOrigin?: string): RequestHandler {
  return (req, _res, next) => {
    if (SAFE_METHODS.has(req.method)) return next();
    const origin = req.get('origin');
    const allowed = [req.get('host') ?? '', publicOrigin ? new URL(publicOrigin).host : ''].filter(
      Boolean,
    );
    if (!origin) {
      throw new HttpError(
        403,
        'origin-missing',
        'Origin header missing',
        'State-changing requests must come from the Ringseat app (no Origin header was sent).',
      );
    }
    if (!verifyRequestOrigin(origin, allowed)) {
      throw new HttpError(
        403,
        'origin-mismatch',
        'Request from another site',
        `Requests from ${origin} are not accepted.`,
      );
    }
    next();
  };
}
