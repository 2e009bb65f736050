import type { Verdict } from '../runs/phase-tally';
import type { RunState } from '../runs/run.schema';

/** How each run state reads on the board, the review page and the certificate. */
export const RUN_STATE_WORDS: Record<RunState, string> = {
  planned: 'Planned',
  'under-way': 'Under way',
  submitted: 'Submitted for review',
  'signed-off': 'Signed off',
  returned: 'Returned to skipper',
  cancelled: 'Cancelled',
};

/** The computation's verdict in words; never shown by colour alone. */
export const VERDICT_WORDS: Record<Verdict, string> = {
  complete: 'Complete',
  incomplete: 'Not complete yet',
  breached: 'Rule broken',
};

export type BoardFlagCode = 'breach' | 'clock-skew' | 'service-overdue' | 'service-due-soon';

export const FLAG_WORDS: Record<BoardFlagCode, string> = {
  breach: 'Rule broken',
  'clock-skew': 'Device clock off',
  'service-overdue': 'First service overdue',
  'service-due-soon': 'First service due soon',
};
