import { randomUUID } from 'node:crypto';
import type { EntityManager } from 'typeorm';
import type { ResolvedPhase } from '../../shared/programs/resolve-band.js';
import { phaseCharts } from '../../shared/review/chart-series.js';
import {
  calendarDateIn,
  engineHoursNow,
  firstServiceView,
} from '../../shared/review/first-service.js';
import { orderEvents } from '../../shared/runs/event-order.js';
import { accountOrdered } from '../../shared/runs/run-accounting.js';
import type { RunEvent } from '../../shared/runs/run-event.schema.js';
import type { RunContext } from '../features/runs/run-context.js';
import type { Run } from '../features/runs/run.entity.js';
import { certificateContent } from '../features/signoff/certificate-content.js';
import {
  addReview,
  insertCertificate,
  nextCertificateNumber,
  recordSignOff,
} from '../features/signoff/signoff-records.js';
import type { User } from '../features/users/user.entity.js';
import type { Engine } from '../features/vessels/engine.entity.js';
import type { Vessel } from '../features/vessels/vessel.entity.js';
import type { Workshop } from '../features/workshops/workshop.entity.js';

export interface SignedOffInput {
  run: Run;
  engine: Engine;
  vessel: Vessel;
  workshop: Workshop;
  skippers: User[];
  technician: User;
  phases: ResolvedPhase[];
  events: RunEvent[];
  at: Date;
  comments: string;
}

/**
 * The decision and the certificate record of the demo's signed-off run, written by the same
 * functions as a real sign-off from the same accounting and content builder. The PDF is written
 * when the server starts (the demo data is added before the data folder is known).
 */
export async function addDemoSignOff(manager: EntityManager, input: SignedOffInput): Promise<void> {
  const { technician, at, comments } = input;
  const ctx = signedOffContext(input);
  const number = await nextCertificateNumber(manager, ctx, at);
  const content = certificateContent(ctx, ctx.charts, {
    number,
    issuedAt: at,
    comments,
    technician: { name: technician.name, role: technician.role },
  });
  await addReview(
    manager,
    ctx,
    technician,
    { decision: 'confirmed', comments, rerunPhaseIds: [] },
    at,
  );
  await insertCertificate(manager, ctx, {
    id: randomUUID(),
    number,
    issuedAt: at,
    issuedById: technician.id,
    content,
    stored: null,
  });
  await recordSignOff(manager, ctx, technician, at, { comments, number });
}

/** The run as the review page would load it at the moment of sign-off. */
function signedOffContext(input: SignedOffInput): RunContext {
  const { run, engine, workshop, at } = input;
  const ordered = orderEvents(input.events, engine.id);
  const { account } = accountOrdered(ordered, input.phases);
  const meter = [...ordered]
    .reverse()
    .find((e) => e.kind === 'reading' && e.hourMeter !== undefined);
  const hours = engineHoursNow(
    engine.hourMeterAtCommissioning ?? 0,
    meter?.kind === 'reading' ? { hourMeter: meter.hourMeter! } : null,
    account.sessionMs,
  );
  const firstService = firstServiceView(
    { hourMeter: engine.hourMeterAtCommissioning ?? 0, date: engine.commissionedOn ?? '' },
    run.program.firstService,
    hours,
    calendarDateIn(workshop.timezone, at),
  );
  const charts = phaseCharts(ordered, input.phases, account);
  return {
    run,
    engine,
    vessel: input.vessel,
    workshop,
    phases: input.phases,
    account,
    charts,
    firstService,
    figures: {
      events: [],
      eventsTotal: 0,
      readingCount: charts.reduce((n, c) => n + c.readingCount, 0),
      voidedCount: 0,
    },
    skippers: input.skippers.map((s) => ({ id: s.id, name: s.name, email: s.email })),
  };
}
