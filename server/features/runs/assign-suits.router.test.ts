import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  DEMO,
  signedInAgent,
  startTestServer,
  type TestServer,
} from '../../../tests/helpers/test-server.js';
import { AuditEntry } from '../audit/audit-entry.entity.js';
import { Run } from './run.entity.js';

let server: TestServer;
beforeAll(async () => {
  server = await startTestServer();
});
afterAll(() => server.close());

type Vessel = { name: string; engines: Array<{ id: string; position: string }> };
type Program = { id: string; name: string; builtInKey: string | null };

async function fixtures() {
  const tech = await signedInAgent(server.app, DEMO.technician);
  const vessels: Vessel[] = (await tech.get('/api/vessels')).body.vessels;
  const programs: Program[] = (await tech.get('/api/programs')).body.programs;
  // Gannet's outboard is a petrol four-stroke (demo data); the two-stroke program is not for it.
  const gannet = vessels.find((v) => v.name === 'Gannet')!.engines[0];
  const twoStroke = programs.find((p) => p.builtInKey === 'two-stroke-outboard')!;
  return { tech, gannet, twoStroke };
}

const runsOn = (engineId: string) => server.dataSource.getRepository(Run).countBy({ engineId });

describe('assigning a program that does not suit the engine', () => {
  it('is refused without a reason, the refusal saying why and naming the reason field', async () => {
    const { tech, gannet, twoStroke } = await fixtures();
    const res = await tech.post('/api/runs').send({ engineId: gannet.id, programId: twoStroke.id });
    expect(res.status).toBe(400);
    expect(res.body.detail).toBe(
      'The program does not suit this engine; a reason is needed to assign it.',
    );
    expect(res.body.errors).toEqual([
      {
        field: 'reason',
        message: `"${twoStroke.name}" does not suit this engine: It is for two-stroke engines; this one is four-stroke. Give the reason (reason) for assigning it anyway.`,
      },
    ]);
    const blank = await tech
      .post('/api/runs')
      .send({ engineId: gannet.id, programId: twoStroke.id, reason: '  ' });
    expect(blank.status).toBe(400);
    expect(blank.body.errors[0].field).toBe('reason');
    expect(await runsOn(gannet.id)).toBe(0);
  });

  it('is assigned with a reason, which the trail keeps', async () => {
    const { tech, gannet, twoStroke } = await fixtures();
    const reason = "The maker's schedule for this engine matches the two-stroke program.";
    const res = await tech
      .post('/api/runs')
      .send({ engineId: gannet.id, programId: twoStroke.id, reason });
    expect(res.status).toBe(201);
    const trail = await server.dataSource
      .getRepository(AuditEntry)
      .findBy({ recordId: res.body.run.id, action: 'run-assigned' });
    expect(trail).toHaveLength(1);
    expect(trail[0].detail).toBe(
      `${twoStroke.name}, which does not suit this engine: It is for two-stroke engines; this one is four-stroke. Reason: ${reason}`,
    );
  });
});
