import { randomUUID } from 'node:crypto';
import type { Express } from 'express';
import { DEMO, signedInAgent } from './test-server.js';

type Vessel = { name: string; engines: Array<{ id: string; position: string }> };
import type { RunDetail } from '../../shared/runs/run-view.js';

export type { RunDetail };

/** Assigns a built-in program to a demo engine as the demo technician and returns the new run. */
export async function assignRun(
  app: Express,
  vessel: string,
  position: string,
  programKey = 'four-stroke-outboard',
): Promise<RunDetail> {
  const tech = await signedInAgent(app, DEMO.technician);
  const vessels: Vessel[] = (await tech.get('/api/vessels')).body.vessels;
  const engine = vessels
    .find((v) => v.name === vessel)!
    .engines.find((e) => e.position === position)!;
  const program = (await tech.get('/api/programs')).body.programs.find(
    (p: { builtInKey: string }) => p.builtInKey === programKey,
  );
  const res = await tech.post('/api/runs').send({ engineId: engine.id, programId: program.id });
  if (res.status !== 201)
    throw new Error(`assign failed: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body.run;
}

/** A reading event for a run as a device would make it. */
export function readingFor(
  run: Pick<RunDetail, 'id'> & { engine: { id: string }; program: { phases: { id: string }[] } },
  at: number,
  rpm: number,
  throttle = 'half',
  phaseIndex = 1,
) {
  return {
    type: 'event' as const,
    runId: run.id,
    event: {
      kind: 'reading' as const,
      id: randomUUID(),
      at,
      engineId: run.engine.id,
      phaseId: run.program.phases[phaseIndex].id,
      rpm,
      throttle,
    },
  };
}

export function sessionEventFor(
  run: RunDetail,
  kind: 'session-start' | 'session-stop',
  at: number,
) {
  return {
    type: 'event' as const,
    runId: run.id,
    event: { kind, id: randomUUID(), at, engineId: run.engine.id },
  };
}
