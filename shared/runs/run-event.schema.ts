import { z } from 'zod/mini';
import '../zod-english';
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
    .check(
      z.int({ error: 'The event time (at) must be whole milliseconds.' }),
      z.nonnegative({ error: 'The event time (at) cannot be before 1970.' }),
    ),
  engineId: z
    .string({ error: 'Choose the engine (engineId).' })
    .check(z.trim(), z.minLength(1, { error: 'Choose the engine (engineId).' })),
};

const phaseIdField = z
  .string({ error: 'Choose the phase (phaseId).' })
  .check(z.trim(), z.minLength(1, { error: 'Choose the phase (phaseId).' }));

export const SessionStartSchema = z.object({ kind: z.literal('session-start'), ...eventBase });
export type SessionStart = z.infer<typeof SessionStartSchema>;

export const SessionStopSchema = z.object({ kind: z.literal('session-stop'), ...eventBase });
export type SessionStop = z.infer<typeof SessionStopSchema>;

/** How the rpm was obtained; a measured frequency must come with its value in Hz. */
export const RpmSourceSchema = z.enum(['tachometer', 'frequency', 'estimate'], {
  error: 'How the rpm was obtained (rpmSource) must be tachometer, frequency or estimate.',
});

/**
 * What a reading may carry beyond engine speed. The bounds are sanity limits of our own (no boat
 * in scope does 80 kn or burns 400 L/h per engine), there to catch a slipped finger.
 */
const readingExtras = {
  speedSource: z.optional(
    z.enum(['gps', 'typed'], {
      error: 'Where the speed came from (speedSource) must be gps or typed.',
    }),
  ),
  fuelLph: z.optional(
    z
      .number({ error: 'The fuel flow (fuelLph) must be a number of litres per hour.' })
      .check(
        z.nonnegative({ error: 'The fuel flow (fuelLph) cannot be negative.' }),
        z.maximum(400, { error: 'The fuel flow (fuelLph) must be at most 400 L/h.' }),
      ),
  ),
  hourMeter: z.optional(
    z
      .number({ error: 'The hour meter (hourMeter) must be a number of hours.' })
      .check(
        z.nonnegative({ error: 'The hour meter (hourMeter) cannot be negative.' }),
        z.maximum(100_000, { error: 'The hour meter (hourMeter) must be at most 100,000 h.' }),
      ),
  ),
  coolantOk: z.optional(
    z.boolean({ error: 'The cooling-water tell-tale check (coolantOk) must be yes or no.' }),
  ),
  lat: z.optional(
    z
      .number()
      .check(
        z.minimum(-90, { error: 'The latitude (lat) must be between -90 and 90.' }),
        z.maximum(90, { error: 'The latitude (lat) must be between -90 and 90.' }),
      ),
  ),
  lon: z.optional(
    z
      .number()
      .check(
        z.minimum(-180, { error: 'The longitude (lon) must be between -180 and 180.' }),
        z.maximum(180, { error: 'The longitude (lon) must be between -180 and 180.' }),
      ),
  ),
  note: z.optional(
    z
      .string({ error: 'The note (note) must be text.' })
      .check(
        z.trim(),
        z.maxLength(1000, { error: 'The note (note) can have at most 1000 characters.' }),
      ),
  ),
};

export const ReadingSchema = z
  .object({
    kind: z.literal('reading'),
    ...eventBase,
    phaseId: phaseIdField,
    rpm: z.number({ error: 'Enter the engine speed (rpm) as a number.' }).check(
      z.minimum(0, { error: 'The engine speed (rpm) cannot be negative.' }),
      z.maximum(RPM_UPPER_BOUND, {
        error: `The engine speed (rpm) must be at most ${RPM_UPPER_BOUND} rpm.`,
      }),
    ),
    throttle: ThrottlePositionSchema,
    speedKn: z.optional(
      z
        .number({ error: 'The speed over ground (speedKn) must be a number of knots.' })
        .check(z.nonnegative({ error: 'The speed over ground (speedKn) cannot be negative.' })),
    ),
    rpmSource: z.optional(RpmSourceSchema),
    frequencyHz: z.optional(
      z
        .number({ error: 'The measured frequency (frequencyHz) must be a number of hertz.' })
        .check(
          z.positive({ error: 'The measured frequency (frequencyHz) must be more than zero.' }),
        ),
    ),
    ...readingExtras,
  })
  .check(
    z.refine((r) => r.rpmSource !== 'frequency' || r.frequencyHz !== undefined, {
      error: 'Enter the measured frequency (frequencyHz) when the rpm comes from a frequency.',
      path: ['frequencyHz'],
    }),
  );
export type Reading = z.infer<typeof ReadingSchema>;

/** The skipper (or workshop) confirms that `phaseId` now starts. */
export const PhaseAdvanceSchema = z.object({
  kind: z.literal('phase-advance'),
  ...eventBase,
  phaseId: phaseIdField,
});
export type PhaseAdvance = z.infer<typeof PhaseAdvanceSchema>;

/** A rule warning raised on the device (over the ceiling, full throttle too long…); logged, never counted as time. */
export const AlertEventSchema = z.object({
  kind: z.literal('alert'),
  ...eventBase,
  phaseId: z.optional(phaseIdField),
  code: z
    .string({ error: 'The alert code (code) must be text.' })
    .check(z.trim(), z.minLength(1), z.maxLength(64)),
  message: z
    .string({ error: 'The alert message (message) must be text.' })
    .check(z.trim(), z.minLength(1), z.maxLength(500)),
});
export type AlertEvent = z.infer<typeof AlertEventSchema>;

/** A free note by the crew or the workshop, tied to a moment of the run. */
export const NoteEventSchema = z.object({
  kind: z.literal('note'),
  ...eventBase,
  text: z
    .string({ error: 'Write the note (text).' })
    .check(
      z.trim(),
      z.minLength(1, { error: 'Write the note (text).' }),
      z.maxLength(2000, { error: 'The note (text) can have at most 2000 characters.' }),
    ),
});
export type NoteEvent = z.infer<typeof NoteEventSchema>;

/** Kinds of entry a void may name: what a person typed. Alerts, sessions and phase moves stand. */
export const VOIDABLE_KINDS = ['reading', 'note'] as const;

export const MAX_VOID_REASON = 200;

/**
 * Takes back one earlier entry (a reading or a note) of the same run. Entries are never edited
 * or deleted: the void is an entry of its own, synced like any other, and accounting leaves the
 * named entry out (see voids.ts).
 */
export const VoidEventSchema = z.object({
  kind: z.literal('void'),
  ...eventBase,
  targetId: z.uuid({ error: 'Choose the entry to void (targetId).' }),
  reason: z.string({ error: 'Say why the entry is voided (reason).' }).check(
    z.trim(),
    z.minLength(1, { error: 'Say why the entry is voided (reason).' }),
    z.maxLength(MAX_VOID_REASON, {
      error: `The reason (reason) can have at most ${MAX_VOID_REASON} characters.`,
    }),
  ),
});
export type VoidEvent = z.infer<typeof VoidEventSchema>;

export const RunEventSchema = z.discriminatedUnion(
  'kind',
  [
    SessionStartSchema,
    SessionStopSchema,
    ReadingSchema,
    PhaseAdvanceSchema,
    AlertEventSchema,
    NoteEventSchema,
    VoidEventSchema,
  ],
  {
    error:
      'The event kind (kind) must be session-start, session-stop, reading, phase-advance, alert, note or void.',
  },
);
export type RunEvent = z.infer<typeof RunEventSchema>;
