import { lazy, Suspense } from 'react';
import type { PhaseChart } from '../../../../shared/review/chart-series';
import { CEILING_WORDS } from '../../../../shared/review/certificate-words';
import type { ReviewPhase } from '../../../../shared/review/views';
import { Card } from '../../../components/ui/card';
import { formatDuration, formatSpan } from '../format';
import { ChartSummary } from './chart-summary';
import { VerdictMark } from './verdict-mark';

// The chart library is large: it loads with this page only, never with the deck or the board.
const RunChart = lazy(() => import('./run-chart'));

function Figures({ phase }: { phase: ReviewPhase }) {
  const items: Array<[string, string]> = [
    ['Required in band', formatDuration(phase.requiredMs)],
    ['In band', formatDuration(phase.timeInBandMs)],
    ['Over the band', formatDuration(phase.timeOverMs)],
    ['Under the band', formatDuration(phase.timeUnderMs)],
    ['Longest full throttle', formatDuration(phase.longestFullThrottleMs)],
  ];
  return (
    <dl className="grid grid-cols-2 gap-x-4 gap-y-1 sm:grid-cols-5">
      {items.map(([label, value]) => (
        <div key={label}>
          <dt className="text-sm text-muted">{label}</dt>
          <dd className="figures text-lg font-bold">{value}</dd>
        </div>
      ))}
    </dl>
  );
}

function Reasons({ phase }: { phase: ReviewPhase }) {
  if (phase.reasons.length === 0)
    return <p>Nothing to remark: every rule of this phase was kept.</p>;
  return (
    <ul className="flex flex-col gap-2" aria-label={`What the log shows for ${phase.name}`}>
      {phase.reasons.map((reason, i) => (
        <li key={i} className="flex gap-2">
          <span aria-hidden="true" className="font-bold">
            {reason.code === 'short-of-time' ? '…' : '▲'}
          </span>
          <span>
            {reason.message}
            {reason.fromMs !== null && reason.toMs !== null && (
              <span className="block text-sm text-muted figures">
                {formatSpan(reason.fromMs, reason.toMs)}
              </span>
            )}
          </span>
        </li>
      ))}
    </ul>
  );
}

/** The phase's number and name, who runs it, its band and ceiling, when it ran, and its verdict. */
function PhaseHeader({ phase, index }: { phase: ReviewPhase; index: number }) {
  return (
    <div className="mb-3 flex flex-wrap items-start justify-between gap-2">
      <div>
        <h3 id={`phase-${phase.id}`} className="text-lg font-bold">
          {index + 1}. {phase.name}
        </h3>
        <p className="text-muted">
          {phase.performedBy === 'workshop' ? 'By the workshop' : 'By the skipper'} · band{' '}
          <span className="figures">
            {phase.band.rpmMin}–{phase.band.rpmMax}
          </span>{' '}
          rpm, {CEILING_WORDS[phase.throttleCeiling]}
          {phase.firstAt !== null && phase.lastAt !== null && (
            <> · run {formatSpan(phase.firstAt, phase.lastAt)}</>
          )}
        </p>
      </div>
      <VerdictMark verdict={phase.verdict} />
    </div>
  );
}

/** The chart with its summary in words as the caption; the chart loads on its own. */
function ChartFigure({
  phase,
  chart,
  ratedRpmMax,
}: {
  phase: ReviewPhase;
  chart: PhaseChart;
  ratedRpmMax: number;
}) {
  return (
    <figure className="flex flex-col gap-2">
      <figcaption>
        <ChartSummary phase={phase} chart={chart} />
      </figcaption>
      {chart.points.length > 0 && (
        <Suspense
          fallback={
            <p role="status" className="text-muted">
              Loading the chart…
            </p>
          }
        >
          <RunChart chart={chart} ratedRpmMax={ratedRpmMax} title={phase.name} />
        </Suspense>
      )}
    </figure>
  );
}

/** One phase: its band, its figures, every reason in words and when, and the chart. */
export function PhaseSection({
  phase,
  chart,
  index,
  ratedRpmMax,
}: {
  phase: ReviewPhase;
  chart: PhaseChart;
  index: number;
  ratedRpmMax: number;
}) {
  return (
    <Card level={3} aria-labelledby={`phase-${phase.id}`}>
      <PhaseHeader phase={phase} index={index} />
      <div className="flex flex-col gap-4">
        <Figures phase={phase} />
        <Reasons phase={phase} />
        <ChartFigure phase={phase} chart={chart} ratedRpmMax={ratedRpmMax} />
      </div>
    </Card>
  );
}
