import type { RpmBand } from '../programs/phase-band.schema';
import type { Program } from '../programs/program.schema';
import type { RunState } from './run.schema';

/** The engine facts a run carries wherever it is shown. */
export interface RunEngine {
  id: string;
  position: string;
  maker: string;
  model: string;
  serialNumber: string;
  ratedRpmMin: number;
  ratedRpmMax: number;
}

/** The same, with the engine's commissioning record (the review and the certificate). */
export interface CommissionedEngine extends RunEngine {
  hourMeterAtCommissioning: number | null;
  commissionedOn: string | null;
}

/** The workshop's latest decision on a run, as the skipper and the workshop see it. */
export interface RunDecisionView {
  decision: 'confirmed' | 'returned';
  comments: string;
  /** The phases sent back to be run again (ids of the run's program); empty when confirmed. */
  rerunPhaseIds: string[];
  reviewerName: string;
  decidedAt: string;
}

/** A run as the API lists it (GET /api/runs, /api/engines/:id/runs). */
export interface RunView {
  id: string;
  state: RunState;
  vessel: { id: string; name: string };
  engine: RunEngine;
  programId: string;
  programName: string;
  phaseCount: number;
  totalMinutes: number;
  currentPhaseId: string | null;
  notes: string;
  /** How far the device clock was off the server's, when more than a day (see sync rules). */
  clockSkewMs: number | null;
  /** Device time of the newest event, epoch ms. */
  lastEventAt: number | null;
  submittedAt: string | null;
  /** The skipper's note when the run was submitted with a phase not complete. */
  submitNote: string | null;
  /** For each phase sent back to be run again, the moment it was sent back (epoch ms). */
  rerunFrom: Record<string, number>;
  lastDecision: RunDecisionView | null;
  /** Set once signed off; the PDF is GET /api/runs/:id/certificate. */
  certificateNumber: string | null;
  signedOffAt: string | null;
  createdAt: string;
  updatedAt: string;
}

/**
 * Everything a device needs to run and judge the break-in offline: the view plus the program
 * frozen at assignment and each phase's band resolved for this engine (GET /api/runs/:id, pull).
 */
export interface RunDetail extends RunView {
  program: Program;
  bands: Record<string, RpmBand>;
}
