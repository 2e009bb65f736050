import { randomUUID } from 'node:crypto';
import { readingFor } from '../../tests/helpers/runs.js';
import type { FaultSession } from './fault-session.js';

/*
 * Devices pushing readings the way the app's outbox does (src/features/sync/outbox.ts): items
 * with ids made on the device, cut into batches sent one after another; a batch is cleared only
 * when the server answered it, and everything not answered is sent again later.
 */

export type PushRun = { id: string; engine: { id: string }; program: { phases: { id: string }[] } };
type ReadingItem = ReturnType<typeof readingFor>;
type Batch = { items: ReadingItem[]; answered: boolean };
export type Device = { id: string; batches: Batch[] };

/** One device per run, each with `batches` batches of `size` readings, a second apart. */
export function devicesFor(runs: PushRun[], batches: number, size: number, from: number): Device[] {
  return runs.map((run) => ({
    id: randomUUID(),
    batches: Array.from({ length: batches }, (_, b) => ({
      answered: false,
      items: Array.from({ length: size }, (_, i) =>
        readingFor(run, from + (b * size + i) * 1000, 2400 + ((b * size + i) % 800)),
      ),
    })),
  }));
}

/** What the server answered "stored" and "duplicate", by reading id. */
export type Answers = { stored: Set<string>; duplicate: Set<string>; refused: string[] };

export const noAnswers = (): Answers => ({ stored: new Set(), duplicate: new Set(), refused: [] });

/**
 * Sends the device's batches not yet answered, in order, and notes each answer. A request that
 * fails (the server went away) ends this round; the batch waits for the next.
 */
export async function sendOutbox(
  session: FaultSession,
  device: Device,
  answers: Answers,
  onAnswer: () => void = () => {},
): Promise<void> {
  for (const batch of device.batches.filter((b) => !b.answered)) {
    let res: Awaited<ReturnType<FaultSession>>;
    try {
      res = await session('/api/sync/push', {
        body: { deviceId: device.id, sentAt: Date.now(), items: batch.items },
      });
    } catch {
      return;
    }
    if (res.status !== 200)
      throw new Error(`push answered ${res.status}: ${JSON.stringify(res.body)}`);
    batch.answered = true;
    for (const result of res.body.results as Array<{ id: string; status: string }>) {
      if (result.status === 'stored') answers.stored.add(result.id);
      else if (result.status === 'duplicate') answers.duplicate.add(result.id);
      else answers.refused.push(`${result.id}: ${JSON.stringify(result)}`);
    }
    onAnswer();
  }
}

export const readingIds = (devices: Device[]): string[] =>
  devices.flatMap((d) => d.batches.flatMap((b) => b.items.map((item) => item.event.id)));

export const unanswered = (devices: Device[]): number =>
  devices.reduce((n, d) => n + d.batches.filter((b) => !b.answered).length, 0);
