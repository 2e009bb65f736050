import { Router } from 'express';
import type { DataSource } from 'typeorm';
import type { Clock } from '../../lib/clock.js';
import type { Outbox } from '../mail/outbox.js';
import { ServiceDueService } from '../reminders/service-due.service.js';
import { serviceDueRouter } from '../reminders/service-due.router.js';
import { CertificateStore } from '../signoff/certificate-store.js';
import { SignOffService } from '../signoff/signoff.service.js';
import { signOffRouter } from '../signoff/signoff.router.js';
import { BoardService } from './board.service.js';
import { ReadingsService } from './readings.service.js';
import { reviewRouter } from './review.router.js';
import { ReviewService } from './review.service.js';
import { RunSummaries } from './run-summaries.js';

export interface ReviewDeps {
  dataSource: DataSource;
  clock: Clock;
  outbox: Outbox;
  /** Certificates are written under `<dataDir>/certificates`. */
  dataDir: string;
}

/** The workshop's side of a run once it is logged: board, review, sign-off, certificates, service due. */
export function reviewRoutes({ dataSource, clock, outbox, dataDir }: ReviewDeps): Router {
  const summaries = new RunSummaries(dataSource);
  const router = Router();
  router.use(
    reviewRouter(
      new BoardService(dataSource, summaries, clock),
      new ReviewService(dataSource, clock),
      new ReadingsService(dataSource),
    ),
  );
  router.use(
    signOffRouter(new SignOffService(dataSource, clock, outbox, new CertificateStore(dataDir))),
  );
  router.use(serviceDueRouter(new ServiceDueService(dataSource, summaries, clock)));
  return router;
}
