import { positionWords } from '../../../../shared/engines/engine-words';
import { Link } from 'react-router-dom';
import type { BoardRow } from '../../../../shared/review/views';
import { Table, Td, Th } from '../../../components/ui/table';
import { formatDate } from '../../../lib/format';
import { FirstServiceText, FlagList, ProgressBar, RunStatePill, VerdictPill } from './run-badges';

const engineWords = (run: BoardRow) =>
  `${positionWords(run.engine.position)} · ${run.engine.maker} ${run.engine.model}`;
const activity = (run: BoardRow) => (run.lastActivityAt ? formatDate(run.lastActivityAt) : '—');

function RunLink({ run }: { run: BoardRow }) {
  return (
    <Link
      to={`/runs/${run.id}/review`}
      className="inline-flex min-h-touch items-center font-bold underline underline-offset-4"
    >
      {run.vessel.name}
      <span className="sr-only">, {run.engine.position} engine: open the review</span>
    </Link>
  );
}

function BoardTableRow({ run }: { run: BoardRow }) {
  return (
    <tr>
      <Td>
        <RunLink run={run} />
        <p className="text-sm">{engineWords(run)}</p>
        <p className="figures text-sm text-muted">{run.engine.serialNumber}</p>
      </Td>
      <Td>
        <RunStatePill state={run.state} />
      </Td>
      <Td>
        <ProgressBar
          share={run.progress}
          label={`Progress of ${run.vessel.name} ${run.engine.position}`}
        />
        <p className="text-sm text-muted">{run.currentPhaseName ?? 'All phases done'}</p>
      </Td>
      <Td>
        <div className="flex flex-col items-start gap-1">
          <VerdictPill verdict={run.verdict} />
          <FlagList flags={run.flags.filter((f) => f !== 'breach')} breachCount={run.breachCount} />
        </div>
      </Td>
      <Td>
        <FirstServiceText service={run.firstService} />
      </Td>
      <Td className="whitespace-nowrap">{activity(run)}</Td>
    </tr>
  );
}

/** Wide screens: one row per run. */
export function BoardTable({ runs }: { runs: BoardRow[] }) {
  return (
    <Table>
      <caption className="sr-only">Break-in runs of the workshop, what needs action first</caption>
      <thead>
        <tr>
          <Th>Vessel and engine</Th>
          <Th>State</Th>
          <Th>Progress</Th>
          <Th>Verdict and flags</Th>
          <Th>First service</Th>
          <Th>Last activity</Th>
        </tr>
      </thead>
      <tbody>
        {runs.map((run) => (
          <BoardTableRow key={run.id} run={run} />
        ))}
      </tbody>
    </Table>
  );
}

/** Phones: one card per run, the whole card a link. */
export function BoardCards({ runs }: { runs: BoardRow[] }) {
  return (
    <ul className="flex flex-col gap-3" aria-label="Break-in runs">
      {runs.map((run) => (
        <li key={run.id} className="rounded-lg border-2 border-line bg-surface p-3">
          <div className="flex flex-wrap items-center justify-between gap-2">
            <RunLink run={run} />
            <RunStatePill state={run.state} />
          </div>
          <p>
            {engineWords(run)}{' '}
            <span className="figures text-sm text-muted">{run.engine.serialNumber}</span>
          </p>
          <div className="mt-2">
            <ProgressBar
              share={run.progress}
              label={`Progress of ${run.vessel.name} ${run.engine.position}`}
            />
          </div>
          <div className="mt-2 flex flex-wrap gap-1">
            <VerdictPill verdict={run.verdict} />
            <FlagList
              flags={run.flags.filter((f) => f !== 'breach')}
              breachCount={run.breachCount}
            />
          </div>
          <p className="mt-2 text-sm text-muted">Last activity {activity(run)}</p>
        </li>
      ))}
    </ul>
  );
}
