import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AuditEntry } from '../audit/audit-entry.entity.js';
import {
  addOtherWorkshop,
  DEMO,
  signedInAgent,
  startTestServer,
  type TestServer,
} from '../../../tests/helpers/test-server.js';

let server: TestServer;
beforeAll(async () => {
  server = await startTestServer();
});
afterAll(() => server.close());

type Vessel = {
  name: string;
  engines: Array<{ id: string; position: string; ratedRpmMax: number }>;
};
type Program = {
  id: string;
  builtInKey: string | null;
  definition: { phases: Array<{ id: string; band: object }> };
};

async function fixtures() {
  const tech = await signedInAgent(server.app, DEMO.technician);
  const vessels: Vessel[] = (await tech.get('/api/vessels')).body.vessels;
  const programs: Program[] = (await tech.get('/api/programs')).body.programs;
  const engine = (vessel: string, position: string) =>
    vessels.find((v) => v.name === vessel)!.engines.find((e) => e.position === position)!;
  const program = (key: string) => programs.find((p) => p.builtInKey === key)!;
  return { tech, engine, program };
}

describe('assigning a program to an engine', () => {
  it('creates a planned run holding a frozen copy that later template edits never change', async () => {
    const { tech, engine, program } = await fixtures();
    const manager = await signedInAgent(server.app, DEMO.manager);
    const copy = (await manager.post(`/api/programs/${program('four-stroke-outboard').id}/copy`))
      .body.program;
    const port = engine('Blue Tern', 'port');

    const created = await tech.post('/api/runs').send({ engineId: port.id, programId: copy.id });
    expect(created.status).toBe(201);
    const run = created.body.run;
    expect(run).toMatchObject({
      state: 'planned',
      vessel: { name: 'Blue Tern' },
      engine: { position: 'port' },
    });
    const trail = await server.dataSource.getRepository(AuditEntry).findBy({ recordId: run.id });
    expect(trail).toMatchObject([
      { action: 'run-assigned', actorName: 'Ivo Brandt', detail: copy.definition.name },
    ]);
    // Share bands are resolved against this engine's rated maximum (6000 rpm in the demo data).
    for (const band of Object.values(run.bands) as Array<{ rpmMax: number }>)
      expect(band.rpmMax).toBeLessThanOrEqual(port.ratedRpmMax);

    const edited = {
      ...copy.definition,
      name: 'Edited afterwards',
      phases: copy.definition.phases.slice(0, 1),
    };
    expect((await manager.put(`/api/programs/${copy.id}`).send(edited)).status).toBe(200);
    const after = (await tech.get(`/api/runs/${run.id}`)).body.run;
    expect(after.programName).toBe(copy.definition.name);
    expect(after.program).toEqual(copy.definition);
    expect(after.bands).toEqual(run.bands);
  });

  it('refuses a second open run on the same engine, naming the engine field', async () => {
    const { tech, engine, program } = await fixtures();
    const starboard = engine('Blue Tern', 'starboard');
    expect(
      (
        await tech
          .post('/api/runs')
          .send({ engineId: starboard.id, programId: program('four-stroke-outboard').id })
      ).status,
    ).toBe(201);
    const again = await tech
      .post('/api/runs')
      .send({ engineId: starboard.id, programId: program('four-stroke-outboard').id });
    expect(again.status).toBe(409);
    expect(again.body.errors).toEqual([
      { field: 'engineId', message: 'This engine already has an open break-in run.' },
    ]);
  });

  it("refuses a program whose ceiling is above the engine's rated RPM, naming the phase field", async () => {
    const { tech, engine, program } = await fixtures();
    const manager = await signedInAgent(server.app, DEMO.manager);
    const copy = (await manager.post(`/api/programs/${program('small-inboard-diesel').id}/copy`))
      .body.program;
    const phases = structuredClone(copy.definition.phases);
    phases[1].band = { kind: 'absolute', rpmMin: 1500, rpmMax: 4200 }; // the demo diesel is rated 3400–3600 rpm
    expect(
      (await manager.put(`/api/programs/${copy.id}`).send({ ...copy.definition, phases })).status,
    ).toBe(200);
    const res = await tech
      .post('/api/runs')
      .send({ engineId: engine('Halcyon Drift', 'inboard').id, programId: copy.id });
    expect(res.status).toBe(400);
    expect(res.body.errors[0].field).toBe('program.phases.1.band.rpmMax');
    expect(res.body.errors[0].message).toContain('3600');
  });

  it('refuses a retired program and an unknown engine', async () => {
    const { tech, engine, program } = await fixtures();
    const manager = await signedInAgent(server.app, DEMO.manager);
    const copy = (await manager.post(`/api/programs/${program('two-stroke-outboard').id}/copy`))
      .body.program;
    await manager.post(`/api/programs/${copy.id}/retire`);
    const retired = await tech
      .post('/api/runs')
      .send({ engineId: engine('Gannet', 'single').id, programId: copy.id });
    expect(retired.status).toBe(400);
    expect(retired.body.errors[0].field).toBe('programId');
    const unknown = await tech
      .post('/api/runs')
      .send({ engineId: '00000000-0000-4000-8000-000000000000', programId: copy.id });
    expect(unknown.body.errors[0].field).toBe('engineId');
  });

  it('lets skippers see only their own runs and never assign', async () => {
    const { tech, engine, program } = await fixtures();
    const gannetRun = (
      await tech.post('/api/runs').send({
        engineId: engine('Gannet', 'single').id,
        programId: program('four-stroke-outboard').id,
      })
    ).body.run;
    const sunniva = await signedInAgent(server.app, DEMO.skipperA);
    const tomas = await signedInAgent(server.app, DEMO.skipperB);
    expect((await sunniva.get(`/api/runs/${gannetRun.id}`)).status).toBe(200);
    expect((await tomas.get(`/api/runs/${gannetRun.id}`)).status).toBe(404);
    expect(
      (await tomas.get('/api/runs')).body.runs.map(
        (r: { vessel: { name: string } }) => r.vessel.name,
      ),
    ).not.toContain('Gannet');
    const assign = await sunniva.post('/api/runs').send({
      engineId: engine('Gannet', 'single').id,
      programId: program('four-stroke-outboard').id,
    });
    expect(assign.status).toBe(403);
  });

  it("hides runs from another workshop's technician (404) and lets them assign nothing of ours", async () => {
    const { tech, engine, program } = await fixtures();
    const runs = (await tech.get('/api/runs')).body.runs;
    const other = await addOtherWorkshop(server.dataSource);
    const stranger = await signedInAgent(server.app, other.technicianEmail);
    expect((await stranger.get(`/api/runs/${runs[0].id}`)).status).toBe(404);
    expect((await stranger.get('/api/runs')).body.runs).toEqual([]);
    const res = await stranger.post('/api/runs').send({
      engineId: engine('Halcyon Drift', 'inboard').id,
      programId: program('small-inboard-diesel').id,
    });
    expect(res.status).toBe(400);
  });
});
