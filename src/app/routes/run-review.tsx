import { positionWords } from '../../../shared/engines/engine-words';
import { useState } from 'react';
import { useParams } from 'react-router-dom';
import type { DecisionView } from '../../../shared/review/views';
import { AttachmentPanel } from '../../features/attachments/components/attachment-panel';
import { useInvalidateBoard } from '../../features/board/api';
import { useRunReview } from '../../features/review/api';
import { ReviewHistory } from '../../features/review/components/decisions';
import { ReadingsTable } from '../../features/review/components/readings-table';
import { AuditTrail } from '../../features/review/components/run-log';
import { DecideTogetherLink } from './decide-together-link';
import { SignOffForm } from '../../features/review/components/sign-off-form';
import { Card } from '../../components/ui/card';
import { LoadError, Loading } from '../../components/ui/status-message';
import { useSessionUser } from '../shell/session';
import {
  FirstServiceSection,
  LogSection,
  PhasesSection,
  ReviewTop,
  Section,
} from './run-review-parts';

/** Before sign-off staff may take a reading back (the server says the same). */
const VOIDABLE_STATES: readonly string[] = ['under-way', 'submitted', 'returned'];

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
      <title>{`${r.vessel.name}, ${positionWords(r.engine.position)} engine · Review · Ringseat`}</title>
      <ReviewTop review={r} staff={staff} decided={decided} />
      {r.reviews.length > 0 && (
        <Section id="decisions" title="Decisions">
          <ReviewHistory reviews={r.reviews} />
        </Section>
      )}
      <PhasesSection review={r} />
      {r.canDecide && (
        <Card title="Sign-off" id="sign-off" className="scroll-mt-4">
          <DecideTogetherLink vesselId={r.vessel.id} className="mb-4" />
          <SignOffForm
            runId={r.run.id}
            verdict={r.account.verdict}
            phases={r.phases}
            onDecided={(result) => {
              setDecided(result);
              void invalidateBoard();
            }}
          />
        </Card>
      )}
      <Section id="readings" title="Readings">
        <ReadingsTable
          runId={r.run.id}
          total={r.readingCount}
          canVoid={staff && VOIDABLE_STATES.includes(r.run.state)}
        />
      </Section>
      <Section id="photos" title="Photos and documents">
        <AttachmentPanel
          recordType="run"
          recordId={r.run.id}
          canAdd={open}
          canRemove={staff && open}
        />
      </Section>
      <LogSection review={r} />
      <FirstServiceSection review={r} />
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
