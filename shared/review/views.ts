import type { RpmBand } from '../programs/phase-band.schema';
import type { PhaseRules } from '../programs/program.schema';
import type { ThrottleCeiling } from '../programs/throttle';
import type { RunReason } from '../runs/phase-rules';
import type { Verdict } from '../runs/phase-tally';
import type { RunState } from '../runs/run.schema';
import type { CommissionedEngine } from '../runs/run-view';
import type { ActionGroup } from './board-order';
import type { PhaseChart } from './chart-series';
import type { FirstServiceView } from './first-service';
import type { ReadingRow } from './readings';
import type { BoardFlagCode } from './run-words';

/*
 * What the review API answers, shared so the server is checked against what the client reads.
 */

export interface BoardRow {
  id: string;
  state: RunState;
  group: ActionGroup;
  vessel: { id: string; name: string };
  engine: { id: string; position: string; maker: string; model: string; serialNumber: string };
  programName: string;
  progress: number;
  verdict: Verdict;
  breachCount: number;
  currentPhaseName: string | null;
  lastActivityAt: string | null;
  flags: BoardFlagCode[];
  firstService: BoardService | null;
}

/** What a board row says of the first service; the full working is on the review page. */
export type BoardService = Pick<
  FirstServiceView,
  'state' | 'dueAtHours' | 'dueOn' | 'hoursNow' | 'hoursSource'
> & {
  /** The day the first service was recorded as done; null while it is still to do. */
  doneOn?: string | null;
};

export interface BoardView {
  /** The workshop's calendar day the service states were worked out for. */
  today: string;
  /** Runs per state, and how many need action, over the whole workshop. */
  counts: Record<RunState, number>;
  actionCount: number;
  total: number;
  /** How many runs match the choice and the search; `runs` holds the first `limit` of them. */
  matching: number;
  runs: BoardRow[];
}

/** An entry taken back: shown struck through with why and by whom (shared/runs/voids.ts). */
export interface VoidedMark {
  reason: string;
  byName: string;
  /** Time of the void on the device that made it, epoch ms. */
  at: number;
}

export type LoggedEvent =
  | { kind: 'session-start' | 'session-stop'; id: string; at: number }
  | { kind: 'phase-advance'; id: string; at: number; phaseId: string }
  | { kind: 'alert'; id: string; at: number; phaseId: string | null; code: string; message: string }
  | { kind: 'note'; id: string; at: number; text: string; voided: VoidedMark | null };

export interface ReviewPhase {
  id: string;
  name: string;
  performedBy: 'workshop' | 'skipper';
  throttleCeiling: ThrottleCeiling;
  band: RpmBand;
  rules: PhaseRules;
  requiredMs: number;
  timeInBandMs: number;
  timeOverMs: number;
  timeUnderMs: number;
  longestFullThrottleMs: number;
  progressShare: number;
  /** Time logged before the phase was sent back to be run again: shown, not counted. */
  setAsideMs: number;
  /** When the phase was sent back (epoch ms), or null. */
  countsFromMs: number | null;
  verdict: Verdict;
  reasons: RunReason[];
  firstAt: number | null;
  lastAt: number | null;
}

export interface AuditView {
  action: string;
  at: string;
  actorName: string;
  detail: string;
}

export interface RunReviewView {
  run: {
    id: string;
    state: RunState;
    programName: string;
    programSource: string;
    notes: string;
    currentPhaseId: string | null;
    createdAt: string;
    submittedAt: string | null;
    /** The skipper's note when submitting with a phase not complete. */
    submitNote: string | null;
    signedOffAt: string | null;
    lastEventAt: number | null;
    clockSkewMs: number | null;
    clockSkewFlag: boolean;
  };
  vessel: { id: string; name: string; hin: string; homePort: string };
  engine: CommissionedEngine;
  skippers: Array<{ id: string; name: string }>;
  account: { verdict: Verdict; overallProgress: number; sessionMs: number; unassignedMs: number };
  phases: ReviewPhase[];
  charts: PhaseChart[];
  events: LoggedEvent[];
  eventsTotal: number;
  readingCount: number;
  /** Readings and notes taken back, however many (the readings table marks each one). */
  voidedCount: number;
  reviews: Array<{
    decision: 'confirmed' | 'returned';
    comments: string;
    /** Names of the phases sent back to be run again. */
    rerunPhaseNames: string[];
    verdict: string;
    reviewerName: string;
    decidedAt: string;
  }>;
  certificate: { number: string; issuedAt: string; downloadUrl: string } | null;
  firstService: FirstServiceView | null;
  trail: AuditView[];
  canDecide: boolean;
}

export interface ReadingsPage {
  total: number;
  offset: number;
  limit: number;
  readings: ReadingRow[];
}

export type MailOutcomeView =
  { sent: true; to: string[] } | { sent: false; to: string[]; problem: string };

export interface DecisionView {
  state: 'signed-off' | 'returned';
  certificate: { number: string; downloadUrl: string } | null;
  mail: MailOutcomeView;
}
