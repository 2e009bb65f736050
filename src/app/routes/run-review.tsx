import { useState, type ReactNode } from 'react';
import { Link, useParams } from 'react-router-dom';
import type { DecisionView, RunReviewView } from '../../../shared/review/views';
import { AttachmentPanel } from '../../features/attachments/components/attachment-panel';
import { useInvalidateBoard } from '../../features/board/api';
import {
  FirstServiceText,
  ProgressBar,
  RunStatePill,
  VerdictPill,
} from '../../features/board/components/run-badges';
import { useRunReview } from '../../features/review/api';
import {
  CertificateCard,
  ClockFlag,
  DecisionNotice,
  ReviewHistory,
} from '../../features/review/components/decisions';
import { PhaseSection } from '../../features/review/components/phase-section';
import { ReadingsTable } from '../../features/review/components/readings-table';
import { AuditTrail, EventList } from '../../features/review/components/run-log';
import { SignOffForm } from '../../features/review/components/sign-off-form';
import { Card } from '../../components/ui/card';
import { LoadError, Loading } from '../../components/ui/status-message';
import { capitalise } from '../../lib/format';
import { useSessionUser } from '../shell/session';

function Section({ id, title, children }: { id: string; title: string; children: ReactNode }) {
  return (
    <section aria-labelledby={id} className="flex flex-col gap-3">
      <h2 id={id} className="text-xl font-bold">
        {title}
      </h2>
      {children}
    </section>
  );
}

function ReviewHeader({ review }: { review: RunReviewView }) {
  const { vessel, engine, run, account } = review;
  return (
    <header className="flex flex-col gap-2">
      <h1 className="text-3xl font-bold">
        {vessel.name} · {capitalise(engine.position)} engine
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
function DecisionAtTop({ review }: { review: RunReviewView }) {
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

function ReviewPage({ runId }: { runId: string }) {
  const user = useSessionUser();
  const review = useRunReview(runId);
  const invalidateBoard = useInvalidateBoard();
  const [decided, setDecided] = useState<DecisionView | null>(null);
  if (review.isPending) return <Loading label="Loading the run…" />;
  if (review.isError)
    return <LoadError error={review.error} what="this run" onRetry={() => review.refetch()} />;
  const r = review.data;
  const staff = user.role !== 'skipper';
  const open = r.run.state !== 'signed-off';
  return (
    <div className="flex flex-col gap-6">
      <title>{`${r.vessel.name}, ${r.engine.position} engine · Review · Ringseat`}</title>
      {staff && (
        <Link
          to="/runs"
          className="inline-flex min-h-touch items-center self-start font-semibold underline underline-offset-4"
        >
          ← All runs
        </Link>
      )}
      <ReviewHeader review={r} />
      {r.run.clockSkewFlag && r.run.clockSkewMs !== null && (
        <ClockFlag skewMs={r.run.clockSkewMs} />
      )}
      {decided && <DecisionNotice result={decided} />}
      <DecisionAtTop review={r} />
      {r.reviews.length > 0 && (
        <Section id="decisions" title="Decisions">
          <ReviewHistory reviews={r.reviews} />
        </Section>
      )}
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
      {r.canDecide && (
        <Card title="Sign-off" id="sign-off" className="scroll-mt-4">
          <SignOffForm
            runId={r.run.id}
            verdict={r.account.verdict}
            onDecided={(result) => {
              setDecided(result);
              void invalidateBoard();
            }}
          />
        </Card>
      )}
      <Section id="readings" title="Readings">
        <ReadingsTable runId={r.run.id} total={r.readingCount} />
      </Section>
      <Section id="photos" title="Photos and documents">
        <AttachmentPanel
          recordType="run"
          recordId={r.run.id}
          canAdd={open}
          canRemove={staff && open}
        />
      </Section>
      <Section id="log" title="Notes and events">
        {r.run.notes && (
          <Card level={3} title="Run notes">
            <p className="whitespace-pre-line">{r.run.notes}</p>
          </Card>
        )}
        <EventList events={r.events} total={r.eventsTotal} phases={r.phases} />
      </Section>
      <Section id="service" title="First service">
        <p>
          <FirstServiceText service={r.firstService} />
        </p>
        <p className="text-sm text-muted">
          Whichever comes first, engine hours or date, counted from commissioning.
        </p>
      </Section>
      {staff && (
        <Section id="trail" title="Audit trail">
          <AuditTrail trail={r.trail} />
        </Section>
      )}
    </div>
  );
}

export function RunReviewRoute() {
  const { id = '' } = useParams();
  return <ReviewPage key={id} runId={id} />;
}

export { RunReviewRoute as Component };
