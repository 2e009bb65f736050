import {
  CartesianGrid,
  ComposedChart,
  Line,
  ReferenceArea,
  ReferenceLine,
  ResponsiveContainer,
  Tooltip,
  XAxis,
  YAxis,
} from 'recharts';
import type { ChartPoint, PhaseChart } from '../../../../shared/review/chart-series';
import { BAND_WORDS } from '../../../../shared/review/readings';
import { formatMoment, formatRunMinutes } from '../format';

/*
 * Colours come from the display mode's CSS variables, so the chart follows day and night mode.
 * Nothing relies on colour: the band is a shaded strip with its limits written on it, breaches
 * are hatched spans, and readings outside the band carry a solid ▲ (over) or an outlined ▼ (under).
 */
const INK = 'var(--rs-ink)';
const MUTED = 'var(--rs-muted)';
const LINE = 'var(--rs-line)';
const ACCENT = 'var(--rs-accent)';
const DANGER = 'var(--rs-danger)';

type DotProps = { cx?: number; cy?: number; index?: number; payload?: ChartPoint };

/** Only readings outside the band get a mark: a solid ▲ over it, an outlined ▽ under it. */
function BandMark({ cx = 0, cy = 0, index, payload }: DotProps) {
  if (payload?.state === 'over')
    return (
      <path
        key={index}
        d={`M${cx} ${cy - 7}L${cx + 6} ${cy + 5}L${cx - 6} ${cy + 5}Z`}
        fill={DANGER}
        stroke={INK}
        strokeWidth={1}
      />
    );
  if (payload?.state === 'under')
    return (
      <path
        key={index}
        d={`M${cx} ${cy + 7}L${cx + 6} ${cy - 5}L${cx - 6} ${cy - 5}Z`}
        fill="none"
        stroke={DANGER}
        strokeWidth={2}
      />
    );
  return <g key={index} />;
}

function ChartTooltip({
  active,
  payload,
}: {
  active?: boolean;
  payload?: Array<{ payload: ChartPoint }>;
}) {
  const point = active ? payload?.[0]?.payload : undefined;
  if (!point) return null;
  return (
    <div className="rounded-md border-2 border-ink bg-surface p-2 text-sm text-ink">
      <p className="figures font-bold">
        {point.rpm} rpm, {BAND_WORDS[point.state]}
      </p>
      <p>{formatMoment(point.at)} (device clock)</p>
      <p className="text-muted">{formatRunMinutes(point.x)} into the phase</p>
    </div>
  );
}

export default function RunChart({
  chart,
  ratedRpmMax,
  title,
}: {
  chart: PhaseChart;
  ratedRpmMax: number;
  title: string;
}) {
  const top =
    Math.ceil(Math.max(ratedRpmMax, chart.band.rpmMax, ...chart.points.map((p) => p.rpm)) / 500) *
    500;
  const right = Math.max(chart.runMinutes, 1);
  const hatch = `hatch-${chart.phaseId}`;
  return (
    <div
      role="img"
      aria-label={`Chart of engine speed for ${title}; described above.`}
      className="h-72 w-full sm:h-80"
    >
      <ResponsiveContainer width="100%" height="100%">
        <ComposedChart data={chart.points} margin={{ top: 12, right: 16, bottom: 22, left: 8 }}>
          <defs>
            <pattern
              id={hatch}
              width="8"
              height="8"
              patternUnits="userSpaceOnUse"
              patternTransform="rotate(45)"
            >
              <line x1="0" y1="0" x2="0" y2="8" stroke={DANGER} strokeWidth="3" />
            </pattern>
          </defs>
          <CartesianGrid stroke={LINE} strokeDasharray="2 4" />
          <ReferenceArea
            y1={chart.band.rpmMin}
            y2={chart.band.rpmMax}
            fill={ACCENT}
            fillOpacity={0.14}
            stroke={ACCENT}
            strokeDasharray="6 3"
            label={{
              value: `band ${chart.band.rpmMin}–${chart.band.rpmMax} rpm`,
              position: 'insideTopRight',
              fill: INK,
              fontSize: 13,
            }}
          />
          {chart.breaches.map((b, i) => (
            <ReferenceArea
              key={i}
              x1={b.fromX}
              x2={Math.max(b.toX, b.fromX + right / 400)}
              fill={`url(#${hatch})`}
              fillOpacity={0.55}
              stroke={DANGER}
              label={{ value: `▲ rule broken`, position: 'insideTop', fill: INK, fontSize: 13 }}
            />
          ))}
          {chart.outingStarts.map((x) => (
            <ReferenceLine key={x} x={x} stroke={MUTED} strokeDasharray="4 4" />
          ))}
          <XAxis
            type="number"
            dataKey="x"
            domain={[0, right]}
            tickFormatter={formatRunMinutes}
            stroke={LINE}
            tick={{ fill: INK, fontSize: 13 }}
            label={{
              value: 'engine running time in this phase',
              position: 'insideBottom',
              offset: -14,
              fill: MUTED,
              fontSize: 13,
            }}
          />
          <YAxis
            type="number"
            domain={[0, top]}
            stroke={LINE}
            tick={{ fill: INK, fontSize: 13 }}
            width={52}
          />
          <Tooltip content={<ChartTooltip />} cursor={{ stroke: INK, strokeDasharray: '3 3' }} />
          <Line
            type="stepAfter"
            dataKey="rpm"
            stroke={INK}
            strokeWidth={2}
            dot={BandMark}
            activeDot={{ r: 5, fill: INK }}
            isAnimationActive={false}
          />
        </ComposedChart>
      </ResponsiveContainer>
    </div>
  );
}
