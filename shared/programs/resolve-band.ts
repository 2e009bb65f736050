import { z } from 'zod/mini';
import '../zod-english';
import type { RpmBand } from './phase-band.schema';
import type { Phase, Program } from './program.schema';

export const EngineRatingSchema = z
  .object({
    ratedRpmMin: z
      .number({ error: 'Enter the lowest rated full-throttle rpm (ratedRpmMin).' })
      .check(
        z.positive({
          error: 'The lowest rated full-throttle rpm (ratedRpmMin) must be more than zero.',
        }),
      ),
    ratedRpmMax: z
      .number({ error: 'Enter the highest rated full-throttle rpm (ratedRpmMax).' })
      .check(
        z.positive({
          error: 'The highest rated full-throttle rpm (ratedRpmMax) must be more than zero.',
        }),
      ),
  })
  .check(
    z.refine((r) => r.ratedRpmMin < r.ratedRpmMax, {
      error:
        'The highest rated full-throttle rpm (ratedRpmMax) must be above the lowest (ratedRpmMin).',
      path: ['ratedRpmMax'],
    }),
  );
/** The engine's rated full-throttle rpm range, from its maker. */
export type EngineRating = z.infer<typeof EngineRatingSchema>;

/**
 * A phase's band in engine rpm. Share bands are shares of the top of the rated range,
 * rounded to whole rpm because that is what a tachometer shows.
 */
export function resolvePhaseBand(phase: Pick<Phase, 'band'>, engine: EngineRating): RpmBand {
  const { band } = phase;
  if (band.kind === 'absolute') return { rpmMin: band.rpmMin, rpmMax: band.rpmMax };
  return {
    rpmMin: Math.round(band.shareMin * engine.ratedRpmMax),
    rpmMax: Math.round(band.shareMax * engine.ratedRpmMax),
  };
}

/** A phase ready for accounting: the band in rpm and the required time in milliseconds. */
export interface ResolvedPhase extends Omit<Phase, 'band' | 'requiredMinutes'> {
  band: RpmBand;
  requiredMs: number;
  /**
   * Set when the workshop sent the phase back to be run again: only time from this instant
   * counts toward it (the re-run rule at the top of shared/runs/phase-tally.ts).
   */
  countsFromMs?: number;
}

const MS_PER_MINUTE = 60_000;

export const resolveProgramPhases = (
  program: Pick<Program, 'phases'>,
  engine: EngineRating,
): ResolvedPhase[] =>
  program.phases.map((phase) => {
    const { band, requiredMinutes, ...rest } = phase;
    return {
      ...rest,
      band: resolvePhaseBand({ band }, engine),
      requiredMs: requiredMinutes * MS_PER_MINUTE,
    };
  });

export interface ProgramFieldIssue {
  /** Dotted path, e.g. `phases.2.band.rpmMax`. */
  field: string;
  message: string;
}

/** Rejects phases whose band reaches above the engine's rated full-throttle maximum. */
export function checkProgramForEngine(
  program: Pick<Program, 'phases'>,
  engine: EngineRating,
): { ok: true } | { ok: false; issues: ProgramFieldIssue[] } {
  const issues: ProgramFieldIssue[] = [];
  program.phases.forEach((phase, index) => {
    const band = resolvePhaseBand(phase, engine);
    if (band.rpmMax > engine.ratedRpmMax) {
      issues.push({
        field: `phases.${index}.band.rpmMax`,
        message: `Phase ${index + 1} ("${phase.name}") allows up to ${band.rpmMax} rpm (rpmMax), above this engine's rated maximum of ${engine.ratedRpmMax} rpm.`,
      });
    }
  });
  return issues.length === 0 ? { ok: true } : { ok: false, issues };
}
