import { randomUUID } from 'node:crypto';
import type { DataSource } from 'typeorm';
import {
  BUILT_IN_PROGRAMS,
  BUILT_IN_PROGRAM_KEYS,
} from '../../../shared/programs/built-in-programs.js';
import type { Program as ProgramDefinition } from '../../../shared/programs/program.schema.js';
import type { Clock } from '../../lib/clock.js';
import { ConflictError, NotFoundError } from '../../lib/errors.js';
import { Workshop } from '../workshops/workshop.entity.js';
import { Program } from './program.entity.js';

export type ProgramSummary = ReturnType<typeof toSummary>;

export function toSummary(program: Program) {
  const { definition } = program;
  return {
    id: program.id,
    name: program.name,
    builtInKey: program.builtInKey,
    copiedFromId: program.copiedFromId,
    retiredAt: program.retiredAt?.toISOString() ?? null,
    suits: definition.suits,
    phaseCount: definition.phases.length,
    totalMinutes: definition.phases.reduce((sum, phase) => sum + phase.requiredMinutes, 0),
    firstService: definition.firstService,
    updatedAt: program.updatedAt.toISOString(),
  };
}

export const toDetail = (program: Program) => ({
  ...toSummary(program),
  definition: program.definition,
});

/**
 * Gives every workshop its row for each built-in program and keeps those rows equal to the code.
 * Runs hold their own frozen copies, so refreshing a built-in never changes a run.
 */
export async function syncBuiltInPrograms(dataSource: DataSource): Promise<void> {
  await dataSource.transaction(async (manager) => {
    const repo = manager.getRepository(Program);
    for (const workshop of await manager.getRepository(Workshop).find({ select: { id: true } })) {
      for (const key of BUILT_IN_PROGRAM_KEYS) {
        const definition = BUILT_IN_PROGRAMS[key];
        const existing = await repo.findOne({
          where: { workshopId: workshop.id, builtInKey: key },
        });
        if (!existing) {
          await repo.insert({
            id: randomUUID(),
            workshopId: workshop.id,
            builtInKey: key,
            copiedFromId: null,
            name: definition.name,
            definition,
            retiredAt: null,
          });
        } else if (JSON.stringify(existing.definition) !== JSON.stringify(definition)) {
          await repo.update({ id: existing.id }, { name: definition.name, definition });
        }
      }
    }
  });
}

export class ProgramsService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly clock: Clock,
  ) {}

  private get repo() {
    return this.dataSource.getRepository(Program);
  }

  list(workshopId: string) {
    return this.repo.find({ where: { workshopId }, order: { name: 'ASC' } });
  }

  async get(workshopId: string, id: string): Promise<Program> {
    const program = await this.repo.findOne({ where: { id, workshopId } });
    if (!program) throw new NotFoundError('program', id);
    return program;
  }

  async copy(workshopId: string, id: string): Promise<Program> {
    const source = await this.get(workshopId, id);
    const definition: ProgramDefinition = { ...source.definition, name: `${source.name} (copy)` };
    const copy = Object.assign(new Program(), {
      id: randomUUID(),
      workshopId,
      builtInKey: null,
      copiedFromId: source.id,
      name: definition.name,
      definition,
      retiredAt: null,
    });
    await this.repo.insert(copy);
    return this.get(workshopId, copy.id);
  }

  async update(workshopId: string, id: string, definition: ProgramDefinition): Promise<Program> {
    const program = await this.get(workshopId, id);
    if (program.builtInKey)
      throw new ConflictError('Built-in programs cannot be edited. Copy it and edit the copy.');
    if (program.retiredAt)
      throw new ConflictError('This program is retired. Reinstate it before editing.');
    await this.repo.update({ id }, { name: definition.name, definition });
    return this.get(workshopId, id);
  }

  async setRetired(workshopId: string, id: string, retired: boolean): Promise<Program> {
    await this.get(workshopId, id);
    await this.repo.update({ id }, { retiredAt: retired ? this.clock.now() : null });
    return this.get(workshopId, id);
  }
}
