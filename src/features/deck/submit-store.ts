import { positionWords } from '../../../shared/engines/engine-words';
import { orderEvents } from '../../../shared/runs/event-order';
import { accountOrdered } from '../../../shared/runs/run-accounting';
import { RunPatchItemSchema, type RunPatchItem } from '../../../shared/sync/sync.schema';
import type { RingseatDb, RunPatchRecord, RunRecord } from '../../lib/db';
import { DeckInputError, nextEventAt } from './device-events';
import { isLoggable, runPhases } from './run-phases';

/*
 * Submitting from the deck: one run change per engine (submit, with the note to the workshop),
 * written to the outbox in one transaction, so both engines of a twin go together or neither.
 * The same rule as the server's: a run not judged complete goes only with a note saying why.
 */

export const NOTE_REQUIRED =
  'Write a note to the workshop (Note to the workshop) saying why the run goes with a phase not complete.';

const label = (run: RunRecord) => `${positionWords(run.engine.position)} engine`;

/** The run's verdict from what this device holds, voided entries left out, as the server judges it. */
async function verdictHere(database: RingseatDb, run: RunRecord) {
  const records = await database.events.where('runId').equals(run.id).toArray();
  const events = records.filter((r) => r.sync !== 'rejected').map((r) => r.event);
  const ordered = orderEvents(events, run.engine.id);
  return { logged: ordered.length > 0, ...accountOrdered(ordered, runPhases(run)).account };
}

async function checkRun(database: RingseatDb, runId: string, note: string): Promise<RunRecord> {
  const run = await database.runs.get(runId);
  if (!run) throw new DeckInputError('submit', 'This run is not stored on this device.');
  const pending = await database.runPatches
    .where('runId')
    .equals(runId)
    .filter((p) => p.item.submit === true && p.sync === 'pending')
    .count();
  if (!isLoggable(run) || pending > 0)
    throw new DeckInputError('submit', `The ${label(run)}'s run is already submitted.`);
  const { logged, verdict } = await verdictHere(database, run);
  if (!logged)
    throw new DeckInputError(
      'submit',
      `Nothing has been logged on the ${label(run)} yet, so there is nothing to submit.`,
    );
  if (verdict !== 'complete' && note === '') throw new DeckInputError('submitNote', NOTE_REQUIRED);
  return run;
}

function checkedPatch(item: RunPatchItem): RunPatchItem {
  const result = RunPatchItemSchema.safeParse(item);
  if (result.success) return result.data;
  const issue = result.error.issues[0];
  throw new DeckInputError(String(issue.path[0] ?? 'submit'), issue.message);
}

/** Submits every run named (all of the vessel's engines on deck), all or nothing. */
export async function submitRuns(
  database: RingseatDb,
  runIds: string[],
  submitNote: string,
  nowMs: number,
): Promise<RunPatchRecord[]> {
  if (runIds.length === 0) throw new DeckInputError('submit', 'There is no run to submit.');
  const note = submitNote.trim();
  return database.transaction(
    'rw',
    database.runs,
    database.events,
    database.runPatches,
    async () => {
      const records: RunPatchRecord[] = [];
      for (const runId of runIds) {
        await checkRun(database, runId, note);
        const id = crypto.randomUUID();
        const at = await nextEventAt(database, runId, nowMs);
        const item = checkedPatch({
          type: 'run-patch',
          id,
          runId,
          at,
          submit: true,
          ...(note ? { submitNote: note } : {}),
        });
        records.push({ id, runId, item, sync: 'pending', createdAt: nowMs });
      }
      await database.runPatches.bulkAdd(records);
      return records;
    },
  );
}
