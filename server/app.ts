import 'reflect-metadata';
import fs from 'node:fs';
import path from 'node:path';
import express, { type Express, type Request, type RequestHandler, type Router } from 'express';
import helmet from 'helmet';
import { HttpError } from './lib/errors.js';
import { pinoHttp } from 'pino-http';
import type { DataSource } from 'typeorm';
import { AttachmentStorage } from './features/attachments/attachment-storage.js';
import { attachmentsRouter } from './features/attachments/attachments.router.js';
import { AttachmentsService } from './features/attachments/attachments.service.js';
import { loadSession } from './features/auth/load-session.js';
import { createLucia, type AppLucia } from './features/auth/lucia.js';
import {
  DEFAULT_SIGN_IN_LIMIT,
  SignInThrottle,
  type SignInLimit,
} from './features/auth/sign-in-throttle.js';
import { checklistsRouter } from './features/checklists/checklists.router.js';
import { ChecklistsService, checklistsOf } from './features/checklists/checklists.service.js';
import { healthRouter } from './features/health/health.router.js';
import { devMailRouter } from './features/mail/dev-mail.router.js';
import type { MailCatcher } from './features/mail/mail-catcher.js';
import { Outbox } from './features/mail/outbox.js';
import { programsRouter } from './features/programs/programs.router.js';
import { ProgramsService } from './features/programs/programs.service.js';
import { engineRecordRouter } from './features/reminders/engine-record.router.js';
import { serviceDueRouter } from './features/reminders/service-due.router.js';
import { ServiceDueService } from './features/reminders/service-due.service.js';
import { boardRouter } from './features/review/board.router.js';
import { BoardService } from './features/review/board.service.js';
import { ReadingsService } from './features/review/readings.service.js';
import { reviewRouter } from './features/review/review.router.js';
import { ReviewService } from './features/review/review.service.js';
import { forgetSummary, RunSummaries } from './features/review/run-summaries.js';
import { hasOpenRun, latestRunsOf } from './features/runs/run-access.js';
import { RunCancellation } from './features/runs/cancel-run.js';
import { runsRouter } from './features/runs/runs.router.js';
import { RunsService } from './features/runs/runs.service.js';
import { CertificateStore } from './features/signoff/certificate-store.js';
import { signOffRouter } from './features/signoff/signoff.router.js';
import { SignOffService } from './features/signoff/signoff.service.js';
import { syncRouter } from './features/sync/sync.router.js';
import { SyncService } from './features/sync/sync.service.js';
import { enginesRouter } from './features/vessels/engines.router.js';
import { EnginesService } from './features/vessels/engines.service.js';
import type { VesselRecordChecks } from './features/vessels/record-checks.js';
import { skipperLinksRouter } from './features/vessels/skipper-links.router.js';
import { SkipperLinksService } from './features/vessels/skipper-links.service.js';
import { vesselsRouter } from './features/vessels/vessels.router.js';
import { VesselsService } from './features/vessels/vessels.service.js';
import { workshopsRouter } from './features/workshops/workshops.router.js';
import { systemClock, type Clock } from './lib/clock.js';
import { loadConfig } from './lib/config.js';
import type { Logger } from './lib/logger.js';
import type { Mailer } from './lib/mailer.js';
import { redactUrl } from './lib/redact-url.js';
import { mountPeopleRoutes } from './people-routes.js';
import { apiNotFound, errorHandler } from './middleware/error-handler.js';
import { originCheck } from './middleware/origin-check.js';

export type AppDeps = {
  dataSource: DataSource;
  logger: Logger;
  clock?: Clock;
  /** Built client (dist/client); when absent the API is served alone. */
  clientDir?: string;
  /** Public origin (https://…) when behind a proxy; also decides Secure cookies. */
  publicOrigin?: string;
  signInLimit?: SignInLimit;
  /** The mail outbox shared with the server's mail worker; made from `mailer` when absent. */
  outbox?: Outbox;
  /** Express's `trust proxy`: which proxies' X-Forwarded-For to believe; none by default. */
  trustProxy?: string | number | false;
  /** Largest JSON body accepted by ordinary routes. */
  jsonLimit?: string;
  /** Folder for uploads (`<dataDir>/uploads`); defaults to RINGSEAT_DATA_DIR. */
  dataDir?: string;
  /** Where e-mail goes (an SMTP server or the local catcher); without one nothing is sent and callers say so. */
  mailer?: Mailer | null;
  /** The local catcher, read by the managers' /dev/mail page (outside production only). */
  mailbox?: MailCatcher;
};

/** Builds the Express app from its dependencies; `server/index.ts` listens, tests call it directly. */
export function createApp(deps: AppDeps): Express {
  const secure = deps.publicOrigin?.startsWith('https://') ?? false;
  const lucia = createLucia(deps.dataSource, { secureCookies: secure });
  const app = express();
  app.disable('x-powered-by');
  // X-Forwarded-For is believed only from the proxies the operator names (RINGSEAT_TRUST_PROXY).
  app.set('trust proxy', deps.trustProxy ?? false);
  app.use(securityHeaders(secure));
  app.use(requestLog(deps.logger));
  app.use('/api', apiRouter(deps, lucia));
  if (deps.mailbox) app.use('/dev/mail', devMailRouter(deps.mailbox, loadSession(lucia)));
  if (deps.clientDir && fs.existsSync(path.join(deps.clientDir, 'index.html')))
    serveClient(app, deps.clientDir);
  app.use(errorHandler(deps.logger));
  return app;
}

