import type { RunState } from '../runs/run.schema';
import type { BoardFlagCode } from './run-words';

/** What the ordering needs to know about a row of the runs board. */
export interface RankedRun {
  state: RunState;
  flags: readonly BoardFlagCode[];
  /** Epoch ms of the newest activity (event, submission, decision), or null when none. */
  lastActivityMs: number | null;
  submittedAtMs: number | null;
}

/**
 * Action groups, most urgent first. A submitted run waits on the workshop; a run under way with
 * a broken rule or a wrong device clock may need a call to the skipper; a signed-off engine whose
 * first service is near needs booking. Runs that wait on someone else come after.
 */
export const ACTION_GROUPS = [
  'review',
  'check',
  'book-service',
  'under-way',
  'with-skipper',
  'planned',
  'done',
] as const;
export type ActionGroup = (typeof ACTION_GROUPS)[number];

const SERVICE_FLAGS: readonly BoardFlagCode[] = ['service-overdue', 'service-due-soon'];

export function actionGroup(run: Pick<RankedRun, 'state' | 'flags'>): ActionGroup {
  if (run.state === 'submitted') return 'review';
  const open = run.state === 'under-way' || run.state === 'returned';
  if (open && (run.flags.includes('breach') || run.flags.includes('clock-skew'))) return 'check';
  if (run.flags.some((f) => SERVICE_FLAGS.includes(f))) return 'book-service';
  if (run.state === 'under-way') return 'under-way';
  if (run.state === 'returned') return 'with-skipper';
  return run.state === 'planned' ? 'planned' : 'done';
}

/** True for the groups that ask something of the workshop now. */
export const needsAction = (group: ActionGroup): boolean =>
  group === 'review' || group === 'check' || group === 'book-service';

const rank = (group: ActionGroup) => ACTION_GROUPS.indexOf(group);

/**
 * The board's default order: by action group; submitted runs oldest submission first (the one
 * waiting longest), every other group newest activity first.
 */
export function compareForAction(a: RankedRun, b: RankedRun): number {
  const ga = actionGroup(a);
  const gb = actionGroup(b);
  if (ga !== gb) return rank(ga) - rank(gb);
  if (ga === 'review') return (a.submittedAtMs ?? 0) - (b.submittedAtMs ?? 0);
  return (b.lastActivityMs ?? 0) - (a.lastActivityMs ?? 0);
}
