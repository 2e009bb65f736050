import { Link } from 'react-router-dom';
import { RUN_STATE_WORDS, VERDICT_WORDS } from '../../../../shared/review/run-words';
import type { EngineRunRow } from '../../../../shared/service/service-views';
import { Pill } from '../../../components/ui/pill';
import { LoadError, Loading } from '../../../components/ui/status-message';
import { formatDate } from '../../../lib/format';
import { certificateUrl, useEngineRuns } from '../api';

const VERDICT_MARK = { complete: '✓', incomplete: '…', breached: '▲' } as const;

/** The dates that matter for the run's state, in words. */
function datesOf(run: EngineRunRow): string {
  const parts = [`Assigned ${formatDate(run.createdAt)}`];
  if (run.submittedAt) parts.push(`submitted ${formatDate(run.submittedAt)}`);
  if (run.signedOffAt) parts.push(`signed off ${formatDate(run.signedOffAt)}`);
  return parts.join(', ');
}

function RunItem({ run }: { run: EngineRunRow }) {
  return (
    <li className="flex flex-col gap-2 rounded-md border-2 border-line p-3">
      <div className="flex flex-wrap items-center gap-2">
        <span className="font-bold">{run.programName}</span>
        <Pill tone={run.state === 'signed-off' ? 'solid' : 'outline'}>
          {RUN_STATE_WORDS[run.state] ?? run.state}
        </Pill>
        <Pill tone={run.verdict === 'breached' ? 'solid' : 'quiet'}>
          <span aria-hidden="true">{VERDICT_MARK[run.verdict]}</span>
          {VERDICT_WORDS[run.verdict]}
        </Pill>
        <span className="figures text-sm">{Math.round(run.progress * 100)} % done</span>
      </div>
      <p className="text-sm text-muted">{datesOf(run)}</p>
      <div className="flex flex-wrap gap-x-5 gap-y-1">
        <Link
          to={`/runs/${run.id}/review`}
          className="flex min-h-touch items-center underline underline-offset-4"
        >
          Open the review
        </Link>
        {run.certificateNumber && (
          <a
            href={certificateUrl(run.id)}
            download
            className="flex min-h-touch items-center underline underline-offset-4"
          >
            Certificate {run.certificateNumber} (PDF)
          </a>
        )}
      </div>
    </li>
  );
}

/** Every break-in run of the engine, newest first, each with its review and certificate. */
export function EngineRuns({ engineId }: { engineId: string }) {
  const runs = useEngineRuns(engineId);
  if (runs.isPending) return <Loading label="Loading the runs…" />;
  if (runs.isError)
    return <LoadError error={runs.error} what="the runs" onRetry={() => runs.refetch()} />;
  if (runs.data.length === 0)
    return <p className="text-muted">No break-in program has been assigned to this engine yet.</p>;
  return (
    <ul className="flex flex-col gap-3" aria-label="Break-in runs of this engine">
      {runs.data.map((run) => (
        <RunItem key={run.id} run={run} />
      ))}
    </ul>
  );
}
