import type { RunPatchRecord, RunRecord } from '../../lib/db';
import { isLoggable } from './run-phases';

/*
 * A submit made on this phone goes to the outbox like everything else. Until the server has it,
 * only this device knows: the run shows here as submitted (so the deck stops offering logging),
 * and the screen says it waits to be sent. The server's copy of the run, pulled after the push,
 * is the truth from then on: submitted when the server took it, unchanged when it refused it,
 * and then the refusal's reason is shown.
 */

export type SubmissionStatus = 'waiting' | 'sent' | 'refused';

export interface LocalSubmission {
  status: SubmissionStatus;
  /** Device time of the submit. */
  at: number;
  note: string | null;
  /** The server's reason, when it refused the submit. */
  reason: string | null;
}

const STATUS: Record<RunPatchRecord['sync'], SubmissionStatus> = {
  pending: 'waiting',
  synced: 'sent',
  rejected: 'refused',
};

/** The newest submit this device made for each run, as its sync state says. */
export function latestSubmissions(
  patches: readonly RunPatchRecord[],
): Map<string, LocalSubmission> {
  const newest = new Map<string, RunPatchRecord>();
  for (const patch of patches) {
    if (!patch.item.submit) continue;
    const seen = newest.get(patch.runId);
    if (!seen || patch.createdAt > seen.createdAt) newest.set(patch.runId, patch);
  }
  return new Map(
    [...newest].map(([runId, patch]) => [
      runId,
      {
        status: STATUS[patch.sync],
        at: patch.createdAt,
        note: patch.item.submitNote || null,
        reason: patch.sync === 'rejected' ? (patch.rejectReason ?? null) : null,
      },
    ]),
  );
}

/**
 * Whether the submit holds the run here: while it waits in the outbox, and once sent until the
 * copy pulled from the server is newer than the submit (the server's copy then says what it is).
 * The comparison mixes the server's clock with the phone's; a phone far off only shifts when the
 * server's copy takes over.
 */
function holdsRun(run: RunRecord, submission: LocalSubmission): boolean {
  if (submission.status === 'waiting') return true;
  return submission.status === 'sent' && Date.parse(run.updatedAt) < submission.at;
}

/** The run as this device shows it: submitted while its own submit holds it (see above). */
export function shownHere(run: RunRecord, submission: LocalSubmission | undefined): RunRecord {
  if (!submission || !isLoggable(run) || !holdsRun(run, submission)) return run;
  return {
    ...run,
    state: 'submitted',
    submittedAt: new Date(submission.at).toISOString(),
    submitNote: submission.note,
  };
}

/** What the deck says of a run's submission, in words; null when there is nothing to say. */
export function submissionWords(
  run: RunRecord,
  submission: LocalSubmission | undefined,
): { text: string; refused: boolean } | null {
  if (submission?.status === 'refused' && isLoggable(run))
    return {
      text: `The workshop server did not take the submission: ${submission.reason ?? 'no reason given.'}`,
      refused: true,
    };
  if (run.state === 'signed-off') return { text: 'Signed off by the workshop.', refused: false };
  if (run.state !== 'submitted') return null;
  if (submission?.status === 'waiting')
    return {
      text: 'Submitted on this phone — waiting for a connection to send it.',
      refused: false,
    };
  return { text: 'Sent to the workshop.', refused: false };
}
