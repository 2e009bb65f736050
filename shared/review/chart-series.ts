import type { RpmBand } from '../programs/phase-band.schema';
import type { ResolvedPhase } from '../programs/resolve-band';
import { bandState, type BandState, type ReasonCode } from '../runs/phase-rules';
import type { RunAccount } from '../runs/run-accounting';
import type { RunEvent } from '../runs/run-event.schema';
import { walkTimeline } from '../runs/timeline';
import { keepIndices } from './downsample';
import { withoutVoided } from '../runs/voids';

/*
 * The review chart plots each phase against its own running time (minutes the engine ran in
 * that phase), not the wall clock: a phase spread over outings days apart would otherwise be a
 * few thin slivers with empty days between. Where one outing ends and the next begins is marked.
 */

export interface ChartPoint {
  /** Minutes of engine running within the phase when this reading began to count. */
  x: number;
  /** Device time of the reading, epoch ms. */
  at: number;
  rpm: number;
  state: BandState;
}

export interface ChartBreach {
  code: ReasonCode;
  message: string;
  fromMs: number;
  toMs: number;
  fromX: number;
  toX: number;
}

export interface PhaseChart {
  phaseId: string;
  band: RpmBand;
  requiredMinutes: number;
  /** Minutes the engine ran in this phase (in band or not). */
  runMinutes: number;
  /** Readings that counted toward this phase, before thinning. */
  readingCount: number;
  /** Device time the phase first and last counted engine time; null when it never ran. */
  firstAt: number | null;
  lastAt: number | null;
  points: ChartPoint[];
  /** x of each outing after the first. */
  outingStarts: number[];
  breaches: ChartBreach[];
}

interface Segments {
  from: number[];
  to: number[];
  rpm: number[];
  state: BandState[];
  /** Running minutes at each segment's start. */
  x: number[];
  runMs: number;
}

const MINUTE = 60_000;
const round3 = (n: number) => Math.round(n * 1000) / 1000;

/** Where on the phase's running-time axis the instant `t` falls; gaps collapse to the next start. */
export function xAt(segments: Pick<Segments, 'from' | 'to' | 'x'>, t: number): number {
  const { from, to, x } = segments;
  if (from.length === 0 || t <= from[0]) return 0;
  let lo = 0;
  let hi = from.length - 1;
  while (lo < hi) {
    const mid = (lo + hi + 1) >> 1;
    if (from[mid] <= t) lo = mid;
    else hi = mid - 1;
  }
  const held = Math.min(t, to[lo]) - from[lo];
  return round3(x[lo] + held / MINUTE);
}

function collectSegments(
  ordered: readonly RunEvent[],
  phases: readonly ResolvedPhase[],
  maxHoldMs?: number,
): Map<string, Segments> {
  const byPhase = new Map<string, Segments>(
    phases.map((p) => [p.id, { from: [], to: [], rpm: [], state: [], x: [], runMs: 0 }]),
  );
  const phaseById = new Map(phases.map((p) => [p.id, p]));
  walkTimeline(ordered, { maxHoldMs }, (reading, toMs) => {
    const segments = byPhase.get(reading.phaseId);
    if (!segments) return;
    segments.from.push(reading.at);
    segments.to.push(toMs);
    segments.rpm.push(reading.rpm);
    segments.state.push(bandState(reading.rpm, reading.throttle, phaseById.get(reading.phaseId)!));
    segments.x.push(segments.runMs / MINUTE);
    segments.runMs += toMs - reading.at;
  });
  return byPhase;
}

function outingStarts(s: Segments): number[] {
  const starts: number[] = [];
  for (let i = 1; i < s.from.length; i++)
    if (s.from[i] !== s.to[i - 1]) starts.push(round3(s.x[i]));
  return starts;
}

/** One chart per phase: thinned points, the band, outing marks and every breach as a span. */
export function phaseCharts(
  ordered: readonly RunEvent[],
  phases: readonly ResolvedPhase[],
  account: RunAccount,
  options: { maxPoints?: number; maxHoldMs?: number } = {},
): PhaseChart[] {
  const maxPoints = options.maxPoints ?? 600;
  // Voided readings are not drawn: they hold no time (shared/runs/voids.ts).
  const byPhase = collectSegments(withoutVoided(ordered), phases, options.maxHoldMs);
  return phases.map((phase, index) => {
    const s = byPhase.get(phase.id)!;
    const kept = keepIndices(
      s.x,
      s.rpm,
      s.state.map((st) => st !== 'in-band'),
      maxPoints,
    );
    const reasons = account.phases[index]?.reasons ?? [];
    return {
      phaseId: phase.id,
      band: phase.band,
      requiredMinutes: phase.requiredMs / MINUTE,
      runMinutes: round3(s.runMs / MINUTE),
      readingCount: s.from.length,
      firstAt: s.from.length > 0 ? s.from[0] : null,
      lastAt: s.to.length > 0 ? s.to[s.to.length - 1] : null,
      points: kept.map((i) => ({
        x: round3(s.x[i]),
        at: s.from[i],
        rpm: s.rpm[i],
        state: s.state[i],
      })),
      outingStarts: outingStarts(s),
      breaches: reasons
        .filter((r) => r.code !== 'short-of-time' && r.fromMs !== null && r.toMs !== null)
        .map((r) => ({
          code: r.code,
          message: r.message,
          fromMs: r.fromMs!,
          toMs: r.toMs!,
          fromX: xAt(s, r.fromMs!),
          toX: xAt(s, r.toMs!),
        })),
    };
  });
}
