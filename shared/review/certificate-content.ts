import type { RpmBand } from '../programs/phase-band.schema';
import type { ThrottleCeiling } from '../programs/throttle';
import type { Verdict } from '../runs/phase-tally';
import type { CommissionedEngine } from '../runs/run-view';
import type { HoursSource } from './first-service';

/** Everything printed on a break-in certificate, frozen at sign-off. */
export interface CertificateContent {
  number: string;
  /** ISO instant of the sign-off. */
  issuedAt: string;
  /** The sign-off day in the workshop's zone, YYYY-MM-DD. */
  issuedOn: string;
  timezone: string;
  workshop: { name: string; address: string; email: string };
  vessel: { name: string; hin: string; homePort: string };
  skippers: string[];
  engine: Omit<CommissionedEngine, 'id'>;
  program: { name: string; source: string };
  phases: CertificatePhase[];
  verdict: Verdict;
  comments: string;
  technician: { name: string; role: string };
  submittedAt: string | null;
  /** Readings and notes taken back before sign-off (absent on certificates issued before voids). */
  voidedCount?: number;
  firstService: {
    dueAtHours: number | null;
    dueOn: string | null;
    hoursNow: number;
    hoursSource: HoursSource;
  } | null;
}

export interface CertificatePhase {
  name: string;
  performedBy: 'workshop' | 'skipper';
  band: RpmBand;
  throttleCeiling: ThrottleCeiling;
  requiredMinutes: number;
  inBandMinutes: number;
  overMinutes: number;
  underMinutes: number;
  verdict: Verdict;
  firstAt: string | null;
  lastAt: string | null;
  reasons: string[];
  /** Minutes logged before the phase was sent back to be run again: kept, not counted. */
  setAsideMinutes?: number;
}
