import 'reflect-metadata';
import { randomUUID } from 'node:crypto';
import fs from 'node:fs';
import type { AddressInfo } from 'node:net';
import os from 'node:os';
import path from 'node:path';
import { createApp } from '../server/app.js';
import { prepareData } from '../server/prepare-data.js';
import { openDatabase } from '../server/lib/database.js';
import { nativeConnection } from '../server/lib/native-sql.js';
import { createLogger } from '../server/lib/logger.js';
import { hashPassword } from '../server/lib/passwords.js';
import { fillBenchWorkshop } from './review-data.js';

/*
 * Issue target: the runs board of a workshop with 2,000 runs, and the review of a run with
 * 36,000 readings, each answer in under 100 ms at the API. Data is generated into a temporary
 * database (made-up engines rated 5000–6000 rpm on the built-in four-stroke program), and every
 * request goes over real HTTP to the app. Run with `npx tsx bench/review.bench.ts`; exits 1 on a miss.
 */
const TARGET_MS = 100;
const BOARD_RUNS = 2000;
const READINGS_PER_RUN = 150; // typed readings, one every few minutes over a ten-hour break-in
const LONG_RUN_READINGS = 36_000; // 50 h with a reading every 5 s
const WARM_UP = 3;
const MEASURED = 25;

const percentile = (sorted: number[], p: number) =>
  sorted[Math.min(sorted.length - 1, Math.ceil(p * sorted.length) - 1)];

async function measure(label: string, url: string, cookie: string): Promise<boolean> {
  const once = async () => {
    const started = performance.now();
    const res = await fetch(url, { headers: { cookie } });
    if (!res.ok) throw new Error(`${label}: ${res.status} ${await res.text()}`);
    await res.arrayBuffer();
    return performance.now() - started;
  };
  const cold = await once();
  for (let i = 0; i < WARM_UP; i++) await once();
  const times: number[] = [];
  for (let i = 0; i < MEASURED; i++) times.push(await once());
  times.sort((a, b) => a - b);
  const p95 = percentile(times, 0.95);
  const pass = p95 < TARGET_MS;
  console.log(
    `${label}: first request ${cold.toFixed(1)} ms; then median ${percentile(times, 0.5).toFixed(1)} ms, p95 ${p95.toFixed(1)} ms over ${MEASURED} (target p95 < ${TARGET_MS} ms) ${pass ? 'PASS' : 'FAIL'}`,
  );
  return pass;
}

async function signInCookie(base: string): Promise<string> {
  const signIn = await fetch(`${base}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', origin: base },
    body: JSON.stringify({ email: 'bench@bench.example', password: 'ringseat-bench' }),
  });
  return signIn.headers.get('set-cookie')!.split(';')[0];
}

async function main() {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'ringseat-bench-review-'));
  const dataSource = await openDatabase(path.join(dir, 'bench.sqlite'));
  await prepareData(dataSource, { demo: 'none' });
  const ids = { workshop: randomUUID(), manager: randomUUID() };
  const passwordHash = await hashPassword('ringseat-bench');
  const started = performance.now();
  const { longRun, changes } = fillBenchWorkshop(nativeConnection(dataSource), ids, passwordHash, {
    runs: BOARD_RUNS,
    readingsPerRun: READINGS_PER_RUN,
    longRunReadings: LONG_RUN_READINGS,
  });
  console.log(
    `data: ${BOARD_RUNS} runs, ${changes} events and runs in ${((performance.now() - started) / 1000).toFixed(1)} s (one run with ${LONG_RUN_READINGS} readings)`,
  );

  const app = createApp({ dataSource, logger: createLogger('silent'), dataDir: dir });
  const server = app.listen(0, '127.0.0.1');
  await new Promise((resolve) => server.once('listening', resolve));
  const base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  const cookie = await signInCookie(base);
  try {
    const board = await measure(`runs board (${BOARD_RUNS} runs)`, `${base}/api/board`, cookie);
    const review = await measure(
      `run review (${LONG_RUN_READINGS} readings)`,
      `${base}/api/runs/${longRun}/review`,
      cookie,
    );
    console.log(board && review ? 'PASS' : 'FAIL');
    if (!(board && review)) process.exitCode = 1;
  } finally {
    server.close();
    await dataSource.destroy();
    fs.rmSync(dir, { recursive: true, force: true });
  }
}

await main();
