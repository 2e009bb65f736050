import { randomUUID } from 'node:crypto';
import type { EntityManager } from 'typeorm';
import type { ResolvedPhase } from '../../shared/programs/resolve-band.js';
import { phaseCharts } from '../../shared/review/chart-series.js';
import { certificateNumber, workshopInitials } from '../../shared/review/certificate-number.js';
import {
  calendarDateIn,
  engineHoursNow,
  firstServiceView,
} from '../../shared/review/first-service.js';
import { orderEvents } from '../../shared/runs/event-order.js';
import { accountOrdered } from '../../shared/runs/run-accounting.js';
import type { RunEvent } from '../../shared/runs/run-event.schema.js';
import { recordAudit } from '../features/audit/audit.service.js';
import type { RunContext } from '../features/runs/run-context.js';
import type { Run } from '../features/runs/run.entity.js';
import { certificateContent } from '../features/signoff/certificate-content.js';
import { certificateFilePath } from '../features/signoff/certificate-store.js';
import { Certificate } from '../features/signoff/certificate.entity.js';
import { RunReview } from '../features/signoff/run-review.entity.js';
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
 * The decision and the certificate record of the demo's signed-off run, made from the same
 * accounting and content builder as a real sign-off. The PDF is written when the server starts
 * (the demo data is added before the data folder is known).
 */
export async function addDemoSignOff(manager: EntityManager, input: SignedOffInput): Promise<void> {
  const { run, engine, workshop, technician, at } = input;
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
  const ctx: RunContext = {
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
    },
    skippers: input.skippers.map((s) => ({ id: s.id, name: s.name, email: s.email })),
  };
  const number = certificateNumber({
    initials: workshopInitials(workshop.name),
    year: at.getUTCFullYear(),
    sequence: 1,
  });
  const content = certificateContent(ctx, charts, {
    number,
    issuedAt: at,
    comments: input.comments,
    technician: { name: technician.name, role: technician.role },
  });
  const id = randomUUID();
  await manager.getRepository(RunReview).insert({
    id: randomUUID(),
    runId: run.id,
    workshopId: workshop.id,
    decision: 'confirmed',
    comments: input.comments,
    verdict: account.verdict,
    reviewerId: technician.id,
    reviewerName: technician.name,
    decidedAt: at,
  });
  await manager.getRepository(Certificate).insert({
    id,
    runId: run.id,
    workshopId: workshop.id,
    number,
    issuedAt: at,
    issuedById: technician.id,
    content,
    filePath: certificateFilePath(workshop.id, id),
    storedAt: null,
    byteSize: null,
  });
  const audit = {
    workshopId: workshop.id,
    recordType: 'run' as const,
    recordId: run.id,
    actor: { id: technician.id, name: technician.name },
    at,
  };
  await recordAudit(manager, { ...audit, action: 'run-signed-off', detail: input.comments });
  await recordAudit(manager, { ...audit, action: 'certificate-issued', detail: number });
}
