import { spawn } from 'node:child_process';
import fs from 'node:fs';
import net from 'node:net';
import os from 'node:os';
import path from 'node:path';

export type RealServer = {
  baseURL: string;
  dir: string;
  output: () => string;
  stop: () => Promise<void>;
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
 */
export async function startRealServer(
  env: Record<string, string> = {},
  nodeArgs: string[] = [],
): Promise<RealServer> {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'ringseat-real-'));
  const port = await freePort();
  const baseURL = `http://127.0.0.1:${port}`;
  let output = '';
  const child = spawn(
    process.execPath,
    nodeArgs.length === 0
      ? [path.join('node_modules', 'tsx', 'dist', 'cli.mjs'), 'server/index.ts']
      : [...nodeArgs, '--import', 'tsx', 'server/index.ts'],
    {
      env: {
        ...process.env,
        PORT: String(port),
        HOST: '127.0.0.1',
        RINGSEAT_DB: path.join(dir, 'ringseat.sqlite'),
        RINGSEAT_DATA_DIR: dir,
        LOG_LEVEL: 'warn',
        NODE_ENV: 'test',
        ...env,
      },
      stdio: ['ignore', 'pipe', 'pipe'],
    },
  );
  child.stdout.on('data', (chunk) => (output += chunk));
  child.stderr.on('data', (chunk) => (output += chunk));
  const exited = new Promise<void>((resolve) => child.once('exit', () => resolve()));

  const deadline = Date.now() + 60_000;
  for (;;) {
    if (child.exitCode !== null)
      throw new Error(`server exited with ${child.exitCode}:\n${output}`);
    try {
      if ((await fetch(`${baseURL}/api/health`)).ok) break;
    } catch {
      // not listening yet
    }
    if (Date.now() > deadline) {
      child.kill('SIGKILL');
      throw new Error(`server did not answer /api/health within 60 s:\n${output}`);
    }
    await new Promise((r) => setTimeout(r, 200));
  }

  return {
    baseURL,
    dir,
    output: () => output,
    stop: async () => {
      child.kill('SIGTERM');
      await exited;
      fs.rmSync(dir, { recursive: true, force: true });
    },
  };
}
