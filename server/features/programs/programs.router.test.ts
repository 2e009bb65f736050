import { afterAll, beforeAll, describe, expect, it } from 'vitest';
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

type Summary = { id: string; name: string; builtInKey: string | null; retiredAt: string | null };
const manager = () => signedInAgent(server.app, DEMO.manager);
const technician = () => signedInAgent(server.app, DEMO.technician);

async function builtIn(key: string): Promise<Summary> {
  const res = await (await technician()).get('/api/programs');
  return res.body.programs.find((p: Summary) => p.builtInKey === key);
}

async function copyOf(key: string) {
  const source = await builtIn(key);
  const res = await (await manager()).post(`/api/programs/${source.id}/copy`);
  expect(res.status).toBe(201);
  return res.body.program;
}

describe('program templates', () => {
  it('gives every workshop the three built-in programs, each citing common practice', async () => {
    const res = await (await technician()).get('/api/programs');
    expect(res.status).toBe(200);
    const keys = res.body.programs
      .map((p: Summary) => p.builtInKey)
      .filter(Boolean)
      .sort();
    expect(keys).toEqual(['four-stroke-outboard', 'small-inboard-diesel', 'two-stroke-outboard']);
    const detail = await (
      await technician()
    ).get(`/api/programs/${(await builtIn('four-stroke-outboard')).id}`);
    expect(detail.body.program.definition.source).toMatch(/common practice/i);
  });

  it('keeps skippers out of the templates', async () => {
    const res = await (await signedInAgent(server.app, DEMO.skipperA)).get('/api/programs');
    expect(res.status).toBe(403);
  });

  it('lets a manager copy a built-in program and edit the copy, but never the built-in itself', async () => {
    const copy = await copyOf('four-stroke-outboard');
    expect(copy).toMatchObject({ builtInKey: null, name: expect.stringContaining('(copy)') });
    const definition = {
      ...copy.definition,
      name: 'Tidewright 4-stroke, short',
      phases: copy.definition.phases.slice(0, 2).reverse(),
    };
    const saved = await (await manager()).put(`/api/programs/${copy.id}`).send(definition);
    expect(saved.status).toBe(200);
    expect(saved.body.program.name).toBe('Tidewright 4-stroke, short');
    expect(saved.body.program.definition.phases.map((p: { id: string }) => p.id)).toEqual(
      definition.phases.map((p: { id: string }) => p.id),
    );

    const original = await builtIn('four-stroke-outboard');
    const refused = await (await manager()).put(`/api/programs/${original.id}`).send(definition);
    expect(refused.status).toBe(409);
    expect(refused.body.detail).toContain('Copy it');
  });

  it('names the field of each bad phase and saves nothing', async () => {
    const copy = await copyOf('two-stroke-outboard');
    const phases = structuredClone(copy.definition.phases);
    phases[0].band = { kind: 'absolute', rpmMin: 3000, rpmMax: 2000 }; // inverted
    phases[1].requiredMinutes = 0;
    phases[2].throttleCeiling = 'flank-speed';
    const res = await (
      await manager()
    )
      .put(`/api/programs/${copy.id}`)
      .send({ ...copy.definition, phases });
    expect(res.status).toBe(400);
    const fields = res.body.errors.map((e: { field: string }) => e.field);
    expect(fields).toEqual(
      expect.arrayContaining([
        'phases.0.band.rpmMax',
        'phases.1.requiredMinutes',
        'phases.2.throttleCeiling',
      ]),
    );
    const after = await (await manager()).get(`/api/programs/${copy.id}`);
    expect(after.body.program.definition).toEqual(copy.definition);
  });

  it('lets only managers copy, edit and retire', async () => {
    const source = await builtIn('small-inboard-diesel');
    const tech = await technician();
    expect((await tech.post(`/api/programs/${source.id}/copy`)).status).toBe(403);
    expect((await tech.post(`/api/programs/${source.id}/retire`)).status).toBe(403);
  });

  it('retires and reinstates a program', async () => {
    const copy = await copyOf('small-inboard-diesel');
    const retired = await (await manager()).post(`/api/programs/${copy.id}/retire`);
    expect(retired.body.program.retiredAt).not.toBeNull();
    const back = await (await manager()).post(`/api/programs/${copy.id}/reinstate`);
    expect(back.body.program.retiredAt).toBeNull();
  });

  it("hides another workshop's programs (404)", async () => {
    const other = await addOtherWorkshop(server.dataSource);
    const ours = await builtIn('four-stroke-outboard');
    const res = await (
      await signedInAgent(server.app, other.technicianEmail)
    ).get(`/api/programs/${ours.id}`);
    expect(res.status).toBe(404);
  });
});
