import { randomUUID } from 'node:crypto';
import type { EntityManager } from 'typeorm';
import {
  BUILT_IN_PROGRAM_KEYS,
  BUILT_IN_PROGRAMS,
} from '../../shared/programs/built-in-programs.js';
import { Program } from '../features/programs/program.entity.js';

/** The workshop's copies of the built-in programs (the start-up sync then finds them current). */
export async function addDemoPrograms(
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
