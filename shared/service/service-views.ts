import type { FirstServiceView } from '../review/first-service';
import type { Verdict } from '../runs/phase-tally';
import type { RunState } from '../runs/run.schema';
import type { CalendarDate, ServiceInterval } from './service.schema';

/*
 * What the engine-record routes answer, shared so the server is checked against what the client
 * reads (GET /api/engines/:id/service-due, /api/runs/:id/service-due, /api/engines/:id/record).
 */

/** A service the workshop recorded as done. */
export interface ServiceRecordView {
  id: string;
  date: CalendarDate;
  hourMeter: number;
  doneBy: string;
  notes: string;
  recordedAt: string;
  recordedBy: { id: string; name: string };
}

/** The next service after the first, counted from it (REGULAR_SERVICE_DEFAULT). */
export interface NextServiceView extends FirstServiceView {
  interval: ServiceInterval;
  /** True when the hours now are the hour meter read at the first service (nothing newer logged). */
  hoursFromService: boolean;
}

export interface ServiceEngine {
  id: string;
  vesselId: string;
  vesselName: string;
  position: string;
  maker: string;
  model: string;
  serialNumber: string;
}

export interface EngineServiceView {
  engine: ServiceEngine;
  /** Where the first service is counted from; null when either figure is not recorded. */
  commissioning: { hourMeter: number; date: CalendarDate } | null;
  interval: ServiceInterval;
  /** The program whose interval counts (the engine's newest run); null: the usual default. */
  intervalFrom: { programName: string } | null;
  /** Null when commissioning is not recorded (see `reason`). */
  firstService: FirstServiceView | null;
  firstServiceDone: ServiceRecordView | null;
  nextService: NextServiceView | null;
  /** How the figures were worked out, in plain sentences, in the order to read them. */
  workings: string[];
  reason: string | null;
  reminder: { state: string; sentAt: string; recipients: string[] } | null;
}

/** One run in the engine's record. */
export interface EngineRunRow {
  id: string;
  state: RunState;
  programName: string;
  verdict: Verdict;
  progress: number;
  createdAt: string;
  submittedAt: string | null;
  signedOffAt: string | null;
  /** Set once signed off; the PDF is GET /api/runs/:id/certificate. */
  certificateNumber: string | null;
}
