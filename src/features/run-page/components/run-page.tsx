import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { positionWords } from '../../../../shared/engines/engine-words';
import { RUN_STATE_WORDS, VERDICT_WORDS } from '../../../../shared/review/run-words';
import type { RunReviewView } from '../../../../shared/review/views';
import type { RunDetail } from '../../../../shared/runs/run-view';
import { CautionCard } from '../../../components/caution-card';
import { buttonClass } from '../../../components/ui/button';
import { LoadError, Loading } from '../../../components/ui/status-message';
import { formatDate } from '../../../lib/format';
import { certificateUrl, useRunDetail, useRunOverview } from '../api';
import { RerunPhases, WorkshopComments } from './decisions';
import { FirstService } from './first-service';
import { RunPhaseList } from './run-phases';

const OPEN = new Set<RunDetail['state']>(['planned', 'under-way', 'returned']);

function Section({ id, title, children }: { id: string; title: string; children: ReactNode }) {
  return (
    <section aria-labelledby={id} className="flex flex-col gap-2">
      <h2 id={id} className="text-xl font-bold">
        {title}
      </h2>
      {children}
    </section>
  );
}

/** The phases sent back at the workshop's latest return, while the run is still to be run again. */
function rerunIdsOf(run: RunDetail): Set<string> {
  const last = run.lastDecision;
  return new Set(last?.decision === 'returned' && OPEN.has(run.state) ? last.rerunPhaseIds : []);
}

/** One run for whoever may see it: where it stands, why, what the workshop said, what comes next. */
export function RunPage({ runId, staff }: { runId: string; staff: boolean }) {
  const detail = useRunDetail(runId);
  const overview = useRunOverview(runId);
  if (detail.isPending || overview.isPending) return <Loading label="Loading the run…" />;
  if (detail.isError || overview.isError) {
    const retry = () => void Promise.all([detail.refetch(), overview.refetch()]);
    return <LoadError error={detail.error ?? overview.error} what="this run" onRetry={retry} />;
  }
  return <RunPageView run={detail.data} overview={overview.data} staff={staff} />;
}

function RunPageView({
  run,
  overview,
  staff,
}: {
  run: RunDetail;
  overview: RunReviewView;
  staff: boolean;
}) {
  const rerunIds = rerunIdsOf(run);
  const names = run.program.phases.filter((p) => rerunIds.has(p.id)).map((p) => p.name);
  return (
    <div className="flex flex-col gap-6">
      <title>{`${run.vessel.name}, ${positionWords(run.engine.position)} engine · Ringseat`}</title>
      <RunHeader run={run} overview={overview} staff={staff} />
      {names.length > 0 && <RerunPhases names={names} />}
      {run.submitNote && (
        <Section id="submit-note" title="Your note to the workshop">
          <p className="whitespace-pre-line">{run.submitNote}</p>
        </Section>
      )}
      {overview.certificate && run.state === 'signed-off' && (
        <Certificate runId={run.id} certificate={overview.certificate} />
      )}
      <Section id="comments" title="The workshop's comments">
        <WorkshopComments reviews={overview.reviews} />
      </Section>
      <Section id="phases" title="Phases">
        <RunPhaseList phases={overview.phases} rerunIds={rerunIds} />
      </Section>
      <Section id="first-service" title="First service">
        <FirstService service={overview.firstService} />
      </Section>
      {OPEN.has(run.state) && <CautionCard />}
    </div>
  );
}

/** The signed-off run's certificate: its number, when, and the PDF. */
function Certificate({
  runId,
  certificate,
}: {
  runId: string;
  certificate: NonNullable<RunReviewView['certificate']>;
}) {
  return (
    <Section id="certificate" title="Certificate">
      <p>
        Certificate <strong className="figures">{certificate.number}</strong>, issued{' '}
        {formatDate(certificate.issuedAt)}.
      </p>
      <a href={certificateUrl(runId)} download className={buttonClass('primary', 'self-start')}>
        Download the certificate
      </a>
    </Section>
  );
}

type HeaderProps = { run: RunDetail; overview: RunReviewView; staff: boolean };

function RunHeader({ run, overview, staff }: HeaderProps) {
  const { engine } = run;
  return (
    <header className="flex flex-col gap-2">
      <h1 className="text-3xl font-bold">{run.vessel.name}</h1>
      <p>
        {positionWords(engine.position)} engine · {engine.maker} {engine.model} · serial{' '}
        <span className="figures">{engine.serialNumber}</span> · {run.programName}
      </p>
      <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1">
        <dt className="text-muted">State</dt>
        <dd className="font-bold">{RUN_STATE_WORDS[run.state]}</dd>
        <dt className="text-muted">Verdict</dt>
        <dd className="font-bold">{VERDICT_WORDS[overview.account.verdict]}</dd>
        {run.submittedAt && (
          <>
            <dt className="text-muted">Submitted</dt>
            <dd>{formatDate(run.submittedAt)}</dd>
          </>
        )}
      </dl>
      <RunLinks run={run} staff={staff} />
    </header>
  );
}

/** Where to go from here: the deck while there is running to do, the full review for staff. */
function RunLinks({ run, staff }: Omit<HeaderProps, 'overview'>) {
  return (
    <div className="flex flex-wrap gap-3">
      {OPEN.has(run.state) && (
        // The deck is its own app: a plain link loads it.
        <a href={`/deck/${encodeURIComponent(run.vessel.id)}`} className={buttonClass('secondary')}>
          On deck
        </a>
      )}
      {staff && (
        <Link
          to={`/runs/${encodeURIComponent(run.id)}/review`}
          className={buttonClass('secondary')}
        >
          Full review
        </Link>
      )}
    </div>
  );
}
