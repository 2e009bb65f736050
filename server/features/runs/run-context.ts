import { In, IsNull, type DataSource } from 'typeorm';
import type { SessionUser } from '../../../shared/auth/auth.schema.js';
import type { ResolvedPhase } from '../../../shared/programs/resolve-band.js';
import {
  calendarDateIn,
  engineHoursNow,
  firstServiceView,
  type FirstServiceView,
} from '../../../shared/review/first-service.js';
import { frozenPhases } from '../../../shared/review/frozen-phases.js';
import type { PhaseChart } from '../../../shared/review/chart-series.js';
import type { RunAccount } from '../../../shared/runs/run-accounting.js';
import { visibleRun } from './run-access.js';
import { Run } from './run.entity.js';
import { User } from '../users/user.entity.js';
import type { Engine } from '../vessels/engine.entity.js';
import { VesselSkipper } from '../vessels/vessel-skipper.entity.js';
import { Vessel } from '../vessels/vessel.entity.js';
import { Workshop } from '../workshops/workshop.entity.js';
import { computeRunFigures, type RunFigures, type RunFiguresCache } from './run-figures.js';

/** A run with everything the review, the sign-off and the certificate read about it. */
export interface RunContext {
  run: Run;
  engine: Engine;
  vessel: Vessel;
  workshop: Workshop;
  skippers: Array<{ id: string; name: string; email: string }>;
  phases: ResolvedPhase[];
  account: RunAccount;
  charts: PhaseChart[];
  /** The rest of what the events give: the log, counts, the newest hour meter. */
  figures: Pick<RunFigures, 'events' | 'eventsTotal' | 'readingCount' | 'voidedCount'>;
  firstService: FirstServiceView | null;
}

export async function skippersOf(dataSource: DataSource, vesselId: string) {
  const links = await dataSource.getRepository(VesselSkipper).find({ where: { vesselId } });
  if (links.length === 0) return [];
  const users = await dataSource.getRepository(User).find({
    where: { id: In(links.map((l) => l.userId)), archivedAt: IsNull() },
    order: { name: 'ASC' },
  });
  return users.map((u) => ({ id: u.id, name: u.name, email: u.email }));
}

/** The run with its figures: from `cache` when given (the review page), worked out afresh otherwise (a sign-off). */
export async function loadRunContext(
  dataSource: DataSource,
  user: SessionUser,
  runId: string,
  now: Date,
  cache?: RunFiguresCache,
): Promise<RunContext> {
  const run = await visibleRun(dataSource, user, runId);
  const engine = run.engine!;
  const vessel = await dataSource.getRepository(Vessel).findOneByOrFail({ id: run.vesselId });
  const workshop = await dataSource.getRepository(Workshop).findOneByOrFail({ id: run.workshopId });
  const phases = frozenPhases(run.program, run.bands, run.rerunFrom);
  const figures = cache
    ? await cache.get(run, phases)
    : await computeRunFigures(dataSource, run, phases);
  return {
    run,
    engine,
    vessel,
    workshop,
    phases,
    account: figures.account,
    charts: figures.charts,
    figures,
    skippers: await skippersOf(dataSource, vessel.id),
    firstService: firstServiceOf(
      run,
      engine,
      figures.meter,
      figures.account.sessionMs,
      calendarDateIn(workshop.timezone, now),
    ),
  };
}

function firstServiceOf(
  run: Run,
  engine: Engine,
  meter: { hourMeter: number } | null,
  sessionMs: number,
  today: string,
): FirstServiceView | null {
  if (engine.hourMeterAtCommissioning === null || engine.commissionedOn === null) return null;
  const hours = engineHoursNow(engine.hourMeterAtCommissioning, meter, sessionMs);
  return firstServiceView(
    { hourMeter: engine.hourMeterAtCommissioning, date: engine.commissionedOn },
    run.program.firstService,
    hours,
    today,
  );
}
