import { z } from 'zod';
import { RPM_UPPER_BOUND } from '../programs/phase-band.schema';
import { ThrottlePositionSchema } from '../programs/throttle';

/*
 * What the device records during a run. Every event carries a UUID made on the device, so a
 * copy that arrives twice through sync is recognised, and `at` in epoch milliseconds from the
 * device clock. Accounting never trusts arrival order, only (at, id).
 */
const eventBase = {
  id: z.uuid({ error: 'The event id (id) must be a UUID made on the device.' }),
  at: z
    .number({ error: 'The event time (at) must be a time in epoch milliseconds.' })
    .int({ error: 'The event time (at) must be whole milliseconds.' })
    .nonnegative({ error: 'The event time (at) cannot be before 1970.' }),
  engineId: z.string({ error: 'Choose the engine (engineId).' }).trim().min(1, { error: 'Choose the engine (engineId).' }),
};

const phaseIdField = z.string({ error: 'Choose the phase (phaseId).' }).trim().min(1, { error: 'Choose the phase (phaseId).' });

export const SessionStartSchema = z.object({ kind: z.literal('session-start'), ...eventBase });
export type SessionStart = z.infer<typeof SessionStartSchema>;

export const SessionStopSchema = z.object({ kind: z.literal('session-stop'), ...eventBase });
export type SessionStop = z.infer<typeof SessionStopSchema>;

/** How the rpm was obtained; a measured frequency must come with its value in Hz. */
export const RpmSourceSchema = z.enum(['tachometer', 'frequency', 'estimate'], {
  error: 'How the rpm was obtained (rpmSource) must be tachometer, frequency or estimate.',
});

export const ReadingSchema = z
  .object({
    kind: z.literal('reading'),
    ...eventBase,
    phaseId: phaseIdField,
    rpm: z
      .number({ error: 'Enter the engine speed (rpm) as a number.' })
      .min(0, { error: 'The engine speed (rpm) cannot be negative.' })
      .max(RPM_UPPER_BOUND, { error: `The engine speed (rpm) must be at most ${RPM_UPPER_BOUND} rpm.` }),
    throttle: ThrottlePositionSchema,
    speedKn: z
      .number({ error: 'The speed over ground (speedKn) must be a number of knots.' })
      .nonnegative({ error: 'The speed over ground (speedKn) cannot be negative.' })
      .optional(),
    rpmSource: RpmSourceSchema.optional(),
    frequencyHz: z
      .number({ error: 'The measured frequency (frequencyHz) must be a number of hertz.' })
      .positive({ error: 'The measured frequency (frequencyHz) must be more than zero.' })
      .optional(),
  })
  .refine((r) => r.rpmSource !== 'frequency' || r.frequencyHz !== undefined, {
    error: 'Enter the measured frequency (frequencyHz) when the rpm comes from a frequency.',
    path: ['frequencyHz'],
  });
export type Reading = z.infer<typeof ReadingSchema>;

/** The skipper (or workshop) confirms that `phaseId` now starts. */
export const PhaseAdvanceSchema = z.object({ kind: z.literal('phase-advance'), ...eventBase, phaseId: phaseIdField });
export type PhaseAdvance = z.infer<typeof PhaseAdvanceSchema>;

export const RunEventSchema = z.discriminatedUnion(
  'kind',
  [SessionStartSchema, SessionStopSchema, ReadingSchema, PhaseAdvanceSchema],
  { error: 'The event kind (kind) must be session-start, session-stop, reading or phase-advance.' },
);
export type RunEvent = z.infer<typeof RunEventSchema>;
