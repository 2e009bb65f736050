import { z } from 'zod';

/** A run's life: planned → under way → submitted → signed off, or returned with reasons and back under way. */
export const RUN_STATES = ['planned', 'under-way', 'submitted', 'signed-off', 'returned'] as const;
export const RunStateSchema = z.enum(RUN_STATES, {
  error: 'The run state must be planned, under-way, submitted, signed-off or returned.',
});
export type RunState = z.infer<typeof RunStateSchema>;

/** States in which the engine's break-in is still open: an engine has at most one such run. */
export const OPEN_RUN_STATES: readonly RunState[] = [
  'planned',
  'under-way',
  'submitted',
  'returned',
];

export const AssignProgramInputSchema = z.object({
  engineId: z.uuid({ error: 'Choose the engine (engineId) from the list.' }),
  programId: z.uuid({ error: 'Choose the program (programId) from the list.' }),
});
export type AssignProgramInput = z.infer<typeof AssignProgramInputSchema>;
