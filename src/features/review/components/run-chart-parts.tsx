import { ReferenceArea, XAxis } from 'recharts';
import type { ChartPoint, PhaseChart } from '../../../../shared/review/chart-series';
import { BAND_WORDS } from '../../../../shared/review/readings';
import { formatMoment, formatRunMinutes } from '../format';

/*
 * Colours come from the display mode's CSS variables, so the chart follows day and night mode.
 * Nothing relies on colour: the band is a shaded strip with its limits written on it, breaches
 * are hatched spans, and readings outside the band carry a solid ▲ (over) or an outlined ▼ (under).
 */
export const INK = 'var(--rs-ink)';
export const MUTED = 'var(--rs-muted)';
export const LINE = 'var(--rs-line)';
export const ACCENT = 'var(--rs-accent)';
export const DANGER = 'var(--rs-danger)';

type DotProps = { cx?: number; cy?: number; index?: number; payload?: ChartPoint };

/** Only readings outside the band get a mark: a solid ▲ over it, an outlined ▽ under it. */
export function BandMark({ cx = 0, cy = 0, index, payload }: DotProps) {
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

export function ChartTooltip({
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

export const TICK = { fill: INK, fontSize: 13 };

/*
 * Recharts reads the type of each child of its chart, so the pieces below are functions that
 * return its elements, called in place, rather than components of our own.
 */

/** The hatching that fills a span where a rule was broken. */
export const hatchPattern = (id: string) => (
  <defs>
    <pattern
      id={id}
      width="8"
      height="8"
      patternUnits="userSpaceOnUse"
      patternTransform="rotate(45)"
    >
      <line x1="0" y1="0" x2="0" y2="8" stroke={DANGER} strokeWidth="3" />
    </pattern>
  </defs>
);

/** The phase's band: a shaded strip with its limits written on it. */
export const bandArea = (band: PhaseChart['band']) => (
  <ReferenceArea
    y1={band.rpmMin}
    y2={band.rpmMax}
    fill={ACCENT}
    fillOpacity={0.14}
    stroke={ACCENT}
    strokeDasharray="6 3"
    label={{
      value: `band ${band.rpmMin}–${band.rpmMax} rpm`,
      position: 'insideTopRight',
      fill: INK,
      fontSize: 13,
    }}
  />
);

/** Each breach as a hatched span, at least a sliver wide so a short one still shows. */
export const breachAreas = (chart: PhaseChart, hatch: string, right: number) =>
  chart.breaches.map((b, i) => (
    <ReferenceArea
      key={i}
      x1={b.fromX}
      x2={Math.max(b.toX, b.fromX + right / 400)}
      fill={`url(#${hatch})`}
      fillOpacity={0.55}
      stroke={DANGER}
      label={{ value: `▲ rule broken`, position: 'insideTop', fill: INK, fontSize: 13 }}
    />
  ));

/** Engine running time in the phase, from 0 to `right` minutes. */
export const timeAxis = (right: number) => (
  <XAxis
    type="number"
    dataKey="x"
    domain={[0, right]}
    tickFormatter={formatRunMinutes}
    stroke={LINE}
    tick={TICK}
    label={{
      value: 'engine running time in this phase',
      position: 'insideBottom',
      offset: -14,
      fill: MUTED,
      fontSize: 13,
    }}
  />
);
