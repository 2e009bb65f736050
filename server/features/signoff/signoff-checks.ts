import { positionWords } from '../../../shared/engines/engine-words.js';
import { CONFIRM_NEEDS_COMMENT, type SignOffInput } from '../../../shared/review/review.schema.js';
import { HttpError, ValidationError } from '../../lib/errors.js';
import type { RunContext } from '../runs/run-context.js';
import { refuseUnlessSubmitted } from './signoff-records.js';

/* What a decision is checked against before anything is written (the sign-off service's first step). */

export interface CheckedDecision {
  ctx: RunContext;
  input: SignOffInput;
  /** The phases to run again, in program order; empty on a confirmation. */
  rerunPhaseIds: string[];
}

/** Refuses a decision the run cannot take: not submitted, not this vessel's, a missing comment, an unknown phase. */
export function checkDecision(
  ctx: RunContext,
  input: SignOffInput,
  vesselId?: string,
): CheckedDecision {
  if (vesselId !== undefined && ctx.run.vesselId !== vesselId)
    throw new ValidationError([
      { field: 'runId', message: "This run is not one of this vessel's runs." },
    ]);
  refuseUnlessSubmitted(ctx.run);
  if (input.decision === 'confirm' && ctx.account.verdict !== 'complete' && !input.comments) {
    throw new ValidationError([{ field: 'comments', message: CONFIRM_NEEDS_COMMENT }]);
  }
  const rerunPhaseIds = input.decision === 'return' ? phasesToRerun(ctx, input.rerunPhaseIds) : [];
  return { ctx, input, rerunPhaseIds };
}

/** A refusal of one engine's decision names the engine and its place in the list. */
export function forEngine<T>(index: number, ctx: RunContext, check: () => T): T {
  try {
    return check();
  } catch (error) {
    if (!(error instanceof HttpError)) throw error;
    const engine = `${positionWords(ctx.engine.position)} engine`;
    throw new HttpError(
      error.status,
      error.slug,
      error.title,
      `${engine}: ${error.detail ?? error.title}`,
      (error.errors ?? []).map((e) => ({
        field: `decisions.${index}.${e.field}`,
        message: `${engine}: ${e.message}`,
      })),
    );
  }
}

/** The phases named to run again, each a phase of the run's program, in program order. */
function phasesToRerun(ctx: RunContext, ids: readonly string[]): string[] {
  const unknown = ids.filter((id) => !ctx.run.program.phases.some((p) => p.id === id));
  if (unknown.length > 0)
    throw new ValidationError([
      {
        field: 'rerunPhaseIds',
        message: `The run's program has no phase "${unknown[0]}": choose the phases to run again from its phases.`,
      },
    ]);
  return ctx.run.program.phases.filter((p) => ids.includes(p.id)).map((p) => p.id);
}
