import type { EngineInput, Installation } from '../engines/engine.schema';
import { CYCLE_WORDS, FUEL_WORDS, INSTALLATION_WORDS } from '../engines/engine-words';
import type { EngineKind, Program } from './program.schema';

/*
 * Which engines a program is written for. A kind names the installation, and the cycle or the
 * fuel where its name says so; what it does not name is open (a diesel can be two-stroke, so
 * "inboard diesel" says nothing of the cycle). "Any engine" suits every engine.
 */

type Fuel = EngineInput['fuel'];
type Cycle = EngineInput['cycle'];
interface KindTarget {
  installation?: Installation;
  fuel?: Fuel;
  cycle?: Cycle;
}

const TARGETS: Record<EngineKind, KindTarget> = {
  'outboard-4-stroke': { installation: 'outboard', cycle: 'four-stroke' },
  'outboard-2-stroke': { installation: 'outboard', cycle: 'two-stroke' },
  'inboard-diesel': { installation: 'inboard', fuel: 'diesel' },
  'sterndrive-petrol': { installation: 'sterndrive', fuel: 'petrol' },
  any: {},
};

export type SuitableEngine = Pick<EngineInput, 'installation' | 'fuel' | 'cycle'>;

export type Suitability = { suits: true } | { suits: false; reasons: string[] };

const lower = (words: string) => words.toLowerCase();

/** Whether the program suits the engine, and if not, each way it does not, in words. */
export function programSuits(
  program: { suits: Pick<Program['suits'], 'engineKind'> },
  engine: SuitableEngine,
): Suitability {
  const target = TARGETS[program.suits.engineKind];
  const reasons: string[] = [];
  if (target.installation && target.installation !== engine.installation)
    reasons.push(
      `It is for ${lower(INSTALLATION_WORDS[target.installation])} engines; this one is ${lower(INSTALLATION_WORDS[engine.installation])}.`,
    );
  if (target.cycle && target.cycle !== engine.cycle)
    reasons.push(
      `It is for ${lower(CYCLE_WORDS[target.cycle])} engines; this one is ${lower(CYCLE_WORDS[engine.cycle])}.`,
    );
  if (target.fuel && target.fuel !== engine.fuel)
    reasons.push(
      `It is for ${lower(FUEL_WORDS[target.fuel])} engines; this one runs on ${lower(FUEL_WORDS[engine.fuel])}.`,
    );
  return reasons.length === 0 ? { suits: true } : { suits: false, reasons };
}

/** Programs that suit the engine first, each group in the order given. */
export function suitingFirst<P extends { suits: Pick<Program['suits'], 'engineKind'> }>(
  programs: readonly P[],
  engine: SuitableEngine,
): Array<{ program: P; suitability: Suitability }> {
  const judged = programs.map((program) => ({
    program,
    suitability: programSuits(program, engine),
  }));
  return [
    ...judged.filter((j) => j.suitability.suits),
    ...judged.filter((j) => !j.suitability.suits),
  ];
}
