import { z } from 'zod';

const polesField = z
  .number({ error: 'Enter the number of poles (poles) as a whole number.' })
  .int({ error: 'The number of poles (poles) must be a whole number.' })
  .positive({ error: 'The number of poles (poles) must be more than zero.' })
  // Poles come in north/south pairs, so an odd count is always a typing slip.
  .refine((poles) => poles % 2 === 0, {
    error: 'The number of poles (poles) must be even: poles come in pairs.',
  });

const pulleyRatioField = z
  .number({ error: 'Enter the pulley ratio (pulleyRatio) as a number, like 2.5.' })
  .positive({ error: 'The pulley ratio (pulleyRatio) must be more than zero.' });

/**
 * Where the tachometer signal comes from (names as in the engine record). A charging coil
 * under the flywheel turns with the crankshaft; a belt-driven alternator turns faster by the
 * ratio of the crank pulley to its own pulley.
 */
export const SignalSourceSchema = z.discriminatedUnion(
  'kind',
  [
    z.object({ kind: z.literal('charging-coil'), poles: polesField }),
    z.object({
      kind: z.literal('belt-alternator'),
      poles: polesField,
      pulleyRatio: pulleyRatioField,
    }),
  ],
  { error: 'The signal source (kind) must be "charging-coil" or "belt-alternator".' },
);
export type SignalSource = z.infer<typeof SignalSourceSchema>;

/**
 * How the tachometer's dial setting is labelled. Some units are set by the number of poles of
 * the charging coil, others by pulses per engine revolution (common practice).
 */
export const TachConventionSchema = z.enum(['poles', 'pulses-per-rev'], {
  error: 'The tachometer setting label (convention) must be "poles" or "pulses-per-rev".',
});
export type TachConvention = z.infer<typeof TachConventionSchema>;

/**
 * A raw or half-wave signal gives one pulse per AC cycle; a full-wave rectified signal gives
 * two, which doubles the count the tachometer sees (common practice).
 */
export const SignalWaveSchema = z.enum(['half-wave', 'full-wave'], {
  error: 'The signal wave (wave) must be "half-wave" or "full-wave".',
});
export type SignalWave = z.infer<typeof SignalWaveSchema>;

export const TachSetupSchema = z.object({
  source: SignalSourceSchema,
  convention: TachConventionSchema,
  wave: SignalWaveSchema.default('half-wave'),
});
export type TachSetup = z.infer<typeof TachSetupSchema>;
