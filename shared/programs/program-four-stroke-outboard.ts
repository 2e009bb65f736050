import { ProgramSchema } from './program.schema';
import { BUILT_IN_FIRST_SERVICE, BUILT_IN_SOURCE, DOCK_RUN_CAUTION } from './built-in-common';

/*
 * Shape from common practice (owners' manuals of several makers): about 10 h in all; first
 * minutes at idle/fast idle; an hour or two below about half throttle, varying speed; then
 * hours below three-quarter throttle with only brief full-throttle bursts; no long steady
 * running and no long idling. The exact minutes and limits are our reading of that practice.
 * We take half and three-quarter throttle as half and three-quarters of rated full-throttle
 * rpm; where a maker gives rpm figures, a workshop's copy of the program should use them.
 */
export const FOUR_STROKE_OUTBOARD = ProgramSchema.parse({
  name: 'Four-stroke outboard, about 10 hours',
  suits: { engineKind: 'outboard-4-stroke', label: 'Four-stroke outboards' },
  source: BUILT_IN_SOURCE,
  firstService: BUILT_IN_FIRST_SERVICE,
  notes:
    'Time counts only while the engine runs inside the phase\u2019s band, so the hours may be spread over several outings. Check the oil level before each outing and the cooling-water tell-tale after every start.',
  phases: [
    {
      id: 'dock-run',
      name: 'First run at the dock',
      performedBy: 'workshop',
      requiredMinutes: 10, // "first minutes at idle/fast idle" (common practice); 10 is our reading
      throttleCeiling: 'idle',
      band: { kind: 'share-of-rated', shareMin: 0, shareMax: 0.5 }, // the lever ceiling binds here; rpm as the next phase
      rules: {},
      instructions: `Start the engine and let it run at idle and fast idle while you check for leaks, charging and steady idling. ${DOCK_RUN_CAUTION}`,
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
        'Keep the throttle at half or less. Change speed now and then, up and down, so the engine never settles at one speed for long. Avoid long spells at idle.',
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
        'Run mostly at three-quarter throttle or less, still changing speed often. Once the boat is on the plane you may open up to full throttle for a minute at most, a few times an hour, then ease back.',
    },
  ],
});
