import type { EngineInput } from '../engines/engine.schema';
import type { RunState } from '../runs/run.schema';
import type { VesselType } from './vessel.schema';

/** An engine as the API answers it: every input field plus its id and times. */
export interface EngineView extends Omit<EngineInput, 'vesselId'> {
  id: string;
  vesselId: string;
  createdAt: string;
  updatedAt: string;
  /** Present on the engine routes; GET /api/vessels lists only engines in use. */
  archivedAt?: string | null;
  /** In GET /api/vessels, GET /api/vessels/:id and the device's pull: the engine's newest run, if any. */
  latestRun?: { id: string; state: RunState } | null;
}

export interface SkipperRef {
  id: string;
  name: string;
}

/** A vessel with its skippers and engines in use (GET /api/vessels and /api/vessels/:id). */
export interface VesselView {
  id: string;
  name: string;
  hin: string;
  type: VesselType;
  lengthM: number | null;
  homePort: string;
  skippers: SkipperRef[];
  engines: EngineView[];
  archivedAt: string | null;
  updatedAt: string;
}

/** An engine row of the engines list, with the vessel it sits on. */
export interface EngineRow extends EngineView {
  vessel: { id: string; name: string; archivedAt: string | null };
  checklist: { completedAt: string | null } | null;
}

/** A skipper of the workshop, for linking to vessels (GET /api/skippers, staff only). */
export interface SkipperOption {
  id: string;
  name: string;
  email: string;
  vesselIds: string[];
}
