import { Button } from '../../../components/ui/button';
import { cx } from '../../../components/ui/cx';
import type { DeckEntry } from '../deck-entries';
import type { EngineSnapshot } from '../engine-snapshot';
import {
  ceilingText,
  clockText,
  clockWords,
  rpmRangeText,
  shortSpan,
  THROTTLE_LABEL,
} from '../format';
import { AlertList } from './alert-list';
import { BandState, type DeckState } from './band-state';
import { PhaseList } from './phase-list';
import { ProgressBar } from './progress-bar';
import { RecentEntries } from './recent-entries';
import { ReturnedNotice } from './returned-notice';
import { RunPageLink } from './run-page-link';

export function deckState(snapshot: EngineSnapshot): DeckState {
  if (snapshot.waitingForWorkshop) return 'waiting';
  const { state } = snapshot.live;
  if (state === 'stopped') return 'paused';
  return state === 'paused' ? 'no-reading' : state;
}

interface EnginePanelProps {
  snapshot: EngineSnapshot;
  label: string;
  role: 'skipper' | 'technician' | 'manager';
  onAdvance: (phaseId: string) => void;
  advancing: boolean;
  /** The engine's readings and notes, newest first, to void a slip. */
  entries: DeckEntry[];
  /** The only engine on screen: figures get the full width. */
  wide?: boolean;
}

/** One engine at a glance: phase, band, the big state, time in band done and left, progress. */
export function EnginePanel({
  snapshot,
  label,
  role,
  onAdvance,
  advancing,
  entries,
  wide = false,
}: EnginePanelProps) {
  const { live, run, phases } = snapshot;
  const phaseName = (id: string) => phases.find((p) => p.id === id)?.name ?? id;
  const headingId = `engine-${snapshot.engineId}`;
  return (
    <section
      aria-labelledby={headingId}
      className="flex min-w-0 flex-col gap-2 rounded-lg border-2 border-line bg-surface p-2 sm:p-4"
    >
      <h2 id={headingId} className="truncate text-lg font-extrabold uppercase tracking-wide">
        {label}
      </h2>
      <ReturnedNotice run={run} phases={phases} label={label} />
      <PhaseHeading snapshot={snapshot} />
      <BandState state={deckState(snapshot)} engineLabel={label} wide={wide} />
      <AlertList alerts={snapshot.alerts} reminders={snapshot.reminders} />
      <PhaseClock snapshot={snapshot} wide={wide} />
      <ProgressBar share={live.phaseProgress} label={`${label}: this phase`} />
      <p className="text-sm">
        Overall{' '}
        <span className="figures font-bold">{Math.floor(live.overallProgress * 100)} %</span>
      </p>
      <LastReading snapshot={snapshot} />
      <NextPhase snapshot={snapshot} role={role} onAdvance={onAdvance} advancing={advancing} />
      <PhaseList rows={snapshot.rows} label={label} />
      <RecentEntries
        entries={entries}
        run={{ runId: run.id, engineId: snapshot.engineId }}
        role={role}
        label={label}
        phaseName={phaseName}
      />
      <RunPageLink run={run} />
    </section>
  );
}

/** Which phase the engine is in, and its throttle ceiling and band. */
function PhaseHeading({ snapshot }: { snapshot: EngineSnapshot }) {
  const { live, phase, phases } = snapshot;
  if (!phase) return null;
  return (
    <div>
      <p className="text-sm text-muted">
        Phase {live.currentPhaseIndex + 1} of {phases.length}
        {phase.performedBy === 'workshop' && ' · workshop'}
      </p>
      <p className="line-clamp-2 font-bold leading-tight">{phase.name}</p>
      <p className="mt-1 flex flex-wrap gap-x-2 text-sm font-semibold">
        <span>{ceilingText(phase.throttleCeiling)}</span>
        <span className="figures">{rpmRangeText(phase.band)}</span>
      </p>
    </div>
  );
}

/** The phase's time in band so far, large, and the time still to run. */
function PhaseClock({ snapshot, wide }: { snapshot: EngineSnapshot; wide: boolean }) {
  const { live } = snapshot;
  return (
    <dl className="flex flex-col">
      <dt className="text-sm font-semibold">Time in band</dt>
      <dd
        className={cx(
          'figures font-extrabold leading-none',
          wide ? 'text-6xl' : 'text-[2rem] sm:text-5xl',
        )}
        aria-label={clockWords(live.phaseDoneMs)}
        data-testid="time-in-band"
      >
        {clockText(live.phaseDoneMs)}
      </dd>
      <div className="mt-1 flex items-baseline justify-between gap-2">
        <dt className="text-sm font-semibold">Left</dt>
        <dd
          className={cx('figures font-bold', wide ? 'text-3xl' : 'text-xl sm:text-3xl')}
          aria-label={clockWords(live.phaseLeftMs)}
        >
          {clockText(live.phaseLeftMs, 'up')}
        </dd>
      </div>
    </dl>
  );
}

function LastReading({ snapshot }: { snapshot: EngineSnapshot }) {
  const { live, lastReading, waitingForWorkshop } = snapshot;
  if (waitingForWorkshop) {
    return (
      <p className="text-sm">
        The workshop runs this phase at the dock. It shows as done here once they have logged it.
      </p>
    );
  }
  if (!lastReading)
    return <p className="text-sm">No reading yet: time counts from the first one.</p>;
  const held = live.heldReading;
  return (
    <p className="text-sm">
      Last <span className="figures font-bold">{lastReading.rpm} rpm</span> at{' '}
      {THROTTLE_LABEL[lastReading.throttle]}
      {held ? ` · counts ${shortSpan(held.holdEndsMs - live.nowMs)} more` : ' · not counting now'}
    </p>
  );
}

function NextPhase({
  snapshot,
  role,
  onAdvance,
  advancing,
}: Omit<EnginePanelProps, 'label' | 'wide' | 'entries'>) {
  const { phaseComplete, nextPhase } = snapshot;
  if (!phaseComplete) return null;
  if (!nextPhase)
    return (
      <p className="rounded-md border-2 border-ink p-2 font-semibold">
        {snapshot.account.verdict === 'complete'
          ? 'Every phase has its time in band. End the outing, then finish and submit the run.'
          : 'No phase left to move on to. End the outing, then finish and submit the run.'}
      </p>
    );
  if (nextPhase.performedBy === 'workshop' && role === 'skipper') {
    return (
      <p className="rounded-md border-2 border-ink p-2 font-semibold">
        This phase is done. The next one, &ldquo;{nextPhase.name}&rdquo;, is run by the workshop.
      </p>
    );
  }
  return (
    <div className="flex flex-col gap-2 rounded-md border-2 border-ink p-2">
      <p className="font-semibold">Phase done. Move on to &ldquo;{nextPhase.name}&rdquo;?</p>
      <Button onClick={() => onAdvance(nextPhase.id)} pending={advancing} pendingLabel="Moving on…">
        Move on
      </Button>
    </div>
  );
}
