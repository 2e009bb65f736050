import type { DataSource } from 'typeorm';
import type { ResolvedPhase } from '../../../shared/programs/resolve-band.js';
import { phaseCharts, type PhaseChart } from '../../../shared/review/chart-series.js';
import type { LoggedEvent } from '../../../shared/review/views.js';
import { orderEvents } from '../../../shared/runs/event-order.js';
import { accountOrdered, type RunAccount } from '../../../shared/runs/run-accounting.js';
import type { RunEvent } from '../../../shared/runs/run-event.schema.js';
import type { Run } from './run.entity.js';
import { countRunEvents, latestHourMeters, loadRunEvents } from './run-events.js';

/** Plenty for any honest run; a device stuck raising alerts should not swamp the page. */
const MAX_LISTED_EVENTS = 1000;

/** Everything worked out from a run's events: the accounting, the charts and the log. */
export interface RunFigures {
  eventCount: number;
  account: RunAccount;
  charts: PhaseChart[];
  events: LoggedEvent[];
  eventsTotal: number;
  readingCount: number;
  meter: { hourMeter: number; at: number } | null;
}

function loggedEvents(ordered: readonly RunEvent[]): { events: LoggedEvent[]; total: number } {
  const events: LoggedEvent[] = [];
  for (const e of ordered) {
    if (e.kind === 'reading') continue;
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
    else if (e.kind === 'note') events.push({ kind: e.kind, id: e.id, at: e.at, text: e.text });
    else events.push({ kind: e.kind, id: e.id, at: e.at });
  }
  return { events: events.slice(-MAX_LISTED_EVENTS), total: events.length };
}

export async function computeRunFigures(
  dataSource: DataSource,
  run: Run,
  phases: ResolvedPhase[],
): Promise<RunFigures> {
  const { events } = (await loadRunEvents(dataSource, [run.id])).get(run.id)!;
  const ordered = orderEvents(events, run.engineId);
  const { account } = accountOrdered(ordered, phases);
  const charts = phaseCharts(ordered, phases, account);
  const logged = loggedEvents(ordered);
  return {
    eventCount: events.length,
    account,
    charts,
    events: logged.events,
    eventsTotal: logged.total,
    readingCount: charts.reduce((n, c) => n + c.readingCount, 0),
    meter: (await latestHourMeters(dataSource, [run.id])).get(run.id) ?? null,
  };
}

/**
 * The figures of the runs looked at lately, kept while their events do not change. Events are
 * only ever added, so an unchanged count means unchanged figures (counting uses the run's index
 * and costs a millisecond; working the figures out again for 36,000 readings costs a hundred or
 * more). Kept per process, for a handful of runs.
 */
export class RunFiguresCache {
  private readonly kept = new Map<string, RunFigures>();

  constructor(
    private readonly dataSource: DataSource,
    private readonly capacity = 16,
  ) {}

  async get(run: Run, phases: ResolvedPhase[]): Promise<RunFigures> {
    const count = countRunEvents(this.dataSource, run.id);
    const hit = this.kept.get(run.id);
    if (hit && hit.eventCount === count) {
      this.kept.delete(run.id);
      this.kept.set(run.id, hit);
      return hit;
    }
    const figures = await computeRunFigures(this.dataSource, run, phases);
    this.kept.delete(run.id);
    this.kept.set(run.id, figures);
    if (this.kept.size > this.capacity) this.kept.delete(this.kept.keys().next().value!);
    return figures;
  }
}
