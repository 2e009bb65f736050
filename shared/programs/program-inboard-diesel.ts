import { ProgramSchema } from './program.schema';
import { BUILT_IN_FIRST_SERVICE, BUILT_IN_SOURCE, DOCK_RUN_CAUTION } from './built-in-common';

/*
 * Small diesels: 20–50 h (up to 100) mostly at 50–75 % load; full power no more than about
 * 5 minutes at a time; avoid long idling, which glazes the cylinder walls (common practice;
 * US Army TM 5-3805-254-14&P for a non-marine diesel). We ship the 20 h floor.
 *
 * Load is not rpm. On a fixed propeller the power absorbed rises about with the cube of rpm
 * (the propeller law; common practice, from memory), so 50–75 % load sits at about
 * ∛0.5 ≈ 79 % to ∛0.75 ≈ 91 % of rated rpm. The shares are computed, not typed in.
 */
const PROPELLER_LAW_EXPONENT = 3; // propeller law, common practice (from memory)
const loadToRpmShare = (load: number) => load ** (1 / PROPELLER_LAW_EXPONENT);

export const INBOARD_DIESEL = ProgramSchema.parse({
  name: 'Small inboard diesel, about 20 hours',
  suits: { engineKind: 'inboard-diesel', label: 'Small inboard diesels' },
  source: BUILT_IN_SOURCE,
  firstService: BUILT_IN_FIRST_SERVICE,
  notes:
    'Many makers ask for a longer break-in, up to 50 h or even 100 h: lengthen the loaded-running phase to match your manual. Check the oil level before every outing.',
  phases: [
    {
      id: 'dock-checks',
      name: 'First start and checks at the dock',
      performedBy: 'workshop',
      requiredMinutes: 10, // short on purpose: "avoid long idling" (common practice); 10 is our reading
      throttleCeiling: 'idle',
      band: { kind: 'share-of-rated', shareMin: 0, shareMax: 0.5 }, // the lever ceiling binds here
      rules: {},
      instructions: `Start, check oil pressure, cooling-water flow, charging and leaks, then get under way: do not leave a new diesel idling. ${DOCK_RUN_CAUTION}`,
    },
    {
      id: 'loaded-running',
      name: 'Under load, half to three-quarter load',
      performedBy: 'skipper',
      requiredMinutes: 1200, // 20 h, the floor of 20–50 h (common practice; TM 5-3805-254-14&P)
      throttleCeiling: 'varied',
      // 50–75 % load (common practice; TM 5-3805-254-14&P), as rpm by the propeller law above
      band: {
        kind: 'share-of-rated',
        shareMin: loadToRpmShare(0.5),
        shareMax: loadToRpmShare(0.75),
      },
      // full power ≤ about 5 min at a time (common practice); "avoid long idling": 10 min is our reading
      rules: { fullThrottleMaxSeconds: 300, idleMaxMinutes: 10 },
      instructions:
        'Run under real load, at half to three-quarter load; the band shows the engine speeds that match on a fixed propeller. Full power only for a few minutes at a time. Do not idle for long or motor at very light load: it glazes the cylinder walls.',
    },
  ],
});
