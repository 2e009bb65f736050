import path from 'node:path';
import type { DataSource } from 'typeorm';
import type { NativeDb } from '../../lib/native-sql.js';
import type { ResolvedPhase } from '../../../shared/programs/resolve-band.js';
import { phaseCharts, type PhaseChart } from '../../../shared/review/chart-series.js';
import type { LoggedEvent, VoidedMark } from '../../../shared/review/views.js';
import { orderEvents } from '../../../shared/runs/event-order.js';
import { accountOrdered, type RunAccount } from '../../../shared/runs/run-accounting.js';
import type { RunEvent } from '../../../shared/runs/run-event.schema.js';
import type { Run } from './run.entity.js';
import { figuresWorker } from './figures-worker.js';
import { countRunEvents, latestHourMeters, loadRunEvents } from './run-events.js';
import { voidMarks } from './run-voids.js';

/** Plenty for any honest run; a device stuck raising alerts should not swamp the page. */
const MAX_LISTED_EVENTS = 1000;

/** Everything worked out from a run's events: the accounting, the charts and the log. */
export interface RunFigures {
  eventCount: number;
  /** The phases these figures were worked out against (a return sets when phases count from). */
  phases: ResolvedPhase[];
  account: RunAccount;
  charts: PhaseChart[];
  events: LoggedEvent[];
  eventsTotal: number;
  readingCount: number;
  /** Entries (readings and notes) taken back. */
  voidedCount: number;
  meter: { hourMeter: number; at: number } | null;
}

function loggedEvents(
  ordered: readonly RunEvent[],
  voided: ReadonlyMap<string, VoidedMark>,
): { events: LoggedEvent[]; total: number } {
  const events: LoggedEvent[] = [];
  for (const e of ordered) {
    // Readings are in the readings table; a void shows as the mark on the entry it names.
    if (e.kind === 'reading' || e.kind === 'void') continue;
    if (e.kind === 'phase-advance')
      events.push({ kind: e.kind, id: e.id, at: e.at, phaseId: e.phaseId });
    else if (e.kind === 'alert')
      events.push({
        kind: e.kind,
        id: e.id,
        at: e.at,
        phaseId: e.phaseId ?? null,
        code: e.code,
        message: e.message,
      });
    else if (e.kind === 'note')
      events.push({
        kind: e.kind,
        id: e.id,
        at: e.at,
        text: e.text,
        voided: voided.get(e.id) ?? null,
      });
    else events.push({ kind: e.kind, id: e.id, at: e.at });
  }
  return { events: events.slice(-MAX_LISTED_EVENTS), total: events.length };
}

export async function computeRunFigures(
  dataSource: NativeDb,
  run: Pick<Run, 'id' | 'engineId'>,
  phases: ResolvedPhase[],
): Promise<RunFigures> {
  const { events } = (await loadRunEvents(dataSource, [run.id])).get(run.id)!;
  const ordered = orderEvents(events, run.engineId);
  const { account } = accountOrdered(ordered, phases);
  const charts = phaseCharts(ordered, phases, account);
  const voided = voidMarks(dataSource, run.id);
  const logged = loggedEvents(ordered, voided);
  return {
    eventCount: events.length,
    phases,
    account,
    charts,
    events: logged.events,
    eventsTotal: logged.total,
    readingCount: charts.reduce((n, c) => n + c.readingCount, 0),
    voidedCount: voided.size,
    meter: (await latestHourMeters(dataSource, [run.id])).get(run.id) ?? null,
  };
}

/**
 * The figures of the runs looked at lately, kept while their events do not change. Events are
 * only ever added, so an unchanged count means unchanged figures (counting uses the run's index
 * and costs a millisecond). New figures are worked out in the figures thread, off the event
 * loop, and requests for the same run and count share one working-out; with no database file
 * (an in-memory database) or no thread, they are worked out here.
 */
export class RunFiguresCache {
  private readonly kept = new Map<string, RunFigures>();
  private readonly working = new Map<string, { key: string; figures: Promise<RunFigures> }>();
  private readonly databasePath: string | null;

  constructor(
    private readonly dataSource: DataSource,
    private readonly capacity = 16,
  ) {
    const file = String(dataSource.options.database ?? ':memory:');
    this.databasePath = file === ':memory:' ? null : path.resolve(file);
  }

  async get(run: Run, phases: ResolvedPhase[]): Promise<RunFigures> {
    const count = countRunEvents(this.dataSource, run.id);
    const hit = this.kept.get(run.id);
    // A return changes how the run counts without a new event: the phases say so.
    if (hit && hit.eventCount >= count && samePhases(hit.phases, phases)) {
      this.kept.delete(run.id);
      this.kept.set(run.id, hit);
      return hit;
    }
    const key = `${count}|${phases.map((p) => p.countsFromMs).join(',')}`;
    const underway = this.working.get(run.id);
    if (underway?.key === key) return underway.figures;
    const figures = this.workOut(run, phases);
    this.working.set(run.id, { key, figures });
    try {
      const done = await figures;
      this.keep(run.id, done);
      return done;
    } finally {
      if (this.working.get(run.id)?.figures === figures) this.working.delete(run.id);
    }
  }

  private workOut(run: Run, phases: ResolvedPhase[]): Promise<RunFigures> {
    const here = () => computeRunFigures(this.dataSource, run, phases);
    if (!this.databasePath) return here();
    const { id, engineId } = run;
    return figuresWorker.compute(this.databasePath, { id, engineId }, phases).catch(here);
  }

  private keep(runId: string, figures: RunFigures) {
    this.kept.delete(runId);
    this.kept.set(runId, figures);
    if (this.kept.size > this.capacity) this.kept.delete(this.kept.keys().next().value!);
  }
}

const samePhases = (a: readonly ResolvedPhase[], b: readonly ResolvedPhase[]) =>
  a.length === b.length && a.every((p, i) => p.countsFromMs === b[i].countsFromMs);
