import { z } from 'zod';

/** What a technician decides on a run submitted for review. */
export const SIGN_OFF_DECISIONS = ['confirm', 'return'] as const;
export const SignOffDecisionSchema = z.enum(SIGN_OFF_DECISIONS, {
  error: 'Choose whether to confirm the run or return it to the skipper (decision).',
});
export type SignOffDecision = z.infer<typeof SignOffDecisionSchema>;

export const MAX_COMMENTS = 2000;

export const SignOffInputSchema = z
  .object({
    decision: SignOffDecisionSchema,
    comments: z
      .string({ error: 'The comments (comments) must be text.' })
      .trim()
      .max(MAX_COMMENTS, {
        error: `The comments (comments) can have at most ${MAX_COMMENTS} characters.`,
      })
      .default(''),
    /** The phases to run again (ids of the run's program); at least one when returning. */
    rerunPhaseIds: z
      .array(z.string({ error: 'Each phase to run again (rerunPhaseIds) must be a phase id.' }), {
        error: 'The phases to run again (rerunPhaseIds) must be a list.',
      })
      .max(50, { error: 'Choose at most 50 phases to run again (rerunPhaseIds).' })
      .default([]),
  })
  .refine((input) => input.decision !== 'return' || input.comments.length > 0, {
    error: 'Write what the skipper should do (comments) when you return a run.',
    path: ['comments'],
  })
  .refine((input) => input.decision !== 'return' || input.rerunPhaseIds.length > 0, {
    error: 'Choose at least one phase to run again (rerunPhaseIds) when you return a run.',
    path: ['rerunPhaseIds'],
  });
export type SignOffInput = z.infer<typeof SignOffInputSchema>;
export type SignOffFormValues = z.input<typeof SignOffInputSchema>;

/** The message when a confirmation of a run the computation did not judge complete has no comment. */
export const CONFIRM_NEEDS_COMMENT =
  'This run is not judged complete by the computation: say why you confirm it anyway (comments).';

export const READINGS_PAGE_MAX = 500;

export const ReadingsQuerySchema = z.object({
  offset: z.coerce
    .number({ error: 'The offset (offset) must be a whole number.' })
    .int({ error: 'The offset (offset) must be a whole number.' })
    .nonnegative({ error: 'The offset (offset) cannot be negative.' })
    .default(0),
  limit: z.coerce
    .number({ error: 'The page size (limit) must be a whole number.' })
    .int({ error: 'The page size (limit) must be a whole number.' })
    .min(1, { error: 'The page size (limit) must be at least 1.' })
    .max(READINGS_PAGE_MAX, { error: `The page size (limit) can be at most ${READINGS_PAGE_MAX}.` })
    .default(100),
});
export type ReadingsQuery = z.infer<typeof ReadingsQuerySchema>;

/** Which runs the board lists: what needs action (the default), all, or one state. */
export const BOARD_SHOWS = [
  'action',
  'all',
  'planned',
  'under-way',
  'submitted',
  'signed-off',
  'returned',
  'cancelled',
] as const;
export type BoardShow = (typeof BOARD_SHOWS)[number];

export const BOARD_PAGE_MAX = 500;

export const BoardQuerySchema = z.object({
  show: z
    .enum(BOARD_SHOWS, { error: 'Show (show) must be action, all or a run state.' })
    .default('action'),
  q: z
    .string({ error: 'The search text (q) must be text.' })
    .trim()
    .max(80, { error: 'The search text (q) can have at most 80 characters.' })
    .default(''),
  limit: z.coerce
    .number({ error: 'The number of runs (limit) must be a whole number.' })
    .int({ error: 'The number of runs (limit) must be a whole number.' })
    .min(1, { error: 'The number of runs (limit) must be at least 1.' })
    .max(BOARD_PAGE_MAX, { error: `The number of runs (limit) can be at most ${BOARD_PAGE_MAX}.` })
    .default(100),
});
export type BoardQuery = z.infer<typeof BoardQuerySchema>;

/** A technician takes back a reading or a note from the review page (POST /api/runs/:id/voids). */
export const VoidInputSchema = z.object({
  targetId: z.uuid({ error: 'Choose the entry to void (targetId).' }),
  reason: z
    .string({ error: 'Say why the entry is voided (reason).' })
    .trim()
    .min(1, { error: 'Say why the entry is voided (reason).' })
    .max(200, { error: 'The reason (reason) can have at most 200 characters.' }),
});
export type VoidInput = z.infer<typeof VoidInputSchema>;

/** The most runs decided together from one vessel's page (quad outboards are the most we expect). */
export const MAX_VESSEL_DECISIONS = 6;

/**
 * Decisions on the submitted runs of one vessel, saved together or not at all
 * (POST /api/vessels/:id/decisions). Each is a sign-off input naming its run.
 */
export const VesselDecisionsInputSchema = z.object({
  decisions: z
    .array(
      z
        .object({ runId: z.uuid({ error: 'Each decision names a run (runId).' }) })
        .and(SignOffInputSchema),
      { error: 'The decisions (decisions) must be a list.' },
    )
    .min(1, { error: 'Decide on at least one run (decisions).' })
    .max(MAX_VESSEL_DECISIONS, {
      error: `Decide on at most ${MAX_VESSEL_DECISIONS} runs at once (decisions).`,
    })
    .refine((list) => new Set(list.map((d) => d.runId)).size === list.length, {
      error: 'Each run can be decided on once (decisions).',
    }),
});
export type VesselDecisionsInput = z.infer<typeof VesselDecisionsInputSchema>;
export type VesselDecisionsFormValues = z.input<typeof VesselDecisionsInputSchema>;
