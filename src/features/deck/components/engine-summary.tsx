import { VERDICT_WORDS } from '../../../../shared/review/run-words';
import { durationWords } from '../../../../shared/runs/duration-words';
import type { PhaseAccount } from '../../../../shared/runs/run-accounting';
import type { ResolvedPhase } from '../../../../shared/programs/resolve-band';
import { entryText, type DeckEntry } from '../deck-entries';
import type { EngineSnapshot } from '../engine-snapshot';

const VERDICT_MARK = { complete: '✓', incomplete: '…', breached: '▲' } as const;

/** One engine before it is submitted: every phase as the workshop will see it, and what was voided. */
export function EngineSummary({
  snapshot,
  label,
  voided,
}: {
  snapshot: EngineSnapshot;
  label: string;
  voided: DeckEntry[];
}) {
  const { account, phases, run } = snapshot;
  return (
    <section
      aria-label={`${label}: summary`}
      className="flex flex-col gap-2 rounded-md border-2 border-line p-2"
    >
      <h3 className="text-lg font-bold">
        {label} · {run.engine.maker} {run.engine.model}
      </h3>
      <p className="font-semibold">
        <span aria-hidden="true">{VERDICT_MARK[account.verdict]} </span>
        Run: {VERDICT_WORDS[account.verdict]}
      </p>
      <ol aria-label={`${label}: phases`} className="flex flex-col gap-2">
        {phases.map((phase, i) => (
          <PhaseLine key={phase.id} phase={phase} account={account.phases[i]} />
        ))}
      </ol>
      <VoidedList voided={voided} phases={phases} />
    </section>
  );
}

function PhaseLine({ phase, account }: { phase: ResolvedPhase; account: PhaseAccount }) {
  return (
    <li className="flex flex-col">
      <p>
        <span className="font-semibold">{phase.name}</span>
        {' · '}
        <span aria-hidden="true">{VERDICT_MARK[account.verdict]} </span>
        {VERDICT_WORDS[account.verdict]}
      </p>
      <p className="text-sm">
        In band <span className="figures">{durationWords(account.timeInBandMs)}</span> of{' '}
        <span className="figures">{durationWords(account.requiredMs)}</span> required
        {account.setAsideMs > 0 && (
          <>
            {' · '}set aside <span className="figures">{durationWords(account.setAsideMs)}</span>{' '}
            (logged before the workshop sent it back)
          </>
        )}
      </p>
      {account.reasons.length > 0 && (
        <ul className="list-disc pl-5 text-sm">
          {account.reasons.map((reason, i) => (
            <li key={`${reason.code}-${i}`}>{reason.message}</li>
          ))}
        </ul>
      )}
    </li>
  );
}

function VoidedList({ voided, phases }: { voided: DeckEntry[]; phases: ResolvedPhase[] }) {
  if (voided.length === 0) return <p className="text-sm">Nothing voided.</p>;
  const name = (id: string) => phases.find((p) => p.id === id)?.name ?? id;
  return (
    <div className="text-sm">
      <p className="font-semibold">
        Voided: {voided.length} {voided.length === 1 ? 'entry' : 'entries'}
      </p>
      <ul className="list-disc pl-5">
        {voided.map(({ event, voided: mark }) => (
          <li key={event.id}>
            <del>{entryText(event, name)}</del> — {mark?.reason}
          </li>
        ))}
      </ul>
    </div>
  );
}
