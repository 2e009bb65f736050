import { ProgramSchema } from './program.schema';
import { BUILT_IN_FIRST_SERVICE, BUILT_IN_SOURCE, DOCK_RUN_CAUTION } from './built-in-common';

/*
 * Our references give no separate schedule for two-strokes, so this uses the outboard shape
 * (common practice, owners' manuals of several makers): first minutes at idle, an hour or two
 * below half throttle, then hours below three-quarter with brief bursts, about 10 h in all.
 * The exact minutes and limits are our reading of that practice.
 */
// 25:1 instead of 50:1 for the first tank(s) on many premix engines (common practice, varies by engine)
const PREMIX_NOTE =
  'Premix engines: many makers ask for a richer oil mix, often 25:1 instead of 50:1, for the first tank or two. This varies by engine: use the ratio in your manual. Engines with oil injection have their own break-in oil rules: follow the manual.';

export const TWO_STROKE_OUTBOARD = ProgramSchema.parse({
  name: 'Two-stroke outboard, about 10 hours',
  suits: { engineKind: 'outboard-2-stroke', label: 'Two-stroke outboards' },
  source: BUILT_IN_SOURCE,
  firstService: BUILT_IN_FIRST_SERVICE,
  notes: PREMIX_NOTE,
  phases: [
    {
      id: 'dock-run',
      name: 'First run at the dock',
      performedBy: 'workshop',
      requiredMinutes: 10, // "first minutes at idle/fast idle" (common practice); 10 is our reading
      throttleCeiling: 'idle',
      band: { kind: 'share-of-rated', shareMin: 0, shareMax: 0.5 }, // the lever ceiling binds here; rpm as the next phase
      rules: {},
      instructions: `Fill the tank with the break-in mix before starting. Run at idle and fast idle, checking the tell-tale, charging and a steady idle. ${DOCK_RUN_CAUTION}`,
    },
    {
      id: 'below-half',
      name: 'Below half throttle, changing speed',
      performedBy: 'skipper',
      requiredMinutes: 110, // with the dock run, "an hour or two" below half (common practice)
      throttleCeiling: 'half',
      band: { kind: 'share-of-rated', shareMin: 0, shareMax: 0.5 }, // half throttle ≈ half rated rpm (common practice)
      // "vary speed", "no long idling" (common practice); 15 and 10 min are our reading
      rules: { changeSpeedEveryMinutes: 15, idleMaxMinutes: 10 },
      instructions:
        'Keep the throttle at half or less and keep changing speed. Keep spells at idle short.',
    },
    {
      id: 'below-three-quarter',
      name: 'Below three-quarter throttle, short full-throttle bursts',
      performedBy: 'skipper',
      requiredMinutes: 480, // brings the total to about 10 h (common practice)
      throttleCeiling: 'three-quarter',
      band: { kind: 'share-of-rated', shareMin: 0, shareMax: 0.75 }, // ¾ throttle ≈ ¾ rated rpm (common practice)
      // "only brief full-throttle bursts" (common practice); 60 s and 5 min an hour are our reading
      rules: {
        changeSpeedEveryMinutes: 15,
        fullThrottleMaxSeconds: 60,
        fullThrottleMaxMinutesPerHour: 5,
        idleMaxMinutes: 10,
      },
      instructions:
        'Run mostly at three-quarter throttle or less, changing speed often. Short bursts of full throttle, a minute at most, are fine once on the plane. Go back to the normal oil mix only when the manual says so.',
    },
  ],
});
