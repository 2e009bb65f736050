import { z } from 'zod';
import { ServiceIntervalSchema } from '../service/service.schema';
import { PhaseBandSchema } from './phase-band.schema';
import { ThrottleCeilingSchema } from './throttle';

export const MAX_PHASES = 30;

const positive = (label: string, key: string, unit: string) =>
  z
    .number({ error: `The ${label} (${key}) must be a number of ${unit}.` })
    .positive({ error: `The ${label} (${key}) must be more than zero ${unit}.` });

export const PhaseRulesSchema = z.object({
  changeSpeedEveryMinutes: positive(
    'longest time at one speed',
    'changeSpeedEveryMinutes',
    'minutes',
  ).optional(),
  /** Per continuous stretch at full throttle. */
  fullThrottleMaxSeconds: positive(
    'longest full-throttle stretch',
    'fullThrottleMaxSeconds',
    'seconds',
  ).optional(),
  fullThrottleMaxMinutesPerHour: positive(
    'most full throttle in any hour',
    'fullThrottleMaxMinutesPerHour',
    'minutes',
  )
    .max(60, {
      error:
        'The most full throttle in any hour (fullThrottleMaxMinutesPerHour) cannot exceed 60 minutes.',
    })
    .optional(),
  idleMaxMinutes: positive('longest idling stretch', 'idleMaxMinutes', 'minutes').optional(),
});
export type PhaseRules = z.infer<typeof PhaseRulesSchema>;

export const PerformedBySchema = z.enum(['workshop', 'skipper'], {
  error: 'Who performs the phase (performedBy) must be "workshop" or "skipper".',
});

const text = (label: string, key: string, max: number) =>
  z
    .string({ error: `Enter the ${label} (${key}).` })
    .trim()
    .min(1, { error: `Enter the ${label} (${key}).` })
    .max(max, { error: `The ${label} (${key}) can have at most ${max} characters.` });

export const PhaseSchema = z.object({
  /** Stable within its program: readings refer to it. */
  id: text('phase id', 'id', 64),
  name: text('phase name', 'name', 120),
  performedBy: PerformedBySchema,
  requiredMinutes: positive('required run time in band', 'requiredMinutes', 'minutes'),
  throttleCeiling: ThrottleCeilingSchema,
  band: PhaseBandSchema,
  rules: PhaseRulesSchema.default({}),
  instructions: text('instructions', 'instructions', 2000),
});
export type Phase = z.infer<typeof PhaseSchema>;

export const EngineKindSchema = z.enum(
  ['outboard-4-stroke', 'outboard-2-stroke', 'inboard-diesel', 'sterndrive-petrol', 'any'],
  {
    error:
      'The engine kind (engineKind) must be one of outboard-4-stroke, outboard-2-stroke, inboard-diesel, sterndrive-petrol or any.',
  },
);
export type EngineKind = z.infer<typeof EngineKindSchema>;

export const ProgramSchema = z
  .object({
    name: text('program name', 'name', 120),
    suits: z.object({
      engineKind: EngineKindSchema,
      label: z
        .string()
        .trim()
        .max(120, { error: 'The engine label (label) can have at most 120 characters.' })
        .default(''),
    }),
    phases: z
      .array(PhaseSchema, { error: 'The phases (phases) must be a list.' })
      .min(1, { error: 'A program needs at least one phase (phases).' })
      .max(MAX_PHASES, { error: `A program can have at most ${MAX_PHASES} phases (phases).` }),
    firstService: ServiceIntervalSchema,
    notes: z
      .string()
      .trim()
      .max(4000, { error: 'The notes (notes) can have at most 4000 characters.' })
      .default(''),
    source: text('source note', 'source', 500),
  })
  .check((ctx) => {
    const seen = new Set<string>();
    ctx.value.phases.forEach((phase, index) => {
      if (seen.has(phase.id)) {
        ctx.issues.push({
          code: 'custom',
          input: phase.id,
          path: ['phases', index, 'id'],
          message: `The phase id (id) "${phase.id}" is already used by an earlier phase; each phase needs its own.`,
        });
      }
      seen.add(phase.id);
    });
  });
export type Program = z.infer<typeof ProgramSchema>;
export type ProgramInput = z.input<typeof ProgramSchema>;
