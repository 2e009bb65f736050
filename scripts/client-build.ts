import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';

/** Everything the client bundle is made from; a change to any of these means a new build. */
const CLIENT_INPUTS = [
  'src',
  'shared',
  'public',
  'index.html',
  'vite.config.ts',
  'tailwind.config.ts',
  'package-lock.json',
];
export const CLIENT_DIR = path.join('dist', 'client');
const STAMP = path.join(CLIENT_DIR, '.built-at');

function newestMtime(entry: string): number {
  if (!fs.existsSync(entry)) return 0;
  const stat = fs.statSync(entry);
  if (!stat.isDirectory()) return stat.mtimeMs;
  let newest = stat.mtimeMs;
  for (const child of fs.readdirSync(entry))
    newest = Math.max(newest, newestMtime(path.join(entry, child)));
  return newest;
}

export function clientBuildIsCurrent(): boolean {
  if (!fs.existsSync(STAMP) || !fs.existsSync(path.join(CLIENT_DIR, 'index.html'))) return false;
  const builtAt = fs.statSync(STAMP).mtimeMs;
  return CLIENT_INPUTS.every((entry) => newestMtime(entry) <= builtAt);
}

/** Builds the client with Vite when it is missing or older than its sources. */
export function ensureClientBuilt(log: (line: string) => void = console.log): void {
  if (clientBuildIsCurrent()) return;
  log('Building the client (vite build)…');
  const result = spawnSync(
    process.execPath,
    [path.join('node_modules', 'vite', 'bin', 'vite.js'), 'build', '--logLevel', 'warn'],
    {
      stdio: 'inherit',
      // Test runners set NODE_ENV=test, which would make Vite bundle React's development build.
      env: { ...process.env, NODE_ENV: 'production' },
    },
  );
  if (result.status !== 0) throw new Error('vite build failed');
  fs.writeFileSync(STAMP, new Date().toISOString());
}
