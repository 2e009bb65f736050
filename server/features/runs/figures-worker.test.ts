import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { frozenPhases } from '../../../shared/review/frozen-phases.js';
import { startTestServer, type TestServer } from '../../../tests/helpers/test-server.js';
import { figuresWorker } from './figures-worker.js';
import { computeRunFigures } from './run-figures.js';
import { Run } from './run.entity.js';

let server: TestServer;
beforeAll(async () => {
  server = await startTestServer();
});
afterAll(() => server.close());

describe('the figures thread', () => {
  it('works out the same figures as the server itself, for every demo run', async () => {
    const runs = await server.dataSource.getRepository(Run).find();
    const file = path.resolve(String(server.dataSource.options.database));
    expect(runs.length).toBeGreaterThan(3);
    for (const run of runs) {
      const phases = frozenPhases(run.program, run.bands, run.rerunFrom);
      const here = await computeRunFigures(server.dataSource, run, phases);
      const there = await figuresWorker.compute(
        file,
        { id: run.id, engineId: run.engineId },
        phases,
      );
      expect(there).toEqual(here);
    }
  });
});
