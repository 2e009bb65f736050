import Database from 'better-sqlite3';
import fs from 'node:fs';
import path from 'node:path';
import { DEMO_PASSWORD } from '../demo/demo-people.js';

/*
 * Plain HTTP against a real server process, as a browser or the installed app sends it: the
 * session cookie and the page's Origin on every request. The session lives in the database, so
 * it outlasts a restart; only the address moves (a restarted server listens on a new port).
 */

export type FaultSession = Awaited<ReturnType<typeof signInOver>>;

export async function signInOver(baseURL: string, email: string) {
  const signIn = await fetch(`${baseURL}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', origin: baseURL },
    body: JSON.stringify({ email, password: DEMO_PASSWORD }),
  });
  if (!signIn.ok) throw new Error(`sign-in as ${email}: ${signIn.status}`);
  const cookie = signIn.headers.get('set-cookie')!.split(';')[0];
  let origin = baseURL;
  const call = async (route: string, init: { method?: string; body?: unknown } = {}) => {
    const res = await fetch(origin + route, {
      method: init.method ?? (init.body === undefined ? 'GET' : 'POST'),
      headers: { 'content-type': 'application/json', origin, cookie },
      body: init.body === undefined ? undefined : JSON.stringify(init.body),
    });
    const text = await res.text();
    return { status: res.status, body: text ? JSON.parse(text) : undefined };
  };
  return Object.assign(call, {
    /** A file the server hands out (a certificate), as bytes. */
    download: async (route: string) => {
      const res = await fetch(origin + route, { headers: { cookie } });
      return {
        status: res.status,
        type: res.headers.get('content-type'),
        bytes: Buffer.from(await res.arrayBuffer()),
      };
    },
    /** Points the session at the restarted server. */
    moveTo: (baseURL: string) => {
      origin = baseURL;
    },
  });
}

/** Every reading id the server holds for a run, page by page through the review's readings list. */
export async function readingIdsOf(session: FaultSession, runId: string): Promise<string[]> {
  const ids: string[] = [];
  for (;;) {
    const page = await session(`/api/runs/${runId}/readings?offset=${ids.length}&limit=500`);
    if (page.status !== 200) throw new Error(`readings of ${runId}: ${page.status}`);
    const readings = page.body.readings as Array<{ id: string }>;
    ids.push(...readings.map((r) => r.id));
    if (readings.length === 0 || ids.length >= page.body.total) return ids;
  }
}

/** Runs `look` on the data folder's database, opened read-only (the server is not running). */
export function readDatabase<T>(dir: string, look: (db: Database.Database) => T): T {
  const db = new Database(path.join(dir, 'ringseat.sqlite'), {
    readonly: true,
    fileMustExist: true,
  });
  try {
    return look(db);
  } finally {
    db.close();
  }
}

/**
 * Where each trial kills the server: `delayMs` after the `after`-th sign of progress (an answer,
 * a file written). Drawn at random unless RINGSEAT_KILL_PLAN gives them ("2:15,1:40" for two
 * trials), so a failing trial, whose plan every assertion message names, can be tried again the
 * same way (the server's own timing still varies from run to run).
 */
export type KillPlan = { after: number; delayMs: number };

/** With `shape` above 1, short delays come up more often than long ones. */
export function killPlans(
  trials: number,
  after: [number, number],
  maxDelayMs: number,
  shape = 1,
): KillPlan[] {
  const draw = (low: number, high: number, power = 1) =>
    low + Math.floor(Math.random() ** power * (high - low + 1));
  const given = process.env.RINGSEAT_KILL_PLAN?.split(',')
    .filter((part) => part.trim() !== '')
    .map((part) => {
      if (!/^\s*\d+:\d+\s*$/.test(part))
        throw new Error(`RINGSEAT_KILL_PLAN: "${part}" is not after:delayMs`);
      const [count, delayMs] = part.split(':').map(Number);
      return { after: count, delayMs };
    });
  return Array.from(
    { length: trials },
    (_, i) => given?.[i] ?? { after: draw(...after), delayMs: draw(0, maxDelayMs, shape) },
  );
}

export const describePlan = (trial: number, plan: KillPlan, sign: string) =>
  `trial ${trial}, killed ${plan.delayMs} ms after ${sign} ${plan.after} (RINGSEAT_KILL_PLAN=${plan.after}:${plan.delayMs})`;

/** Counts signs of progress; `reached(n)` resolves once n have been seen (at once for 0). */
export function progressCounter() {
  let seen = 0;
  const waiting: Array<{ count: number; resolve: () => void }> = [];
  return {
    note() {
      seen++;
      for (const w of waiting.filter((w) => w.count <= seen)) w.resolve();
    },
    reached: (count: number) =>
      count <= seen
        ? Promise.resolve()
        : new Promise<void>((resolve) => waiting.push({ count, resolve })),
  };
}

/** Calls `onFile` for each new file ending in `suffix` that appears in `folder`; returns a stop. */
export function watchNewFiles(folder: string, suffix: string, onFile: () => void): () => void {
  const seen = new Set<string>();
  const watcher = fs.watch(folder, (_event, name) => {
    if (!name?.endsWith(suffix) || seen.has(name) || !fs.existsSync(path.join(folder, name)))
      return;
    seen.add(name);
    onFile();
  });
  return () => watcher.close();
}
