import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { Express } from 'express';
import supertest from 'supertest';
import type { DataSource } from 'typeorm';
import { createApp, type AppDeps } from '../../server/app.js';
import type { Clock } from '../../server/lib/clock.js';
import { openDatabase } from '../../server/lib/database.js';
import { createLogger } from '../../server/lib/logger.js';
import { prepareData } from '../../server/prepare-data.js';
import { DEMO_PASSWORD } from '../../server/demo/demo-people.js';

export { DEMO_PASSWORD };

export const HOST = 'ringseat.test';
export const ORIGIN = `http://${HOST}`;

/** A supertest agent that sends the Host and Origin a browser on the app's own page would send. */
export const browserAgent = (app: Express) =>
  supertest.agent(app).set('Host', HOST).set('Origin', ORIGIN);

/** A settable clock for tests where time matters. */
export class FakeClock implements Clock {
  constructor(private current: Date = new Date('2026-12-01T09:00:00Z')) {}
  now() {
    return new Date(this.current);
  }
  advance(ms: number) {
    this.current = new Date(this.current.getTime() + ms);
  }
}

export type TestServer = {
  app: Express;
  dataSource: DataSource;
  dir: string;
  close: () => Promise<void>;
};

/** A real app on a real, migrated SQLite file in a temporary folder, with the demo workshop in it. */
export async function startTestServer(overrides: Partial<AppDeps> = {}): Promise<TestServer> {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'ringseat-test-'));
  const dataSource = await openDatabase(path.join(dir, 'ringseat.sqlite'));
  await prepareData(dataSource, { demo: 'demo' });
  const app = createApp({ dataSource, logger: createLogger('silent'), dataDir: dir, ...overrides });
  return {
    app,
    dataSource,
    dir,
    close: async () => {
      await dataSource.destroy();
      fs.rmSync(dir, { recursive: true, force: true });
    },
  };
}

/** Signs in through the API and returns an agent that carries the session cookie and Origin. */
export async function signedInAgent(app: Express, email: string, password = DEMO_PASSWORD) {
  const agent = browserAgent(app);
  const res = await agent.post('/api/auth/sign-in').send({ email, password });
  if (res.status !== 200)
    throw new Error(`sign-in as ${email} failed: ${res.status} ${JSON.stringify(res.body)}`);
  return agent;
}

export const DEMO = {
  manager: 'maren@tidewright.example',
  technician: 'ivo@tidewright.example',
  skipperA: 'sunniva@skipper.example',
  skipperB: 'tomas@skipper.example',
} as const;

/** A second, unrelated workshop with one technician (or manager), for tenancy checks. */
export async function addOtherWorkshop(
  dataSource: DataSource,
  role: 'technician' | 'manager' = 'technician',
): Promise<{ workshopId: string; technicianEmail: string }> {
  const { randomUUID } = await import('node:crypto');
  const { Workshop } = await import('../../server/features/workshops/workshop.entity.js');
  const { User } = await import('../../server/features/users/user.entity.js');
  const { hashPassword } = await import('../../server/lib/passwords.js');
  const workshopId = randomUUID();
  await dataSource.getRepository(Workshop).insert({
    id: workshopId,
    name: 'Other Yard Ltd',
    units: { speed: 'kn', volume: 'L', power: 'kW', temperature: 'C' },
  });
  const technicianEmail = `tech-${workshopId.slice(0, 8)}@other-yard.example`;
  await dataSource.getRepository(User).insert({
    id: randomUUID(),
    workshopId,
    email: technicianEmail,
    name: 'Other Technician',
    role,
    passwordHash: await hashPassword(DEMO_PASSWORD),
    archivedAt: null,
  });
  await prepareData(dataSource, { demo: 'none' });
  return { workshopId, technicianEmail };
}
