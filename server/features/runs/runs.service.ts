import { randomUUID } from 'node:crypto';
import { In, type DataSource, type EntityManager } from 'typeorm';
import type { SessionUser } from '../../../shared/auth/auth.schema.js';
import type { RpmBand } from '../../../shared/programs/phase-band.schema.js';
import { programSuits, type Suitability } from '../../../shared/programs/program-suits.js';
import { checkProgramForEngine, resolvePhaseBand } from '../../../shared/programs/resolve-band.js';
import { OPEN_RUN_STATES, type AssignProgramInput } from '../../../shared/runs/run.schema.js';
import { ConflictError, ValidationError } from '../../lib/errors.js';
import { recordAudit } from '../audit/audit.service.js';
import { Program } from '../programs/program.entity.js';
import { Engine } from '../vessels/engine.entity.js';
import { Vessel } from '../vessels/vessel.entity.js';
import { visibleRun, visibleRunsWhere } from './run-access.js';
import { runEngineOf } from './run-engine.js';
import { Run } from './run.entity.js';
import { reserveChangeSeq } from '../../lib/change-seq.js';
import type { RunDetail, RunView } from '../../../shared/runs/run-view.js';

export class RunsService {
  constructor(private readonly dataSource: DataSource) {}

  /** Freezes a copy of the program, with its bands resolved for this engine, into a new planned run. */
  async assign(user: SessionUser, input: AssignProgramInput): Promise<Run> {
    return this.dataSource.transaction(async (manager) => {
      const { engine, program, suitability } = await findAssignable(manager, user, input);
      await this.refuseSecondOpenRun(manager, engine.id);
      const bands: Record<string, RpmBand> = {};
      for (const phase of program.definition.phases)
        bands[phase.id] = resolvePhaseBand(phase, engine);
      const run = Object.assign(new Run(), {
        id: randomUUID(),
        workshopId: user.workshopId,
        engineId: engine.id,
        vesselId: engine.vesselId,
        programId: program.id,
        program: structuredClone(program.definition),
        bands,
        state: 'planned',
        assignedById: user.id,
        submittedAt: null,
        signedOffAt: null,
        currentPhaseId: null,
        notes: '',
        clockSkewMs: null,
        lastEventAt: null,
        seq: await reserveChangeSeq(manager),
      });
      await manager.getRepository(Run).insert(run);
      await recordAudit(manager, {
        workshopId: user.workshopId,
        recordType: 'run',
        recordId: run.id,
        action: 'run-assigned',
        actor: { id: user.id, name: user.name },
        at: new Date(),
        detail: assignedDetail(program.definition.name, suitability, input.reason),
      });
      return run;
    });
  }

  private async refuseSecondOpenRun(manager: EntityManager, engineId: string) {
    const open = await manager
      .getRepository(Run)
      .exists({ where: { engineId, state: In([...OPEN_RUN_STATES]) } });
    if (open) {
      throw new ConflictError(
        'This engine already has a break-in run that is not signed off. Finish or sign off that one first.',
        [{ field: 'engineId', message: 'This engine already has an open break-in run.' }],
      );
    }
  }

  async list(user: SessionUser) {
    const where = await visibleRunsWhere(this.dataSource, user);
    const runs = await this.dataSource
      .getRepository(Run)
      .find({ where, relations: { engine: true }, order: { updatedAt: 'DESC' } });
    const vessels = await this.dataSource
      .getRepository(Vessel)
      .find({ where: { id: In([...new Set(runs.map((r) => r.vesselId))]) } });
    const vesselName = new Map(vessels.map((v) => [v.id, v.name]));
    return runs.map((run) => toRunView(run, vesselName.get(run.vesselId) ?? ''));
  }

  /** A run the user may see, or 404 (never 403, so ids of other workshops are not confirmed). */
  async get(user: SessionUser, id: string): Promise<RunDetail> {
    const run = await visibleRun(this.dataSource, user, id);
    const vessel = await this.dataSource
      .getRepository(Vessel)
      .findOneOrFail({ where: { id: run.vesselId } });
    return toRunDetail(run, vessel.name);
  }
}

/**
 * The engine and program named, each in the user's workshop, the program current and fitting the
 * engine; a program written for another kind of engine only with a reason.
 */
async function findAssignable(
  manager: EntityManager,
  user: SessionUser,
  input: AssignProgramInput,
): Promise<{ engine: Engine; program: Program; suitability: Suitability }> {
  const engine = await manager
    .getRepository(Engine)
    .findOne({ where: { id: input.engineId, workshopId: user.workshopId } });
  if (!engine || engine.archivedAt)
    throw new ValidationError([
      { field: 'engineId', message: 'This engine is not in your workshop.' },
    ]);
  const program = await manager
    .getRepository(Program)
    .findOne({ where: { id: input.programId, workshopId: user.workshopId } });
  if (!program)
    throw new ValidationError([
      { field: 'programId', message: 'This program is not in your workshop.' },
    ]);
  if (program.retiredAt)
    throw new ValidationError([
      { field: 'programId', message: `"${program.name}" is retired and cannot be assigned.` },
    ]);
  const check = checkProgramForEngine(program.definition, engine);
  if (!check.ok)
    throw new ValidationError(
      check.issues.map((i) => ({ field: `program.${i.field}`, message: i.message })),
      'The program does not fit this engine.',
    );
  return { engine, program, suitability: suitabilityWithReason(program, engine, input.reason) };
}

/** Whether the program suits the engine; one that does not is refused unless a reason is given. */
function suitabilityWithReason(program: Program, engine: Engine, reason?: string): Suitability {
  const suitability = programSuits(program.definition, engine);
  if (!suitability.suits && !reason)
    throw new ValidationError(
      [
        {
          field: 'reason',
          message: `"${program.name}" does not suit this engine: ${suitability.reasons.join(' ')} Give the reason (reason) for assigning it anyway.`,
        },
      ],
      'The program does not suit this engine; a reason is needed to assign it.',
    );
  return suitability;
}

/** The trail's words for an assignment: the program, and why when it does not suit the engine. */
function assignedDetail(name: string, suitability: Suitability, reason?: string): string {
  if (suitability.suits) return reason ? `${name}. Reason: ${reason}` : name;
  return `${name}, which does not suit this engine: ${suitability.reasons.join(' ')} Reason: ${reason}`;
}

/** Everything a device needs to run and judge the break-in offline: the view plus the frozen program and bands. */
export const toRunDetail = (run: Run, vesselName: string): RunDetail => ({
  ...toRunView(run, vesselName),
  program: run.program,
  bands: run.bands,
});

function toRunView(run: Run, vesselName: string): RunView {
  const engine = run.engine!;
  return {
    id: run.id,
    state: run.state,
    vessel: { id: run.vesselId, name: vesselName },
    engine: runEngineOf(engine),
    programId: run.programId,
    programName: run.program.name,
    phaseCount: run.program.phases.length,
    totalMinutes: run.program.phases.reduce((sum, p) => sum + p.requiredMinutes, 0),
    currentPhaseId: run.currentPhaseId,
    notes: run.notes,
    clockSkewMs: run.clockSkewMs,
    lastEventAt: run.lastEventAt,
    submittedAt: run.submittedAt?.toISOString() ?? null,
    submitNote: run.submitNote,
    rerunFrom: run.rerunFrom,
    lastDecision: run.lastDecision,
    certificateNumber: run.certificateNumber,
    signedOffAt: run.signedOffAt?.toISOString() ?? null,
    createdAt: run.createdAt.toISOString(),
    updatedAt: run.updatedAt.toISOString(),
  };
}
