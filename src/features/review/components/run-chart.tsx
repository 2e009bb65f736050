import {
  CartesianGrid,
  ComposedChart,
  Line,
  ReferenceLine,
  ResponsiveContainer,
  Tooltip,
  YAxis,
} from 'recharts';
import type { PhaseChart } from '../../../../shared/review/chart-series';
import {
  bandArea,
  BandMark,
  breachAreas,
  ChartTooltip,
  hatchPattern,
  INK,
  LINE,
  MUTED,
  TICK,
  timeAxis,
} from './run-chart-parts';

/** The rpm axis reaches past the rated top, the band and every reading, in steps of 500. */
const rpmTop = (chart: PhaseChart, ratedRpmMax: number) =>
  Math.ceil(Math.max(ratedRpmMax, chart.band.rpmMax, ...chart.points.map((p) => p.rpm)) / 500) *
  500;

export default function RunChart({
  chart,
  ratedRpmMax,
  title,
}: {
  chart: PhaseChart;
  ratedRpmMax: number;
  title: string;
}) {
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
          {hatchPattern(hatch)}
          <CartesianGrid stroke={LINE} strokeDasharray="2 4" />
          {bandArea(chart.band)}
          {breachAreas(chart, hatch, right)}
          {chart.outingStarts.map((x) => (
            <ReferenceLine key={x} x={x} stroke={MUTED} strokeDasharray="4 4" />
          ))}
          {timeAxis(right)}
          <YAxis
            type="number"
            domain={[0, rpmTop(chart, ratedRpmMax)]}
            stroke={LINE}
            tick={TICK}
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
