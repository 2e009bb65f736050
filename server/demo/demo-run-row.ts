import { randomUUID } from 'node:crypto';
import type { EntityManager } from 'typeorm';
import type { RpmBand } from '../../shared/programs/phase-band.schema.js';
import { CLOCK_SKEW_FLAG_MS } from '../../shared/sync/sync.schema.js';
import type { Program } from '../features/programs/program.entity.js';
import { Run } from '../features/runs/run.entity.js';
import type { Engine } from '../features/vessels/engine.entity.js';
import { reserveChangeSeq } from '../lib/change-seq.js';
import type { StoredEvent } from './demo-run-events.js';
import type { DemoRun } from './demo-runs.js';

/** The run as the workshop assigned it, with the dates its plan gives. */
export async function insertRun(
  manager: EntityManager,
  input: {
    plan: DemoRun;
    engine: Engine;
    program: Program;
    bands: Record<string, RpmBand>;
    workshopId: string;
    assignedById: string;
  },
): Promise<Run> {
  const { plan, engine, program, bands } = input;
  const run = Object.assign(new Run(), {
    id: randomUUID(),
    workshopId: input.workshopId,
    engineId: engine.id,
    vesselId: engine.vesselId,
    programId: program.id,
    program: structuredClone(program.definition),
    bands,
    state: plan.state,
    assignedById: input.assignedById,
    currentPhaseId: null,
    notes: plan.notes ?? '',
    clockSkewMs: null,
    lastEventAt: null,
    seq: 0,
    submittedAt: plan.submittedAt ? new Date(plan.submittedAt) : null,
    submitNote: null,
    rerunFrom: {},
    lastDecision: null,
    certificateNumber: null,
    signedOffAt: plan.signedOff ? new Date(plan.signedOff.at) : null,
    createdAt: new Date(plan.assignedAt),
    updatedAt: new Date(plan.signedOff?.at ?? plan.submittedAt ?? plan.assignedAt),
  });
  await manager.getRepository(Run).insert(run);
  return run;
}

/** What sync would have noted on the run as the events came in: newest event, phase, a device clock far off. */
export async function finishRun(
  manager: EntityManager,
  run: Run,
  events: StoredEvent[],
  deviceAheadMs: number | null,
): Promise<void> {
  const lastEventAt = events.length ? Math.max(...events.map((e) => e.event.at)) : null;
  const advances = events
    .filter((e) => e.event.kind === 'phase-advance')
    .sort((a, b) => a.event.at - b.event.at);
  const last = advances.at(-1)?.event;
  const currentPhaseId =
    last?.kind === 'phase-advance' ? last.phaseId : events.length ? run.program.phases[0].id : null;
  const clockSkewMs =
    deviceAheadMs !== null && Math.abs(deviceAheadMs) > CLOCK_SKEW_FLAG_MS ? deviceAheadMs : null;
  await manager
    .getRepository(Run)
    .update(
      { id: run.id },
      { lastEventAt, currentPhaseId, clockSkewMs, seq: await reserveChangeSeq(manager) },
    );
}