/** Every API route, mounted here and nowhere else, with the services each one uses. */
function apiRouter(deps: AppDeps, lucia: AppLucia): Router {
  const { dataSource: db, publicOrigin } = deps;
  const clock = deps.clock ?? systemClock;
  const dataDir = deps.dataDir ?? loadConfig().dataDir;
  const outbox = deps.outbox ?? new Outbox(db, deps.mailer ?? null, deps.logger, clock);
  const throttle = new SignInThrottle(db, deps.signInLimit ?? DEFAULT_SIGN_IN_LIMIT, clock);
  const api = express.Router();
  api.use(jsonBodies(deps.jsonLimit ?? '100kb'), originCheck(publicOrigin), loadSession(lucia));
  api.use(healthRouter(db));
  mountPeopleRoutes(api, { db, lucia, throttle, outbox, clock, publicOrigin });
  const recordChecks: VesselRecordChecks = { hasOpenRun, checklistsOf, latestRunsOf };
  const vessels = new VesselsService(db, recordChecks, clock);
  api.use(vesselsRouter(vessels));
  api.use(skipperLinksRouter(new SkipperLinksService(db, vessels)));
  api.use(enginesRouter(new EnginesService(db, recordChecks, clock)));
  api.use(checklistsRouter(new ChecklistsService(db, clock)));
  const storage = new AttachmentStorage(dataDir);
  api.use(attachmentsRouter(new AttachmentsService(db, storage), storage));
  api.use(syncRouter(new SyncService(db, clock, vessels)));
  api.use(workshopsRouter(db));
  api.use(programsRouter(new ProgramsService(db, clock)));
  api.use(runsRouter(new RunsService(db), new RunCancellation(db, clock)));
  const summaries = new RunSummaries(db);
  api.use(boardRouter(new BoardService(db, summaries, clock)));
  api.use(reviewRouter(new ReviewService(db, clock), new ReadingsService(db)));
  const store = new CertificateStore(dataDir);
  api.use(
    signOffRouter(
      new SignOffService(db, clock, outbox, store, (manager, runId) =>
        forgetSummary(manager, runId),
      ),
    ),
  );
  api.use(serviceDueRouter(new ServiceDueService(db, summaries, clock)));
  api.use(engineRecordRouter(db, summaries, clock));
  api.use(apiNotFound);
  return api;
}

/** Sync batches are larger than anything else: that route parses its own body with its own limit. */
/**
 * Bodies are JSON everywhere but the upload (multipart): a body of any other type is answered
 * 415 and changes nothing (it is never read as an empty body). The sync push reads its own JSON
 * with its larger limit.
 */
function jsonBodies(limit: string): RequestHandler {
  const json = express.json({ limit });
  return (req, res, next) => {
    const upload = req.path === '/attachments' && req.is('multipart/form-data');
    if (hasContent(req) && req.is(['application/json', '+json']) === false && !upload) {
      const type = req.headers['content-type'] ?? 'none';
      return next(
        new HttpError(
          415,
          'unsupported-media-type',
          'Unsupported media type',
          `Send the body as JSON (Content-Type: application/json); a body of type "${type}" is not read.`,
        ),
      );
    }
    return req.path === '/sync/push' ? next() : json(req, res, next);
  };
}

/** A body with bytes in it (an empty body, as a POST with nothing to say sends, is none). */
const hasContent = (req: Request) =>
  req.headers['transfer-encoding'] !== undefined || Number(req.headers['content-length'] ?? 0) > 0;

function securityHeaders(secure: boolean): RequestHandler {
  return helmet({
    strictTransportSecurity: secure,
    contentSecurityPolicy: {
      directives: {
        'img-src': ["'self'", 'data:', 'blob:'],
        // On plain http (a laptop on the workshop LAN) upgrading would break every request.
        'upgrade-insecure-requests': secure ? [] : null,
      },
    },
  });
}

function requestLog(logger: Logger): RequestHandler {
  return pinoHttp({
    logger,
    autoLogging: { ignore: (req) => !req.url?.startsWith('/api') },
    serializers: {
      req: (req) => ({ method: req.method, url: redactUrl(req.url) }),
      res: (res) => ({ status: res.statusCode }),
    },
  });
}

function serveClient(app: Express, clientDir: string) {
  app.use(
    express.static(clientDir, { index: false, maxAge: '1h', setHeaders: noCacheForEntryFiles }),
  );
  // Every other path is a client route: the app shell decides what to show.
  app.get('/{*splat}', (_req, res) => {
    res.setHeader('Cache-Control', 'no-cache');
    res.sendFile(path.join(clientDir, 'index.html'));
  });
}

/** Hashed assets may be cached; the shell and the service worker must always be revalidated. */
function noCacheForEntryFiles(res: express.Response, filePath: string) {
  const name = path.basename(filePath);
  if (
    name === 'index.html' ||
    name === 'sw.js' ||
    name.endsWith('.webmanifest') ||
    name === 'registerSW.js'
  ) {
    res.setHeader('Cache-Control', 'no-cache');
  } else if (filePath.includes(`${path.sep}assets${path.sep}`)) {
    res.setHeader('Cache-Control', 'public, max-age=31536000, immutable');
  }
}
