import { spawn, spawnSync, type ChildProcess, type ChildProcessByStdio } from 'node:child_process';
import fs from 'node:fs';
import net from 'node:net';
import os from 'node:os';
import path from 'node:path';
import type { Readable } from 'node:stream';

export type RealServer = {
  baseURL: string;
  dir: string;
  output: () => string;
  stop: () => Promise<void>;
  /** SIGKILL: the process gets no chance to close anything; the data folder stays as it was left. */
  kill: () => Promise<void>;
};

export async function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const probe = net.createServer();
    probe.once('error', reject);
    probe.listen(0, '127.0.0.1', () => {
      const { port } = probe.address() as net.AddressInfo;
      probe.close(() => resolve(port));
    });
  });
}

/**
 * Starts the server exactly as `npm start` does after its build step (tsx server/index.ts), on a
 * fresh data folder. This catches what vitest's transformer hides, such as untyped entity columns.
 * With `nodeArgs` (e.g. --cpu-prof) the server runs in one node process through tsx's loader.
 * With `dir`, it serves the data folder given (its ringseat.sqlite), which `stop` removes too.
 */
export async function startRealServer(
  env: Record<string, string> = {},
  nodeArgs: string[] = [],
  dir = fs.mkdtempSync(path.join(os.tmpdir(), 'ringseat-real-')),
): Promise<RealServer> {
  const port = await freePort();
  const baseURL = `http://127.0.0.1:${port}`;
  let output = '';
  const child = spawnServer(nodeArgs, {
    PORT: String(port),
    HOST: '127.0.0.1',
    RINGSEAT_DB: path.join(dir, 'ringseat.sqlite'),
    RINGSEAT_DATA_DIR: dir,
    LOG_LEVEL: 'warn',
    NODE_ENV: 'test',
    ...env,
  });
  child.stdout.on('data', (chunk) => (output += chunk));
  child.stderr.on('data', (chunk) => (output += chunk));
  const exited = new Promise<void>((resolve) => child.once('exit', () => resolve()));
  await waitUntilHealthy(child, baseURL, () => output);

  return {
    baseURL,
    dir,
    output: () => output,
    stop: async () => {
      child.kill('SIGTERM');
      await exited;
      fs.rmSync(dir, { recursive: true, force: true });
    },
    kill: async () => {
      const tree = processTree(child.pid!);
      for (const pid of tree) signal(pid, 'SIGKILL');
      await exited;
      await Promise.all(tree.map(untilGone));
      const answered = await fetch(`${baseURL}/api/health`).then(
        () => true,
        () => false,
      );
      if (answered) throw new Error(`the server at ${baseURL} still answers after SIGKILL`);
    },
  };
}

/** Kills the server with SIGKILL and starts a new one (on a new port) on the same data folder. */
export async function killAndRestart(
  server: RealServer,
  env: Record<string, string> = {},
): Promise<RealServer> {
  await server.kill();
  return startRealServer(env, [], server.dir);
}

/**
 * The process and every process under it, deepest first: tsx's CLI runs the server in a child
 * process of its own, which a SIGKILL to the CLI alone would leave running. Linux's /proc only;
 * elsewhere just the process itself.
 */
function processTree(pid: number): number[] {
  const children = readOr(() => fs.readdirSync(`/proc/${pid}/task`), [])
    .flatMap((task) =>
      readOr(() => fs.readFileSync(`/proc/${pid}/task/${task}/children`, 'utf8'), '').split(' '),
    )
    .filter((text) => text.trim() !== '')
    .map(Number);
  return [...children.flatMap(processTree), pid];
}

/** `read()`, or `otherwise` when what it reads has gone (a thread that ended, no /proc at all). */
function readOr<T>(read: () => T, otherwise: T): T {
  try {
    return read();
  } catch {
    return otherwise;
  }
}

function signal(pid: number, name: NodeJS.Signals) {
  try {
    process.kill(pid, name);
  } catch {
    // gone already
  }
}

/** Waits until the process has gone (or is a zombie, which holds no files or ports), 5 s at most. */
async function untilGone(pid: number) {
  const deadline = Date.now() + 5000;
  while (Date.now() < deadline) {
    let state: string;
    try {
      state = fs.readFileSync(`/proc/${pid}/stat`, 'utf8').split(') ')[1]?.[0] ?? 'X';
    } catch {
      return;
    }
    if (state === 'Z' || state === 'X') return;
    await new Promise((r) => setTimeout(r, 20));
  }
  throw new Error(`process ${pid} still running 5 s after SIGKILL`);
}

/** Runs one of the database commands (`npm run db:…`) on a data folder, as an operator would. */
export function runDatabaseCommand(
  script: string,
  args: string[],
  dir: string,
  env: Record<string, string> = {},
) {
  return spawnSync(
    process.execPath,
    [path.join('node_modules', 'tsx', 'dist', 'cli.mjs'), script, ...args],
    {
      env: {
        ...process.env,
        RINGSEAT_DB: path.join(dir, 'ringseat.sqlite'),
        RINGSEAT_DATA_DIR: dir,
        ...env,
      },
      encoding: 'utf8',
    },
  );
}

/** `tsx server/index.ts` as npm start runs it, or node with tsx's loader when given node flags. */
function spawnServer(
  nodeArgs: string[],
  env: Record<string, string>,
): ChildProcessByStdio<null, Readable, Readable> {
  return spawn(
    process.execPath,
    nodeArgs.length === 0
      ? [path.join('node_modules', 'tsx', 'dist', 'cli.mjs'), 'server/index.ts']
      : [...nodeArgs, '--import', 'tsx', 'server/index.ts'],
    { env: { ...process.env, ...env }, stdio: ['ignore', 'pipe', 'pipe'] },
  );
}

/** Polls /api/health until it answers; fails with the server's output if it exits or takes over 60 s. */
async function waitUntilHealthy(child: ChildProcess, baseURL: string, output: () => string) {
  const deadline = Date.now() + 60_000;
  for (;;) {
    if (child.exitCode !== null)
      throw new Error(`server exited with ${child.exitCode}:\n${output()}`);
    try {
      if ((await fetch(`${baseURL}/api/health`)).ok) return;
    } catch {
      // not listening yet
    }
    if (Date.now() > deadline) {
      child.kill('SIGKILL');
      throw new Error(`server did not answer /api/health within 60 s:\n${output()}`);
    }
    await new Promise((r) => setTimeout(r, 200));
  }
}
