import { randomUUID } from 'node:crypto';
import { In, type EntityManager } from 'typeorm';
import {
  BUILT_IN_PROGRAM_KEYS,
  BUILT_IN_PROGRAMS,
} from '../../shared/programs/built-in-programs.js';
import type { RpmBand } from '../../shared/programs/phase-band.schema.js';
import { resolvePhaseBand } from '../../shared/programs/resolve-band.js';
import { frozenPhases } from '../../shared/review/frozen-phases.js';
import { CLOCK_SKEW_FLAG_MS } from '../../shared/sync/sync.schema.js';
import { Program } from '../features/programs/program.entity.js';
import { Run } from '../features/runs/run.entity.js';
import { reserveChangeSeq } from '../lib/change-seq.js';
import { User } from '../features/users/user.entity.js';
import { Engine } from '../features/vessels/engine.entity.js';
import { VesselSkipper } from '../features/vessels/vessel-skipper.entity.js';
import { Vessel } from '../features/vessels/vessel.entity.js';
import { Workshop } from '../features/workshops/workshop.entity.js';
import { DEMO_RUNS, type DemoRun } from './demo-runs.js';
import {
  insertEvents,
  insertSubmission,
  storedEvents,
  type StoredEvent,
} from './demo-run-events.js';
import { addDemoSignOff } from './demo-sign-off.js';
import { simulateOutings, twinOf, type SimulatedEvent } from './simulate-outings.js';

interface Refs {
  workshopId: string;
  userIds: Map<string, string>;
  engineIds: Map<string, string>;
}

/** The workshop's copies of the built-in programs (the start-up sync then finds them current). */
async function addDemoPrograms(
  manager: EntityManager,
  workshopId: string,
): Promise<Map<string, Program>> {
  const programs = new Map<string, Program>();
  for (const key of BUILT_IN_PROGRAM_KEYS) {
    const definition = BUILT_IN_PROGRAMS[key];
    const program = Object.assign(new Program(), {
      id: randomUUID(),
      workshopId,
      builtInKey: key,
      copiedFromId: null,
      name: definition.name,
      definition,
      retiredAt: null,
    });
    await manager.getRepository(Program).insert(program);
    programs.set(key, program);
  }
  return programs;
}

function alertsOf(plan: DemoRun, engineId: string): SimulatedEvent[] {
  return (plan.alerts ?? []).map(({ outing, minutes, code, message }) => {
    const o = plan.outings[outing];
    return {
      by: o.by,
      outingEnd: o.start + o.minutes * 60_000,
      event: {
        kind: 'alert' as const,
        id: randomUUID(),
        at: o.start + minutes * 60_000,
        engineId,
        code,
        message,
      },
    };
  });
}

/** Demo break-in runs, one in each state, with outings simulated through their programs. */
export async function addDemoRuns(manager: EntityManager, refs: Refs): Promise<void> {
  const programs = await addDemoPrograms(manager, refs.workshopId);
  const workshop = await manager.getRepository(Workshop).findOneByOrFail({ id: refs.workshopId });
  const engines = new Map(
    (await manager.getRepository(Engine).findBy({ id: In([...refs.engineIds.values()]) })).map(
      (e) => [e.id, e],
    ),
  );
  const allEvents: StoredEvent[] = [];
  for (const plan of DEMO_RUNS) {
    const engineKeys = [plan.engineKey, ...(plan.twinEngineKey ? [plan.twinEngineKey] : [])];
    const runEngines = engineKeys.map((key) => engines.get(refs.engineIds.get(key)!)!);
    const program = programs.get(plan.programKey)!;
    const vessel = await manager
      .getRepository(Vessel)
      .findOneByOrFail({ id: runEngines[0].vesselId });
    const skipperLinks = await manager.getRepository(VesselSkipper).findBy({ vesselId: vessel.id });
    const skippers = skipperLinks.length
      ? await manager.getRepository(User).findBy({ id: In(skipperLinks.map((l) => l.userId)) })
      : [];
    const technician = await manager
      .getRepository(User)
      .findOneByOrFail({ id: refs.userIds.get('technician')! });
    let simulated: SimulatedEvent[] = [];
    for (const [index, engine] of runEngines.entries()) {
      const bands: Record<string, RpmBand> = Object.fromEntries(
        program.definition.phases.map((p) => [p.id, resolvePhaseBand(p, engine)]),
      );
      const phases = frozenPhases(program.definition, bands);
      simulated =
        index === 0
          ? [
              ...simulateOutings(
                {
                  phases,
                  engineId: engine.id,
                  ratedMax: engine.ratedRpmMax,
                  idleRpm: plan.idleRpm,
                  hourMeterStart: engine.hourMeterAtCommissioning ?? 0,
                  randomStart: plan.randomStart,
                },
                plan.outings,
              ),
              ...alertsOf(plan, engine.id),
            ]
          : twinOf(simulated, engine.id, phases, plan.randomStart + index);
      const run = await insertRun(manager, { plan, engine, program, bands, refs, simulated });
      const events = storedEvents(
        simulated,
        run,
        { workshop: technician.id, skipper: skippers[0]?.id ?? technician.id },
        plan.skipperClockAheadMs ?? 0,
      );
      allEvents.push(...events);
      await finishRun(
        manager,
        run,
        events,
        simulated.some((e) => e.by === 'skipper') ? (plan.skipperClockAheadMs ?? null) : null,
      );
      if (plan.submittedAt && skippers[0]) {
        await insertSubmission(manager, {
          runId: run.id,
          authorId: skippers[0].id,
          at: plan.submittedAt + (plan.skipperClockAheadMs ?? 0),
          receivedAt: plan.submittedAt,
        });
      }
      if (plan.signedOff) {
        await addDemoSignOff(manager, {
          run,
          engine,
          vessel,
          workshop,
          skippers,
          technician,
          phases,
          events: events.map((e) => e.event),
          at: new Date(plan.signedOff.at),
          comments: plan.signedOff.comments,
        });
      }
    }
  }
  await insertEvents(manager, allEvents);
}

async function insertRun(
  manager: EntityManager,
  input: {
    plan: DemoRun;
    engine: Engine;
    program: Program;
    bands: Record<string, RpmBand>;
    refs: Refs;
    simulated: SimulatedEvent[];
  },
): Promise<Run> {
  const { plan, engine, program, bands, refs } = input;
  const run = Object.assign(new Run(), {
    id: randomUUID(),
    workshopId: refs.workshopId,
    engineId: engine.id,
    vesselId: engine.vesselId,
    programId: program.id,
    program: structuredClone(program.definition),
    bands,
    state: plan.state,
    assignedById: refs.userIds.get(plan.assignedBy)!,
    currentPhaseId: null,
    notes: plan.notes ?? '',
    clockSkewMs: null,
    lastEventAt: null,
    seq: 0,
    submittedAt: plan.submittedAt ? new Date(plan.submittedAt) : null,
    signedOffAt: plan.signedOff ? new Date(plan.signedOff.at) : null,
    createdAt: new Date(plan.assignedAt),
    updatedAt: new Date(plan.signedOff?.at ?? plan.submittedAt ?? plan.assignedAt),
  });
  await manager.getRepository(Run).insert(run);
  return run;
}

/** What sync would have noted on the run as the events came in: newest event, phase, a device clock far off. */
async function finishRun(
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
