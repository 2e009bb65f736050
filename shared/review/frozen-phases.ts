import type { RpmBand } from '../programs/phase-band.schema';
import type { Program } from '../programs/program.schema';
import type { ResolvedPhase } from '../programs/resolve-band';

const MS_PER_MINUTE = 60_000;

/**
 * A run's phases ready for accounting, from its frozen program and frozen bands. The bands were
 * resolved for the engine at assignment; reading them back (rather than resolving again) keeps a
 * run judged against exactly what the skipper was shown, whatever happens to the engine record.
 * `rerunFrom` holds, for each phase the workshop sent back, the moment it was sent back (the
 * re-run rule in shared/runs/phase-tally.ts).
 */
export function frozenPhases(
  program: Pick<Program, 'phases'>,
  bands: Record<string, RpmBand>,
  rerunFrom: Readonly<Record<string, number>>,
): ResolvedPhase[] {
  return program.phases.map((phase) => {
    const { band: _band, requiredMinutes, ...rest } = phase;
    const frozen = bands[phase.id];
    if (!frozen) throw new Error(`The run has no frozen band for phase "${phase.id}".`);
    const countsFromMs = rerunFrom[phase.id];
    return {
      ...rest,
      band: frozen,
      requiredMs: requiredMinutes * MS_PER_MINUTE,
      ...(countsFromMs !== undefined ? { countsFromMs } : {}),
    };
  });
}
