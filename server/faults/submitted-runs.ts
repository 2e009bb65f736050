import { randomUUID } from 'node:crypto';
import { openRunFor } from '../../tests/helpers/api.js';
import type { FaultSession } from './fault-session.js';
import { readingFor } from '../../tests/helpers/runs.js';
import type { PushRun } from './push-devices.js';

/*
 * Runs waiting for the workshop, made as people make them: the technician assigns a program,
 * the skipper's phone pushes an outing and the submit. A run is not judged complete after one
 * short outing, so the submit carries the skipper's note saying why.
 */

/** The demo's free engines; each takes a new run once its last one is signed off. */
const ENGINES = [
  ['Gannet', 'single'],
  ['Blue Tern', 'port'],
  ['Blue Tern', 'starboard'],
] as const;

const session = (run: PushRun, kind: 'session-start' | 'session-stop', at: number) => ({
  type: 'event' as const,
  runId: run.id,
  event: { kind, id: randomUUID(), at, engineId: run.engine.id },
});

async function submitOuting(skipper: FaultSession, run: PushRun, from: number) {
  const readings = Array.from({ length: 20 }, (_, i) =>
    readingFor(run, from + (i + 1) * 60_000, 2600 + i * 10),
  );
  const submit = {
    type: 'run-patch' as const,
    id: randomUUID(),
    runId: run.id,
    at: from + 30 * 60_000,
    submit: true as const,
    submitNote: 'Short outing only; the weather closed in.',
  };
  const items = [
    session(run, 'session-start', from),
    ...readings,
    session(run, 'session-stop', from + 25 * 60_000),
    submit,
  ];
  const res = await skipper('/api/sync/push', {
    body: { deviceId: randomUUID(), sentAt: Date.now(), items },
  });
  const statuses = (res.body?.results ?? []) as Array<{ status: string }>;
  if (res.status !== 200 || statuses.some((r) => r.status !== 'stored'))
    throw new Error(`submitting ${run.id}: ${res.status} ${JSON.stringify(res.body)}`);
}

/** A new submitted run on each free engine of the demo; their ids. */
export async function submittedRuns(tech: FaultSession, skipper: FaultSession): Promise<string[]> {
  const ids: string[] = [];
  for (const [vessel, position] of ENGINES) {
    const run = await openRunFor(tech, vessel, position);
    await submitOuting(skipper, run, Date.now() - 4 * 3600_000);
    ids.push(run.id);
  }
  return ids;
}

/** The demo's run on Skua, submitted from the start. */
export async function demoSubmittedRun(tech: FaultSession): Promise<string> {
  const board = await tech('/api/board?show=submitted');
  const skua = (board.body.runs as Array<{ id: string; vessel: { name: string } }>).find(
    (r) => r.vessel.name === 'Skua',
  );
  if (!skua) throw new Error(`no submitted run on Skua: ${JSON.stringify(board.body)}`);
  return skua.id;
}
