import type { PhaseChart } from '../../../../shared/review/chart-series';
import type { ReviewPhase } from '../../../../shared/review/views';
import { formatRunMinutes } from '../format';

/** The chart in words, for screen readers and for anyone who cannot make out the lines. */
export function ChartSummary({ phase, chart }: { phase: ReviewPhase; chart: PhaseChart }) {
  if (chart.points.length === 0)
    return (
      <span className="text-muted">
        No engine time logged in this phase yet, so there is nothing to chart.
      </span>
    );
  const thinned = chart.readingCount > chart.points.length;
  const breaches = chart.breaches.length;
  return (
    <span>
      Engine speed over <span className="figures">{formatRunMinutes(chart.runMinutes)}</span> of
      running in this phase
      {chart.outingStarts.length > 0 && (
        <>, across {chart.outingStarts.length + 1} outings (dashed lines)</>
      )}
      ; the band of{' '}
      <span className="figures">
        {phase.band.rpmMin}–{phase.band.rpmMax}
      </span>{' '}
      rpm is the shaded strip.{' '}
      {breaches === 0
        ? 'No stretch broke a rule.'
        : `${breaches} ${breaches === 1 ? 'stretch that broke a rule is' : 'stretches that broke a rule are'} hatched, with ▲ on readings outside the band.`}
      {thinned && (
        <span className="text-muted">
          {' '}
          {chart.readingCount} readings, drawn as {chart.points.length} points (highs, lows and
          every excursion kept).
        </span>
      )}
    </span>
  );
}
