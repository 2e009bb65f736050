import { randomUUID } from 'node:crypto';
import { In, type EntityManager } from 'typeorm';
import type { RpmBand } from '../../shared/programs/phase-band.schema.js';
import { resolvePhaseBand, type ResolvedPhase } from '../../shared/programs/resolve-band.js';
import { frozenPhases } from '../../shared/review/frozen-phases.js';
import type { Program } from '../features/programs/program.entity.js';
import { User } from '../features/users/user.entity.js';
import { Engine } from '../features/vessels/engine.entity.js';
import { VesselSkipper } from '../features/vessels/vessel-skipper.entity.js';
import { Vessel } from '../features/vessels/vessel.entity.js';
import { Workshop } from '../features/workshops/workshop.entity.js';
import { addDemoPrograms } from './demo-programs.js';
import {
  insertEvents,
  insertSubmission,
  storedEvents,
  type StoredEvent,
} from './demo-run-events.js';
import { finishRun, insertRun } from './demo-run-row.js';
import { DEMO_RUNS, type DemoRun } from './demo-runs.js';
import { addDemoSignOff } from './demo-sign-off.js';
import { simulateOutings, type SimulatedEvent } from './simulate-outings.js';
import { twinOf } from './twin-engine.js';

interface Refs {
  workshopId: string;
  userIds: Map<string, string>;
  engineIds: Map<string, string>;
}

/** What every demo run is made from. */
interface DemoWorld {
  refs: Refs;
  workshop: Workshop;
  programs: Map<string, Program>;
  engines: Map<string, Engine>;
  technician: User;
}

/** The boat a run is on and the skippers linked to it. */
interface Crew {
  vessel: Vessel;
  skippers: User[];
}

/** One engine's share of a plan: its program with bands for this engine, and what its device logged. */
interface EngineRun {
  plan: DemoRun;
  engine: Engine;
  program: Program;
  bands: Record<string, RpmBand>;
  phases: ResolvedPhase[];
  crew: Crew;
  simulated: SimulatedEvent[];
}

/** Demo break-in runs, one in each state, with outings simulated through their programs. */
export async function addDemoRuns(manager: EntityManager, refs: Refs): Promise<void> {
  const programs = await addDemoPrograms(manager, refs.workshopId);
  const world: DemoWorld = {
    refs,
    programs,
    workshop: await manager.getRepository(Workshop).findOneByOrFail({ id: refs.workshopId }),
    engines: new Map(
      (await manager.getRepository(Engine).findBy({ id: In([...refs.engineIds.values()]) })).map(
        (e) => [e.id, e],
      ),
    ),
    technician: await manager
      .getRepository(User)
      .findOneByOrFail({ id: refs.userIds.get('technician')! }),
  };
  const allEvents: StoredEvent[] = [];
  for (const plan of DEMO_RUNS) allEvents.push(...(await addDemoRun(manager, world, plan)));
  await insertEvents(manager, allEvents);
}

/** One plan's run on each of its engines (two for a twin logged together); returns their events. */
async function addDemoRun(
  manager: EntityManager,
  world: DemoWorld,
  plan: DemoRun,
): Promise<StoredEvent[]> {
  const engineKeys = [plan.engineKey, ...(plan.twinEngineKey ? [plan.twinEngineKey] : [])];
  const runEngines = engineKeys.map((key) => world.engines.get(world.refs.engineIds.get(key)!)!);
  const program = world.programs.get(plan.programKey)!;
  const crew = await crewOf(manager, runEngines[0].vesselId);
  const stored: StoredEvent[] = [];
  let simulated: SimulatedEvent[] = [];
  for (const [index, engine] of runEngines.entries()) {
    const bands: Record<string, RpmBand> = Object.fromEntries(
      program.definition.phases.map((p) => [p.id, resolvePhaseBand(p, engine)]),
    );
    const phases = frozenPhases(program.definition, bands, {});
    simulated =
      index === 0
        ? firstEngineEvents(plan, engine, phases)
        : twinOf(simulated, engine.id, phases, plan.randomStart + index);
    const input: EngineRun = { plan, engine, program, bands, phases, crew, simulated };
    stored.push(...(await recordEngineRun(manager, world, input)));
  }
  return stored;
}

async function crewOf(manager: EntityManager, vesselId: string): Promise<Crew> {
  const vessel = await manager.getRepository(Vessel).findOneByOrFail({ id: vesselId });
  const skipperLinks = await manager.getRepository(VesselSkipper).findBy({ vesselId: vessel.id });
  const skippers = skipperLinks.length
    ? await manager.getRepository(User).findBy({ id: In(skipperLinks.map((l) => l.userId)) })
    : [];
  return { vessel, skippers };
}

/** The outings of the plan's first engine, with the alerts its device raised. */
function firstEngineEvents(
  plan: DemoRun,
  engine: Engine,
  phases: ResolvedPhase[],
): SimulatedEvent[] {
  const input = {
    phases,
    engineId: engine.id,
    ratedMax: engine.ratedRpmMax,
    idleRpm: plan.idleRpm,
    hourMeterStart: engine.hourMeterAtCommissioning ?? 0,
    randomStart: plan.randomStart,
  };
  return [...simulateOutings(input, plan.outings), ...alertsOf(plan, engine.id)];
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

/** One engine's run with everything that happened to it: events, submission, sign-off. */
async function recordEngineRun(
  manager: EntityManager,
  world: DemoWorld,
  input: EngineRun,
): Promise<StoredEvent[]> {
  const { plan, engine, crew, simulated } = input;
  const { technician, workshop } = world;
  const skipper = crew.skippers[0];
  const run = await insertRun(manager, {
    ...input,
    workshopId: world.refs.workshopId,
    assignedById: world.refs.userIds.get(plan.assignedBy)!,
  });
  const authors = { workshop: technician.id, skipper: skipper?.id ?? technician.id };
  const aheadMs = plan.skipperClockAheadMs ?? 0;
  const events = storedEvents(simulated, run, authors, aheadMs);
  const skipperLogged = simulated.some((e) => e.by === 'skipper');
  await finishRun(manager, run, events, skipperLogged ? (plan.skipperClockAheadMs ?? null) : null);
  if (plan.submittedAt && skipper) {
    const at = plan.submittedAt + aheadMs;
    await insertSubmission(manager, {
      runId: run.id,
      authorId: skipper.id,
      at,
      receivedAt: plan.submittedAt,
    });
  }
  if (plan.signedOff) {
    await addDemoSignOff(manager, {
      ...crew,
      run,
      engine,
      workshop,
      technician,
      phases: input.phases,
      events: events.map((e) => e.event),
      at: new Date(plan.signedOff.at),
      comments: plan.signedOff.comments,
    });
  }
  return events;
}
