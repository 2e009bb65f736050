import { z } from 'zod';

/**
 * A run's life: planned → under way → submitted → signed off, or returned with reasons and back
 * under way. A planned run assigned by mistake is cancelled before anything is logged on it.
 */
export const RUN_STATES = [
  'planned',
  'under-way',
  'submitted',
  'signed-off',
  'returned',
  'cancelled',
] as const;
export const RunStateSchema = z.enum(RUN_STATES, {
  error: 'The run state must be planned, under-way, submitted, signed-off, returned or cancelled.',
});
export type RunState = z.infer<typeof RunStateSchema>;

/**
 * States in which the engine's break-in is still open: an engine has at most one such run.
 * Signed-off and cancelled runs are closed, so a new program can be assigned after either.
 */
export const OPEN_RUN_STATES: readonly RunState[] = [
  'planned',
  'under-way',
  'submitted',
  'returned',
];

/** Longest reason for cancelling a run or assigning a program that does not suit the engine. */
export const MAX_REASON_LENGTH = 500;

const reason = (what: string) =>
  z
    .string({ error: `Give the reason (reason) ${what}.` })
    .trim()
    .min(1, { error: `Give the reason (reason) ${what}.` })
    .max(MAX_REASON_LENGTH, {
      error: `The reason (reason) can have at most ${MAX_REASON_LENGTH} characters.`,
    });

export const AssignProgramInputSchema = z.object({
  engineId: z.uuid({ error: 'Choose the engine (engineId) from the list.' }),
  programId: z.uuid({ error: 'Choose the program (programId) from the list.' }),
  /** Required by the server when the program does not suit the engine (program-suits.ts). */
  reason: reason('for assigning a program that does not suit this engine').optional(),
});
export type AssignProgramInput = z.infer<typeof AssignProgramInputSchema>;

/** POST /api/runs/:id/cancel: why the planned run was a mistake, kept in the run's trail. */
export const CancelRunInputSchema = z.object({
  reason: reason('for cancelling this run'),
});
export type CancelRunInput = z.infer<typeof CancelRunInputSchema>;
