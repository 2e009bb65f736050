import { positionWords } from '../../../shared/engines/engine-words';
import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import type { DecisionView, RunReviewView } from '../../../shared/review/views';
import {
  FirstServiceText,
  ProgressBar,
  RunStatePill,
  VerdictPill,
} from '../../features/board/components/run-badges';
import {
  CertificateCard,
  ClockFlag,
  DecisionNotice,
} from '../../features/review/components/decisions';
import { PhaseSection } from '../../features/review/components/phase-section';
import { EventList } from '../../features/review/components/run-log';
import { Card } from '../../components/ui/card';

/* The parts of the review page (run-review.tsx), each composed from the review and board features. */

export function Section({
  id,
  title,
  children,
}: {
  id: string;
  title: string;
  children: ReactNode;
}) {
  return (
    <section aria-labelledby={id} className="flex flex-col gap-3">
      <h2 id={id} className="text-xl font-bold">
        {title}
      </h2>
      {children}
    </section>
  );
}

export function ReviewHeader({ review }: { review: RunReviewView }) {
  const { vessel, engine, run, account } = review;
  return (
    <header className="flex flex-col gap-2">
      <h1 className="text-3xl font-bold">
        {vessel.name} · {positionWords(engine.position)} engine
      </h1>
      <p>
        {engine.maker} {engine.model} · serial{' '}
        <span className="figures">{engine.serialNumber}</span> · {run.programName}
      </p>
      {review.skippers.length > 0 && (
        <p className="text-muted">Skipper: {review.skippers.map((s) => s.name).join(', ')}</p>
      )}
      <div className="flex flex-wrap items-center gap-3">
        <RunStatePill state={run.state} />
        <VerdictPill verdict={account.verdict} />
        <div className="w-56">
          <ProgressBar share={account.overallProgress} label="Required time done" />
        </div>
      </div>
    </header>
  );
}

/** Above the phases: the certificate once there is one, or a pointer to the sign-off below them. */
export function DecisionAtTop({ review }: { review: RunReviewView }) {
  if (review.certificate)
    return (
      <Card title="Certificate">
        <CertificateCard certificate={review.certificate} />
      </Card>
    );
  if (!review.canDecide) return null;
  return (
    <p className="rounded-md border-2 border-ink bg-surface p-3">
      This run waits for your review. Read the phases below, then{' '}
      <a href="#sign-off" className="font-semibold underline underline-offset-4">
        confirm or return it
      </a>
      .
    </p>
  );
}

/** What the page opens with: the way back, the run, a clock warning, and the decision so far. */
export function ReviewTop({
  review,
  staff,
  decided,
}: {
  review: RunReviewView;
  staff: boolean;
  decided: DecisionView | null;
}) {
  return (
    <>
      {staff && (
        <Link
          to="/runs"
          className="inline-flex min-h-touch items-center self-start font-semibold underline underline-offset-4"
        >
          ← All runs
        </Link>
      )}
      <ReviewHeader review={review} />
      {review.run.clockSkewFlag && review.run.clockSkewMs !== null && (
        <ClockFlag skewMs={review.run.clockSkewMs} />
      )}
      {decided && <DecisionNotice result={decided} />}
      <DecisionAtTop review={review} />
    </>
  );
}

export function PhasesSection({ review: r }: { review: RunReviewView }) {
  return (
    <Section id="phases" title="Phases">
      {r.phases.map((phase, i) => (
        <PhaseSection
          key={phase.id}
          phase={phase}
          chart={r.charts[i]}
          index={i}
          ratedRpmMax={r.engine.ratedRpmMax}
        />
      ))}
    </Section>
  );
}

export function LogSection({ review: r }: { review: RunReviewView }) {
  return (
    <Section id="log" title="Notes and events">
      {r.run.notes && (
        <Card level={3} title="Run notes">
          <p className="whitespace-pre-line">{r.run.notes}</p>
        </Card>
      )}
      <EventList events={r.events} total={r.eventsTotal} phases={r.phases} />
    </Section>
  );
}

export function FirstServiceSection({ review: r }: { review: RunReviewView }) {
  return (
    <Section id="service" title="First service">
      <p>
        <FirstServiceText service={r.firstService} />
      </p>
      <p className="text-sm text-muted">
        Whichever comes first, engine hours or date, counted from commissioning.
      </p>
    </Section>
  );
}
