import type { RunEvent } from '../../../../shared/runs/run-event.schema';
import { db, type RunRecord } from '../../../lib/db';
import { renderPage } from '../../../test/render';
import { startOuting } from '../outing-store';
import { MIN, refOf, testVessel, VESSEL_ID } from '../test-fixtures';
import { DeckScreen } from './deck-screen';

// Puts records into the device database the way the deck and the sync engine do, for screen tests.

let n = 0;
const eventId = () => `00000000-0000-4000-8000-${(++n).toString(16).padStart(12, '0')}`;

export async function store(run: RunRecord, events: Array<Omit<RunEvent, 'id' | 'engineId'>>) {
  await db.events.bulkPut(
    events.map((e) => {
      const event = { ...e, id: eventId(), engineId: run.engine.id } as RunEvent;
      return {
        id: event.id,
        runId: run.id,
        engineId: run.engine.id,
        at: event.at,
        kind: event.kind,
        event,
        origin: 'device' as const,
        sync: 'pending' as const,
        createdAt: event.at,
      };
    }),
  );
}

/** An outing started `minutesAgo`, already on the "below half" phase of each run. */
export async function outingOn(runs: RunRecord[], minutesAgo = 5) {
  const startedAt = Date.now() - minutesAgo * MIN;
  await db.runs.bulkPut(runs);
  await db.vessels.put(testVessel(runs));
  await startOuting(db, VESSEL_ID, runs.map(refOf), startedAt);
  for (const run of runs)
    await store(run, [
      { kind: 'phase-advance', at: startedAt + 1, phaseId: 'below-half' } as never,
    ]);
  return startedAt;
}

export const readingAt = (at: number, rpm: number, throttle = 'half') =>
  ({ kind: 'reading', at, phaseId: 'below-half', rpm, throttle }) as never;

export const clearDevice = () =>
  Promise.all([
    db.events.clear(),
    db.runs.clear(),
    db.vessels.clear(),
    db.outings.clear(),
    db.photos.clear(),
    db.runPatches.clear(),
  ]);

export const showDeck = (role: 'skipper' | 'technician' = 'skipper') =>
  renderPage(<DeckScreen vesselId={VESSEL_ID} role={role} />);

type Logged = Omit<RunEvent, 'id' | 'engineId'>;
const event = (kind: string, at: number, rest: object = {}) => ({ kind, at, ...rest }) as Logged;

/**
 * A finished outing (no outing under way): on the below-half phase from `startedAt`, readings
 * every 5 minutes varying between 2000 and 2600 rpm at half throttle for `minutes`.
 */
export function outingDone(startedAt: number, minutes: number, phaseId = 'below-half'): Logged[] {
  const events = [
    event('session-start', startedAt),
    event('phase-advance', startedAt, { phaseId }),
  ];
  for (let m = 0; m < minutes; m += 5)
    events.push(
      event('reading', startedAt + m * MIN, {
        phaseId,
        rpm: m % 10 === 0 ? 2000 : 2600,
        throttle: 'half',
      }),
    );
  return [...events, event('session-stop', startedAt + minutes * MIN)];
}

/**
 * Every phase of the built-in four-stroke program in band for its time (10, 110, 480 min),
 * speed changed every 5 minutes: a run the workshop would judge complete.
 */
export function wholeProgram(startedAt: number): Logged[] {
  const events = [event('session-start', startedAt)];
  const phase = (
    phaseId: string,
    from: number,
    to: number,
    rpms: [number, number],
    throttle: string,
  ) => {
    events.push(event('phase-advance', startedAt + from * MIN, { phaseId }));
    for (let m = from; m < to; m += 5)
      events.push(
        event('reading', startedAt + m * MIN, {
          phaseId,
          rpm: (m / 5) % 2 === 0 ? rpms[0] : rpms[1],
          throttle,
        }),
      );
  };
  phase('dock-run', 0, 10, [800, 900], 'idle');
  phase('below-half', 10, 120, [2000, 2600], 'half');
  phase('below-three-quarter', 120, 600, [3000, 3800], 'three-quarter');
  return [...events, event('session-stop', startedAt + 600 * MIN)];
}
