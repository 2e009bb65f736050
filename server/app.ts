import 'reflect-metadata';
import fs from 'node:fs';
import path from 'node:path';
import express, { type Express } from 'express';
import helmet from 'helmet';
import { pinoHttp } from 'pino-http';
import type { DataSource } from 'typeorm';
import { authRouter, type SignInLimit } from './features/auth/auth.router.js';
import { AuthService } from './features/auth/auth.service.js';
import { createLucia } from './features/auth/lucia.js';
import { healthRouter } from './features/health/health.router.js';
import { UsersService } from './features/users/users.service.js';
import { usersRouter } from './features/users/users.router.js';
import { workshopsRouter } from './features/workshops/workshops.router.js';
import { ProgramsService } from './features/programs/programs.service.js';
import { programsRouter } from './features/programs/programs.router.js';
import { RunsService } from './features/runs/runs.service.js';
import { runsRouter } from './features/runs/runs.router.js';
import { SyncService } from './features/sync/sync.service.js';
import { syncRouter } from './features/sync/sync.router.js';
import { VesselsService } from './features/vessels/vessels.service.js';
import { vesselsRouter } from './features/vessels/vessels.router.js';
import { EnginesService } from './features/vessels/engines.service.js';
import { enginesRouter } from './features/vessels/engines.router.js';
import { SkipperLinksService } from './features/vessels/skipper-links.service.js';
import { ChecklistsService } from './features/checklists/checklists.service.js';
import { checklistsRouter } from './features/checklists/checklists.router.js';
import { AttachmentStorage } from './features/attachments/attachment-storage.js';
import { AttachmentsService } from './features/attachments/attachments.service.js';
import { attachmentsRouter } from './features/attachments/attachments.router.js';
import { loadConfig } from './lib/config.js';
import { devMailRouter } from './features/mail/dev-mail.router.js';
import type { MailCatcher } from './features/mail/mail-catcher.js';
import { Outbox } from './features/mail/outbox.js';
import { reviewRoutes } from './features/review/review-routes.js';
import type { Mailer } from './lib/mailer.js';
import { systemClock, type Clock } from './lib/clock.js';
import type { Logger } from './lib/logger.js';
import { apiNotFound, errorHandler } from './middleware/error-handler.js';
import { originCheck } from './middleware/origin-check.js';
import { loadSession } from './middleware/session.js';

export type AppDeps = {
  dataSource: DataSource;
  logger: Logger;
  clock?: Clock;
  /** Built client (dist/client); when absent the API is served alone. */
  clientDir?: string;
  /** Public origin (https://…) when behind a proxy; also decides Secure cookies. */
  publicOrigin?: string;
  signInLimit?: SignInLimit;
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
  const clock = deps.clock ?? systemClock;
  const secure = deps.publicOrigin?.startsWith('https://') ?? false;
  const lucia = createLucia(deps.dataSource, { secureCookies: secure });
  const auth = new AuthService(deps.dataSource, lucia, clock);

  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', 'loopback');
  app.use(
    helmet({
      strictTransportSecurity: secure,
      contentSecurityPolicy: {
        directives: {
          'img-src': ["'self'", 'data:', 'blob:'],
          // On plain http (a laptop on the workshop LAN) upgrading would break every request.
          'upgrade-insecure-requests': secure ? [] : null,
        },
      },
    }),
  );
  app.use(
    pinoHttp({
      logger: deps.logger,
      autoLogging: { ignore: (req) => !req.url?.startsWith('/api') },
      serializers: {
        req: (req) => ({ method: req.method, url: req.url }),
        res: (res) => ({ status: res.statusCode }),
      },
    }),
  );

  const api = express.Router();
  // Sync batches are larger than anything else: that route parses its own body with its own limit.
  const json = express.json({ limit: deps.jsonLimit ?? '100kb' });
  api.use((req, res, next) => (req.path === '/sync/push' ? next() : json(req, res, next)));
  api.use(originCheck(deps.publicOrigin));
  api.use(loadSession(lucia));
  api.use(healthRouter(deps.dataSource));
  api.use(
    '/auth',
    authRouter(auth, lucia, deps.signInLimit ?? { windowMs: 15 * 60_000, limit: 10 }),
  );
  const outbox = new Outbox(deps.mailer ?? null, deps.logger);
  api.use(usersRouter(new UsersService(deps.dataSource, clock), auth, deps.publicOrigin, outbox));
  const vessels = new VesselsService(deps.dataSource, clock);
  api.use(vesselsRouter(vessels, new SkipperLinksService(deps.dataSource, vessels)));
  api.use(enginesRouter(new EnginesService(deps.dataSource, clock)));
  api.use(checklistsRouter(new ChecklistsService(deps.dataSource, clock)));
  const storage = new AttachmentStorage(deps.dataDir ?? loadConfig().dataDir);
  api.use(attachmentsRouter(new AttachmentsService(deps.dataSource, storage), storage));
  api.use(syncRouter(new SyncService(deps.dataSource, clock, vessels)));
  api.use(workshopsRouter(deps.dataSource));
  api.use(programsRouter(new ProgramsService(deps.dataSource, clock)));
  api.use(runsRouter(new RunsService(deps.dataSource)));
  api.use(
    reviewRoutes({
      dataSource: deps.dataSource,
      clock,
      outbox,
      dataDir: deps.dataDir ?? loadConfig().dataDir,
    }),
  );
  api.use(apiNotFound);
  app.use('/api', api);
  if (deps.mailbox) app.use('/dev/mail', devMailRouter(deps.mailbox, loadSession(lucia)));

  if (deps.clientDir && fs.existsSync(path.join(deps.clientDir, 'index.html')))
    serveClient(app, deps.clientDir);
  app.use(errorHandler(deps.logger));
  return app;
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
