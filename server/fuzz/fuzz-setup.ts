import type { Express } from 'express';
import type { DataSource } from 'typeorm';
import { DEMO, signedInAgent } from '../../tests/helpers/test-server.js';
import { Attachment } from '../features/attachments/attachment.entity.js';
import { Program } from '../features/programs/program.entity.js';
import { Run } from '../features/runs/run.entity.js';
import { Certificate } from '../features/signoff/certificate.entity.js';
import { Engine } from '../features/vessels/engine.entity.js';
import { Vessel } from '../features/vessels/vessel.entity.js';
import type { Sender } from './send-request.js';

type Agent = Awaited<ReturnType<typeof signedInAgent>>;

/**
 * Nobody, a skipper, a technician and a manager, each signed in once; the board is read once by
 * each (see warmSummaries) before their session cookies are taken for the fuzzing.
 */
export async function everyone(app: Express): Promise<Sender[]> {
  const people = [
    ['skipper', DEMO.skipperA],
    ['technician', DEMO.technician],
    ['manager', DEMO.manager],
  ] as const;
  const senders: Sender[] = [{ who: 'no session', sessionCookie: null }];
  for (const [who, email] of people) {
    const agent = await signedInAgent(app, email);
    await warmSummaries(agent);
    senders.push({ who, sessionCookie: sessionCookieOf(agent) });
  }
  return senders;
}

/** The session cookie in the agent's jar (supertest's server listens on 127.0.0.1). */
function sessionCookieOf(agent: Agent): string {
  const access = { domain: '127.0.0.1', path: '/api', secure: false, script: false };
  const cookie = agent.jar.getCookies(access).toValueString();
  if (!cookie.includes('ringseat_session=')) throw new Error(`no session cookie in "${cookie}"`);
  return cookie;
}

/**
 * A few ids of real records for reads to be sent with. Runs with a certificate are left out:
 * fetching a certificate is a good request whatever its query says, and it is written into the
 * run's trail, so it is no bad input.
 */
export async function readableIds(dataSource: DataSource): Promise<string[]> {
  const firstIds = async (
    entity: typeof Vessel | typeof Engine | typeof Program | typeof Attachment,
  ) =>
    (await dataSource.getRepository(entity).find({ select: { id: true }, take: 3 })).map(
      (row) => row.id,
    );
  const runs = await dataSource
    .getRepository(Run)
    .createQueryBuilder('run')
    .leftJoin(Certificate, 'certificate', 'certificate.runId = run.id')
    .where('certificate.runId IS NULL')
    .select('run.id', 'id')
    .take(3)
    .getRawMany<{ id: string }>();
  return [
    ...(await firstIds(Vessel)),
    ...(await firstIds(Engine)),
    ...(await firstIds(Program)),
    ...(await firstIds(Attachment)),
    ...runs.map((run) => run.id),
  ];
}

/**
 * The board keeps run summaries, worked out on the first read after new events: read it once
 * before the fingerprint so a later read finds them current and writes nothing.
 */
async function warmSummaries(agent: Agent): Promise<void> {
  await agent.get('/api/board');
  await agent.get('/api/runs');
}
