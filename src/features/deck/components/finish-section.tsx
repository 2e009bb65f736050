import { useState } from 'react';
import { Button } from '../../../components/ui/button';
import { deckEntries, type DeckEntry } from '../deck-entries';
import type { VesselDeck } from '../device-records';
import type { EngineSnapshot } from '../engine-snapshot';
import { isLoggable } from '../run-phases';
import { submissionWords } from '../submission';
import { engineLabel } from '../use-deck-state';
import { RunPageLink } from './run-page-link';
import { SubmitSummary } from './submit-summary';

/** Runs that can go to the workshop from here: still open on this device, with something logged. */
export const submittable = (deck: VesselDeck, snapshots: EngineSnapshot[]) =>
  snapshots.filter((s) => isLoggable(s.run) && (deck.events[s.run.id]?.length ?? 0) > 0);

/**
 * The end of the break-in on deck: "Finish and submit" opens the summary of every engine, then
 * one submit sends them all. Offered when no outing is under way.
 */
export function FinishSection({
  deck,
  engines,
  onSubmitted,
}: {
  deck: VesselDeck;
  engines: EngineSnapshot[];
  onSubmitted?: () => void;
}) {
  const [open, setOpen] = useState(false);
  if (engines.length === 0) return null;
  const allDone = engines.every((s) => s.account.verdict === 'complete');
  const voidedOf = (s: EngineSnapshot): DeckEntry[] =>
    deckEntries(deck.events[s.run.id] ?? [], s.engineId, deck.own, deck.refusedVoids).filter(
      (e) => e.voided !== null,
    );
  if (open)
    return (
      <SubmitSummary
        engines={engines}
        voidedOf={voidedOf}
        onClose={() => setOpen(false)}
        onSubmitted={() => {
          setOpen(false);
          onSubmitted?.();
        }}
      />
    );
  return (
    <section
      aria-labelledby="finish"
      className="flex flex-col gap-2 rounded-lg border-2 border-ink bg-surface p-3"
    >
      <h2 id="finish" className="text-xl font-bold">
        Finish the break-in
      </h2>
      <p>
        {allDone
          ? 'Every phase has its time in band. Check the summary, then submit the run to the workshop.'
          : 'Not every phase is complete yet. You can still submit what was run, with a note to the workshop saying why.'}
      </p>
      <Button variant={allDone ? 'primary' : 'secondary'} onClick={() => setOpen(true)}>
        Finish and submit
      </Button>
    </section>
  );
}

/** Per engine: whether its submission waits on this phone, reached the workshop, or was refused. */
export function SubmissionNotices({ deck }: { deck: VesselDeck }) {
  const notices = deck.runs.flatMap((run) => {
    const words = submissionWords(run, deck.submissions.get(run.id));
    return words ? [{ run, ...words }] : [];
  });
  if (notices.length === 0) return null;
  return (
    <ul aria-label="Submissions" className="flex flex-col gap-2">
      {notices.map(({ run, text, refused }) => (
        <li
          key={run.id}
          role={refused ? 'alert' : undefined}
          className={
            refused
              ? 'rounded-md border-4 border-danger bg-surface p-2'
              : 'rounded-md border-2 border-ink bg-surface p-2'
          }
        >
          <p className="font-bold">{engineLabel(run)}</p>
          <p>
            {refused && <span aria-hidden="true">⚠ </span>}
            {text}
          </p>
          {!isLoggable(run) && <RunPageLink run={run} />}
        </li>
      ))}
    </ul>
  );
}
